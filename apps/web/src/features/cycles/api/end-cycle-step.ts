import type { CycleCommandRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useCycleCommand } from './cycle-command.js';

/** Commands that take only the basis version: the air boss stops launching, air operations closes the cycle. */
export type CycleStepCommand = 'stop' | 'close';

export const endCycleStep = (cycleId: number, command: CycleStepCommand, basisVersion: number) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/${command}`, {
    method: 'POST',
    body: { basisVersion } satisfies CycleCommandRequest,
  });

export const useEndCycleStep = (cycleId: number, command: CycleStepCommand) =>
  useCycleCommand((basisVersion: number) => endCycleStep(cycleId, command, basisVersion));
