import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CycleReport } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { reportKeys } from './reports-keys.js';

export const fetchCycleReport = (cycleId: number, signal?: AbortSignal) =>
  apiRequest<CycleReport>(`/cycles/${cycleId}/report`, { signal });

export const cycleReportQueryOptions = (cycleId: number) =>
  queryOptions({
    queryKey: reportKeys.cycleReport(cycleId),
    queryFn: ({ signal }) => fetchCycleReport(cycleId, signal),
  });

export const useCycleReport = (cycleId: number) => useQuery(cycleReportQueryOptions(cycleId));
