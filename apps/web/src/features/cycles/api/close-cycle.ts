import type { CycleCommandRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useCycleCommand } from './cycle-command.js';

export const closeCycle = (cycleId: number, basisVersion: number) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/close`, {
    method: 'POST',
    body: { basisVersion } satisfies CycleCommandRequest,
  });

export const useCloseCycle = (cycleId: number) =>
  useCycleCommand((basisVersion: number) => closeCycle(cycleId, basisVersion));
