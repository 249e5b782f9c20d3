import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AircraftView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { changeRowInPages } from '../../../lib/paging.js';
import { fleetKeys } from './fleet-keys.js';

export interface UpdateAircraftVariables {
  id: number;
  serviceable?: boolean;
  parkedSpot?: string;
}

export const updateAircraft = ({ id, ...changes }: UpdateAircraftVariables) =>
  apiRequest<AircraftView>(`/aircraft/${id}`, { method: 'PATCH', body: changes });

/** Optimistic: the row flips at once and flips back if the server refuses. */
export function useUpdateAircraft() {
  const queryClient = useQueryClient();
  const key = fleetKeys.aircraft.pages();
  return useMutation({
    mutationFn: updateAircraft,
    onMutate: async (variables) => {
      await queryClient.cancelQueries({ queryKey: key });
      return {
        putBack: changeRowInPages<AircraftView>(queryClient, key, variables.id, (row) => ({ ...row, ...variables })),
      };
    },
    onError: (_error, _variables, context) => context?.putBack(),
    onSettled: () => queryClient.invalidateQueries({ queryKey: fleetKeys.aircraft.all }),
  });
}
