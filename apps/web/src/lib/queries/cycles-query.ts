import { queryOptions, useQuery } from '@tanstack/react-query';
import { PAGE_SIZE, type CycleView } from '@catline/contracts';
import { fetchAllPages, pageQueryOptions } from '../paging.js';

// Read by Cycles and by every live screen (to pick the cycle on show), so it lives here, not in a feature.
export const cycleKeys = {
  all: ['cycles'] as const,
  list: () => ['cycles', 'list'] as const,
  pages: () => ['cycles', 'page'] as const,
  detail: (id: number) => ['cycles', 'detail', id] as const,
  landing: () => ['cycles', 'landing'] as const,
};

/** Every cycle, newest first: the live screens pick theirs from these. */
export const fetchCycles = (signal?: AbortSignal) => fetchAllPages<CycleView>('/cycles', PAGE_SIZE.max, signal);

export const cyclesQueryOptions = () =>
  queryOptions({ queryKey: cycleKeys.list(), queryFn: ({ signal }) => fetchCycles(signal) });

export const useCycles = () => useQuery(cyclesQueryOptions());

/** The Cycles screen's page from `offset`, newest first. */
export const useCyclesPage = (offset: number) =>
  useQuery(pageQueryOptions<CycleView>(cycleKeys.pages(), '/cycles', offset));
