import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CycleReplay } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { reportKeys } from './reports-keys.js';

export const fetchCycleReplay = (cycleId: number, signal?: AbortSignal) =>
  apiRequest<CycleReplay>(`/cycles/${cycleId}/replay`, { signal });

export const cycleReplayQueryOptions = (cycleId: number) =>
  queryOptions({ queryKey: reportKeys.replay(cycleId), queryFn: ({ signal }) => fetchCycleReplay(cycleId, signal) });

export const useCycleReplay = (cycleId: number) => useQuery(cycleReplayQueryOptions(cycleId));
