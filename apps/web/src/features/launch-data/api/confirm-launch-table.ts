import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AircraftTypeView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { aircraftTypeKeys } from '../../../lib/queries/aircraft-types-query.js';

export const confirmLaunchTable = (typeId: number, uploadId: number) =>
  apiRequest<AircraftTypeView>(`/aircraft-types/${typeId}/launch-table/imports/${uploadId}/confirm`, {
    method: 'POST',
  });

/** Replaces the type's whole launch table with a checked upload; the screen shows the type as answered. */
export function useConfirmLaunchTable(typeId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (uploadId: number) => confirmLaunchTable(typeId, uploadId),
    onSuccess: (updated) =>
      queryClient.setQueryData<AircraftTypeView[]>(aircraftTypeKeys.list(), (list) =>
        list?.map((type) => (type.id === updated.id ? updated : type)),
      ),
    onSettled: () => queryClient.invalidateQueries({ queryKey: aircraftTypeKeys.all }),
  });
}
