import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LineupCommandResult } from '@catline/contracts';
import { receiveLineupChange } from '../../../lib/live/use-live-cycle.js';
import { cyclesFeatureKeys } from './cycles-feature-keys.js';

/** A change to a cycle: its answer feeds the live lineup, and the cycle list is read again. */
export function useCycleCommand<TVariables>(send: (variables: TVariables) => Promise<LineupCommandResult>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (result) => receiveLineupChange(result.change),
    onSettled: () => queryClient.invalidateQueries({ queryKey: cyclesFeatureKeys.all }),
  });
}
