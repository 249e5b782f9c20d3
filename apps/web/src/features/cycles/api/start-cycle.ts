import type { CycleCommandRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useCycleCommand } from './cycle-command.js';

export const startCycle = (cycleId: number, basisVersion: number) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/start`, {
    method: 'POST',
    body: { basisVersion } satisfies CycleCommandRequest,
  });

export const useStartCycle = (cycleId: number) =>
  useCycleCommand((basisVersion: number) => startCycle(cycleId, basisVersion));
