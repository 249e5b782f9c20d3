import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateSquadronRequest, SquadronView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { fleetKeys } from './fleet-keys.js';

export const createSquadron = (request: CreateSquadronRequest) =>
  apiRequest<SquadronView>('/squadrons', { method: 'POST', body: request });

export function useCreateSquadron() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSquadron,
    onSettled: () => queryClient.invalidateQueries({ queryKey: fleetKeys.squadrons.all }),
  });
}
