import { useQuery } from '@tanstack/react-query';
import type { SpareCandidate } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { lineupFeatureKeys } from './lineup-query-keys.js';

export const getSpareCandidates = (cycleId: number, slotId: number, signal?: AbortSignal) =>
  apiRequest<SpareCandidate[]>(`/cycles/${cycleId}/lineup/slots/${slotId}/spares`, { signal });

/** Keyed by the lineup version: a spare called or taken meanwhile changes the list. */
export const useSpareCandidates = (cycleId: number, slotId: number, basisVersion: number) =>
  useQuery({
    queryKey: lineupFeatureKeys.spares(cycleId, slotId, basisVersion),
    queryFn: ({ signal }) => getSpareCandidates(cycleId, slotId, signal),
  });
