import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AircraftTypeView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { aircraftTypeKeys } from '../../../lib/queries/aircraft-types-query.js';

export const setHoldbackElement = ({ typeId, holdbackElement }: { typeId: number; holdbackElement: string | null }) =>
  apiRequest<AircraftTypeView>(`/aircraft-types/${typeId}`, { method: 'PATCH', body: { holdbackElement } });

export function useSetHoldbackElement() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setHoldbackElement,
    onSettled: () => queryClient.invalidateQueries({ queryKey: aircraftTypeKeys.all }),
  });
}
