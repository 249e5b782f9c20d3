import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client.js';
import { fleetKeys } from './fleet-keys.js';

export const deleteAircraft = (id: number) => apiRequest<void>(`/aircraft/${id}`, { method: 'DELETE' });

export function useDeleteAircraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteAircraft,
    onSettled: () => queryClient.invalidateQueries({ queryKey: fleetKeys.aircraft.all }),
  });
}
