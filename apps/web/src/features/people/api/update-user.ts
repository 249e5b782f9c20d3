import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateUserRequest, UserView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { peopleKeys } from './people-keys.js';

export type UpdateUserVariables = UpdateUserRequest & { id: number };

export const updateUser = ({ id, ...changes }: UpdateUserVariables) =>
  apiRequest<UserView>(`/users/${id}`, { method: 'PATCH', body: changes });

/** Optimistic: the row shows the change at once and the old values again if the server refuses. */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  const key = peopleKeys.list();
  return useMutation({
    mutationFn: updateUser,
    onMutate: async (variables) => {
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<UserView[]>(key);
      queryClient.setQueryData<UserView[]>(key, (list) =>
        list?.map((user) => (user.id === variables.id ? { ...user, ...variables } : user)),
      );
      return { previous };
    },
    onError: (_error, _variables, context) => queryClient.setQueryData(key, context?.previous),
    onSettled: () => queryClient.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
