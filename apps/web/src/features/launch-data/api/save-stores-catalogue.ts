import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AircraftTypeView, StoresItem } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { aircraftTypeKeys } from '../../../lib/queries/aircraft-types-query.js';

export const saveStoresCatalogue = ({ typeId, items }: { typeId: number; items: StoresItem[] }) =>
  apiRequest<AircraftTypeView>(`/aircraft-types/${typeId}/stores-catalogue`, { method: 'PUT', body: { items } });

export function useSaveStoresCatalogue() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveStoresCatalogue,
    onSettled: () => queryClient.invalidateQueries({ queryKey: aircraftTypeKeys.all }),
  });
}
