import { useMutation } from '@tanstack/react-query';
import type { LaunchTablePreview } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { csvFormData } from '../../../lib/csv-upload.js';

/** Reads and checks a launch table file for the type; the table changes only on confirm. */
export const previewLaunchTable = (typeId: number, file: File) =>
  apiRequest<LaunchTablePreview>(`/aircraft-types/${typeId}/launch-table/preview`, {
    method: 'POST',
    body: csvFormData(file),
  });

export const usePreviewLaunchTable = (typeId: number) =>
  useMutation({ mutationFn: (file: File) => previewLaunchTable(typeId, file) });
