import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateCycleRequest, CycleView } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { cyclesFeatureKeys } from './cycles-feature-keys.js';

export const createCycle = (request: CreateCycleRequest) =>
  apiRequest<CycleView>('/cycles', { method: 'POST', body: request });

export function useCreateCycle() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCycle,
    onSettled: () => queryClient.invalidateQueries({ queryKey: cyclesFeatureKeys.all }),
  });
}
