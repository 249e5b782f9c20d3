import { useQuery } from '@tanstack/react-query';
import type { UserView } from '@catline/contracts';
import { pageQueryOptions } from '../../../lib/paging.js';
import { peopleKeys } from './people-keys.js';

/** The People screen's page from `offset`, by name. */
export const useUsersPage = (offset: number) =>
  useQuery(pageQueryOptions<UserView>(peopleKeys.pages(), '/users', offset));
