import { queryOptions, useQuery } from '@tanstack/react-query';
import { PAGE_SIZE, type UserView } from '@catline/contracts';
import { fetchAllPages } from '../../../lib/paging.js';
import { peopleKeys } from './people-keys.js';

export const getUsers = (signal?: AbortSignal) => fetchAllPages<UserView>('/users', PAGE_SIZE.max, signal);

export const usersQueryOptions = () =>
  queryOptions({ queryKey: peopleKeys.list(), queryFn: ({ signal }) => getUsers(signal) });

export const useUsers = () => useQuery(usersQueryOptions());
