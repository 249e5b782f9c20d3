import { useFileDownload } from '../../../lib/use-file-download.js';

/** The air plan layout as a CSV file: the header line and one example line. */
export const useAirPlanTemplate = () => useFileDownload('/air-plan/template', 'air-plan-template.csv');
