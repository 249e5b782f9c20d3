import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { cyclesFeatureKeys } from './cycles-feature-keys.js';

export const getPilots = (signal?: AbortSignal) => apiRequest<UserView[]>('/users/pilots', { signal });

export const pilotsQueryOptions = () =>
  queryOptions({ queryKey: cyclesFeatureKeys.pilots(), queryFn: ({ signal }) => getPilots(signal) });

export const usePilots = () => useQuery(pilotsQueryOptions());
