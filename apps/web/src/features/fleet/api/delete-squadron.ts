import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client.js';
import { fleetKeys } from './fleet-keys.js';

export const deleteSquadron = (id: number) => apiRequest<void>(`/squadrons/${id}`, { method: 'DELETE' });

export function useDeleteSquadron() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteSquadron,
    onSettled: () => queryClient.invalidateQueries({ queryKey: fleetKeys.squadrons.all }),
  });
}
