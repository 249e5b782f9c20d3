import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SquadronView } from '@catline/contracts';
import { apiRequest } from '../api-client.js';

// Read by Fleet and People, so it lives here, not in a feature.
export const squadronKeys = {
  all: ['squadrons'] as const,
  list: () => ['squadrons', 'list'] as const,
};

export const squadronsQueryOptions = () =>
  queryOptions({
    queryKey: squadronKeys.list(),
    queryFn: ({ signal }) => apiRequest<SquadronView[]>('/squadrons', { signal }),
  });

export const useSquadrons = () => useQuery(squadronsQueryOptions());
