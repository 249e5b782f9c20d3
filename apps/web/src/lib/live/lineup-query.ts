import { queryOptions } from '@tanstack/react-query';
import type { LineupSnapshot } from '@catline/contracts';
import { apiRequest } from '../api-client.js';
import { lineupKeys } from './lineup-keys.js';
import { liveCycles } from './live-cycles.js';

export const fetchLineupSnapshot = (cycleId: number, signal?: AbortSignal) =>
  apiRequest<LineupSnapshot>(`/cycles/${cycleId}/lineup`, { signal });

/** The live lineup of a cycle. A fetched snapshot never replaces a newer one the socket already applied. */
export const lineupSnapshotQueryOptions = (cycleId: number) =>
  queryOptions({
    queryKey: lineupKeys.snapshot(cycleId),
    queryFn: async ({ signal }) => {
      return liveCycles.sync.fetched(await fetchLineupSnapshot(cycleId, signal));
    },
    // The socket keeps it current while a screen shows it; a screen opening again starts from a fresh copy.
    staleTime: Infinity,
    refetchOnMount: 'always',
  });
