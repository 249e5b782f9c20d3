import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ShipView } from '@catline/contracts';
import { apiRequest } from '../api-client.js';

// Read by Cycles (the ship a cycle belongs to) and People (catapult assignments).
export const shipKeys = {
  all: ['ships'] as const,
  list: () => ['ships', 'list'] as const,
};

export const shipsQueryOptions = () =>
  queryOptions({
    queryKey: shipKeys.list(),
    queryFn: ({ signal }) => apiRequest<ShipView[]>('/ships', { signal }),
    staleTime: 5 * 60_000,
  });

export const useShips = () => useQuery(shipsQueryOptions());
