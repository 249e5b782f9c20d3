import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateUserRequest, UserView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { changeRowInPages } from '../../../lib/paging.js';
import { peopleKeys } from './people-keys.js';

export type UpdateUserVariables = UpdateUserRequest & { id: number };

export const updateUser = ({ id, ...changes }: UpdateUserVariables) =>
  apiRequest<UserView>(`/users/${id}`, { method: 'PATCH', body: changes });

/** Optimistic: the row shows the change at once and the old values again if the server refuses. */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  const key = peopleKeys.pages();
  return useMutation({
    mutationFn: updateUser,
    onMutate: async (variables) => {
      await queryClient.cancelQueries({ queryKey: key });
      return {
        putBack: changeRowInPages<UserView>(queryClient, key, variables.id, (user) => ({ ...user, ...variables })),
      };
    },
    onError: (_error, _variables, context) => context?.putBack(),
    onSettled: () => queryClient.invalidateQueries({ queryKey: peopleKeys.all }),
  });
}
