import { useFileDownload } from '../../../lib/use-file-download.js';

/** The launch table layout as a CSV file: the header line and two example lines. */
export const useLaunchTableTemplate = () =>
  useFileDownload('/aircraft-types/launch-table/template', 'launch-table-template.csv');
