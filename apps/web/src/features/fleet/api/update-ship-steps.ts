import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReadinessStep, ShipView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { shipKeys } from '../../../lib/queries/ships-query.js';

// The profile is replaced whole on the server, so the rest of it goes back as it came.
export const updateShipSteps = ({ ship, readinessSteps }: { ship: ShipView; readinessSteps: ReadinessStep[] }) =>
  apiRequest<ShipView>(`/ships/${ship.id}`, {
    method: 'PATCH',
    body: { profile: { ...ship.profile, readinessSteps } },
  });

export function useUpdateShipSteps() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateShipSteps,
    onSettled: () => queryClient.invalidateQueries({ queryKey: shipKeys.all }),
  });
}
