import { queryOptions, useQuery } from '@tanstack/react-query';
import type { UserView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { peopleKeys } from './people-keys.js';

export const getUsers = (signal?: AbortSignal) => apiRequest<UserView[]>('/users', { signal });

export const usersQueryOptions = () =>
  queryOptions({ queryKey: peopleKeys.list(), queryFn: ({ signal }) => getUsers(signal) });

export const useUsers = () => useQuery(usersQueryOptions());
