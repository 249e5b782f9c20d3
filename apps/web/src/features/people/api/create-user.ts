import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role, UserView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { peopleKeys } from './people-keys.js';

export interface CreateUserRequest {
  email: string;
  name: string;
  role: Role;
  password: string;
  catapultId?: number;
  squadronId?: number;
}

export const createUser = (request: CreateUserRequest) => apiRequest<UserView>('/users', { method: 'POST', body: request });

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createUser, onSettled: () => queryClient.invalidateQueries({ queryKey: peopleKeys.all }) });
}
