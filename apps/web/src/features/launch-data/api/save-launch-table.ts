import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AircraftTypeView, LaunchTableRow } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { aircraftTypeKeys } from '../../../lib/queries/aircraft-types-query.js';

export const saveLaunchTable = ({ typeId, rows }: { typeId: number; rows: LaunchTableRow[] }) =>
  apiRequest<AircraftTypeView>(`/aircraft-types/${typeId}/launch-table`, { method: 'PUT', body: { rows } });

/** Optimistic: the table shows the new rows at once and the old ones again if the server refuses. */
export function useSaveLaunchTable() {
  const queryClient = useQueryClient();
  const key = aircraftTypeKeys.list();
  return useMutation({
    mutationFn: saveLaunchTable,
    onMutate: async ({ typeId, rows }) => {
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<AircraftTypeView[]>(key);
      queryClient.setQueryData<AircraftTypeView[]>(key, (list) =>
        list?.map((type) => (type.id === typeId ? { ...type, launchTable: rows } : type)),
      );
      return { previous };
    },
    onError: (_error, _variables, context) => queryClient.setQueryData(key, context?.previous),
    onSettled: () => queryClient.invalidateQueries({ queryKey: aircraftTypeKeys.all }),
  });
}
