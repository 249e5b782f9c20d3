import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CatapultView, ReadinessStep } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { shipKeys } from '../../../lib/queries/ships-query.js';

export interface UpdateCatapultStepsVariables {
  shipId: number;
  catapultId: number;
  /** Null hands the catapult back to the ship's list. */
  readinessSteps: ReadinessStep[] | null;
}

export const updateCatapultSteps = ({ shipId, catapultId, readinessSteps }: UpdateCatapultStepsVariables) =>
  apiRequest<CatapultView>(`/ships/${shipId}/catapults/${catapultId}`, { method: 'PATCH', body: { readinessSteps } });

export function useUpdateCatapultSteps() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCatapultSteps,
    onSettled: () => queryClient.invalidateQueries({ queryKey: shipKeys.all }),
  });
}
