import { queryOptions, useQuery } from '@tanstack/react-query';
import { PAGE_SIZE, type AircraftView } from '@catline/contracts';
import { fetchAllPages, pageQueryOptions } from '../paging.js';

// Read by Fleet and by the cycle planner, so it lives here, not in a feature.
export const aircraftKeys = {
  all: ['aircraft'] as const,
  list: () => ['aircraft', 'list'] as const,
  pages: () => ['aircraft', 'page'] as const,
};

export const aircraftQueryOptions = () =>
  queryOptions({
    queryKey: aircraftKeys.list(),
    queryFn: ({ signal }) => fetchAllPages<AircraftView>('/aircraft', PAGE_SIZE.max, signal),
  });

export const useAircraft = () => useQuery(aircraftQueryOptions());

/** The Fleet screen's page of aircraft from `offset`, by side number. */
export const useAircraftPage = (offset: number) =>
  useQuery(pageQueryOptions<AircraftView>(aircraftKeys.pages(), '/aircraft', offset));
