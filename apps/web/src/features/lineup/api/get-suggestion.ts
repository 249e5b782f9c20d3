import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SuggestedLineup } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { lineupFeatureKeys } from './lineup-query-keys.js';

export const getSuggestion = (cycleId: number, signal?: AbortSignal) =>
  apiRequest<SuggestedLineup>(`/cycles/${cycleId}/lineup/suggestion`, { signal });

/** Keyed by the lineup version it was asked for: a newer lineup needs a new suggestion. */
export const suggestionQueryOptions = (cycleId: number, basisVersion: number) =>
  queryOptions({
    queryKey: lineupFeatureKeys.suggestion(cycleId, basisVersion),
    queryFn: ({ signal }) => getSuggestion(cycleId, signal),
    staleTime: Infinity,
  });

export const useSuggestion = (cycleId: number, basisVersion: number, enabled: boolean) =>
  useQuery({ ...suggestionQueryOptions(cycleId, basisVersion), enabled });
