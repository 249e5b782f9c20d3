import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AircraftView } from '@catline/contracts';
import { apiRequest } from '../api-client.js';

// Read by Fleet and by the cycle planner, so it lives here, not in a feature.
export const aircraftKeys = {
  all: ['aircraft'] as const,
  list: () => ['aircraft', 'list'] as const,
};

export const aircraftQueryOptions = () =>
  queryOptions({
    queryKey: aircraftKeys.list(),
    queryFn: ({ signal }) => apiRequest<AircraftView[]>('/aircraft', { signal }),
  });

export const useAircraft = () => useQuery(aircraftQueryOptions());
