import { useMutation } from '@tanstack/react-query';
import type { AirPlanPreview } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { csvFormData } from '../../../lib/csv-upload.js';

/** Reads and checks an air plan file against the cycle; nothing changes until it is confirmed. */
export const previewAirPlan = (cycleId: number, file: File) =>
  apiRequest<AirPlanPreview>(`/cycles/${cycleId}/air-plan/preview`, { method: 'POST', body: csvFormData(file) });

export const usePreviewAirPlan = (cycleId: number) =>
  useMutation({ mutationFn: (file: File) => previewAirPlan(cycleId, file) });
