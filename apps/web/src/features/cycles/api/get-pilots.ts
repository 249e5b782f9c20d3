import { queryOptions, useQuery } from '@tanstack/react-query';
import { PAGE_SIZE, type UserView } from '@catline/contracts';
import { fetchAllPages } from '../../../lib/paging.js';
import { cyclesFeatureKeys } from './cycles-feature-keys.js';

export const getPilots = (signal?: AbortSignal) => fetchAllPages<UserView>('/users/pilots', PAGE_SIZE.max, signal);

export const pilotsQueryOptions = () =>
  queryOptions({ queryKey: cyclesFeatureKeys.pilots(), queryFn: ({ signal }) => getPilots(signal) });

export const usePilots = () => useQuery(pilotsQueryOptions());
