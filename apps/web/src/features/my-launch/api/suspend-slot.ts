import type { LineupCommandResult, SuspendSlotRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface SuspendVariables extends SuspendSlotRequest {
  slotId: number;
}

export const suspendSlot = (cycleId: number, { slotId, ...request }: SuspendVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/suspend`, {
    method: 'POST',
    body: request,
  });

export const useSuspendSlot = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: SuspendVariables) => suspendSlot(cycleId, variables) });
