import { useQuery } from '@tanstack/react-query';
import type { UserView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { lineupFeatureKeys } from './lineup-query-keys.js';

export const getPilots = (signal?: AbortSignal) => apiRequest<UserView[]>('/users/pilots', { signal });

export const usePilots = () =>
  useQuery({ queryKey: lineupFeatureKeys.pilots(), queryFn: ({ signal }) => getPilots(signal) });
