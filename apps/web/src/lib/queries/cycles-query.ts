import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CycleView } from '@catline/contracts';
import { apiRequest } from '../api-client.js';

// Read by Cycles and by every live screen (to pick the cycle on show), so it lives here, not in a feature.
export const cycleKeys = {
  all: ['cycles'] as const,
  list: () => ['cycles', 'list'] as const,
  detail: (id: number) => ['cycles', 'detail', id] as const,
};

export const fetchCycles = (signal?: AbortSignal) => apiRequest<CycleView[]>('/cycles', { signal });

export const cyclesQueryOptions = () =>
  queryOptions({ queryKey: cycleKeys.list(), queryFn: ({ signal }) => fetchCycles(signal) });

export const useCycles = () => useQuery(cyclesQueryOptions());
