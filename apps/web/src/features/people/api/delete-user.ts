import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client.js';
import { peopleKeys } from './people-keys.js';

export const deleteUser = (id: number) => apiRequest<void>(`/users/${id}`, { method: 'DELETE' });

export function useDeleteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteUser,
    onSettled: () => queryClient.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
