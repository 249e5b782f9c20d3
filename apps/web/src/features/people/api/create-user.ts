import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateUserRequest, UserView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { peopleKeys } from './people-keys.js';

export const createUser = (request: CreateUserRequest) =>
  apiRequest<UserView>('/users', { method: 'POST', body: request });

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSettled: () => queryClient.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
