import type { CycleCommandRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useCycleCommand } from './cycle-command.js';

export const confirmAirPlan = (cycleId: number, uploadId: number, basisVersion: number) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/air-plan/imports/${uploadId}/confirm`, {
    method: 'POST',
    body: { basisVersion } satisfies CycleCommandRequest,
  });

/** Imports a checked air plan into the cycle as it is now: a cycle changed since answers 409 and is read again. */
export const useConfirmAirPlan = (cycleId: number, basisVersion: number) =>
  useCycleCommand((uploadId: number) => confirmAirPlan(cycleId, uploadId, basisVersion));
