import { queryOptions, useQuery } from '@tanstack/react-query';
import { PAGE_SIZE, type AircraftView } from '@catline/contracts';
import { fetchAllPages } from '../paging.js';

// Read by Fleet and by the cycle planner, so it lives here, not in a feature.
export const aircraftKeys = {
  all: ['aircraft'] as const,
  list: () => ['aircraft', 'list'] as const,
};

export const aircraftQueryOptions = () =>
  queryOptions({
    queryKey: aircraftKeys.list(),
    queryFn: ({ signal }) => fetchAllPages<AircraftView>('/aircraft', PAGE_SIZE.max, signal),
  });

export const useAircraft = () => useQuery(aircraftQueryOptions());
