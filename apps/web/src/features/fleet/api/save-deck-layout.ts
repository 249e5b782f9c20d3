import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReplaceDeckLayoutRequest, ShipView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { shipKeys } from '../../../lib/queries/ships-query.js';

export const saveDeckLayout = ({ shipId, layout }: { shipId: number; layout: ReplaceDeckLayoutRequest }) =>
  apiRequest<ShipView>(`/ships/${shipId}/deck-layout`, { method: 'PUT', body: layout });

export function useSaveDeckLayout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveDeckLayout,
    onSettled: () => queryClient.invalidateQueries({ queryKey: shipKeys.all }),
  });
}
