import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AircraftTypeView, SettingTable } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { aircraftTypeKeys } from '../../../lib/queries/aircraft-types-query.js';

export const saveSettingTables = ({ typeId, tables }: { typeId: number; tables: SettingTable[] }) =>
  apiRequest<AircraftTypeView>(`/aircraft-types/${typeId}/setting-tables`, { method: 'PUT', body: { tables } });

export function useSaveSettingTables() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveSettingTables,
    onSettled: () => queryClient.invalidateQueries({ queryKey: aircraftTypeKeys.all }),
  });
}
