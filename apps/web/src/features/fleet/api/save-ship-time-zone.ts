import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ShipView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { shipKeys } from '../../../lib/queries/ships-query.js';

/** The ship profile is written whole: the one held, with the zone changed. */
export const saveShipTimeZone = ({ ship, timeZone }: { ship: ShipView; timeZone: string }) =>
  apiRequest<ShipView>(`/ships/${ship.id}`, { method: 'PATCH', body: { profile: { ...ship.profile, timeZone } } });

export function useSaveShipTimeZone() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveShipTimeZone,
    onSettled: () => queryClient.invalidateQueries({ queryKey: shipKeys.all }),
  });
}
