import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AircraftClass, AircraftTypeView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { aircraftTypeKeys } from '../../../lib/queries/aircraft-types-query.js';

export const setAircraftClass = ({ typeId, aircraftClass }: { typeId: number; aircraftClass: AircraftClass }) =>
  apiRequest<AircraftTypeView>(`/aircraft-types/${typeId}`, { method: 'PATCH', body: { aircraftClass } });

export function useSetAircraftClass() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setAircraftClass,
    onSettled: () => queryClient.invalidateQueries({ queryKey: aircraftTypeKeys.all }),
  });
}
