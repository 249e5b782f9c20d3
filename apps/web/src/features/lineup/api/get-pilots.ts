import { useQuery } from '@tanstack/react-query';
import { PAGE_SIZE, type UserView } from '@catline/contracts';
import { fetchAllPages } from '../../../lib/paging.js';
import { lineupFeatureKeys } from './lineup-query-keys.js';

/** Every active pilot, page after page: the card menu offers each. */
export const getPilots = (signal?: AbortSignal) => fetchAllPages<UserView>('/users/pilots', PAGE_SIZE.max, signal);

export const usePilots = () =>
  useQuery({ queryKey: lineupFeatureKeys.pilots(), queryFn: ({ signal }) => getPilots(signal) });
