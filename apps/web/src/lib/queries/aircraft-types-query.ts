import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AircraftTypeView } from '@catline/contracts';
import { apiRequest } from '../api-client.js';

// Read by Launch data and by Fleet (the type of each aircraft), so it lives here, not in a feature.
export const aircraftTypeKeys = {
  all: ['aircraft-types'] as const,
  list: () => ['aircraft-types', 'list'] as const,
};

export const aircraftTypesQueryOptions = () =>
  queryOptions({
    queryKey: aircraftTypeKeys.list(),
    queryFn: ({ signal }) => apiRequest<AircraftTypeView[]>('/aircraft-types', { signal }),
  });

export const useAircraftTypes = () => useQuery(aircraftTypesQueryOptions());
