import type { AdvanceSlotRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface AdvanceVariables extends AdvanceSlotRequest {
  slotId: number;
}

export const advanceSlot = (cycleId: number, { slotId, ...request }: AdvanceVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/advance`, {
    method: 'POST',
    body: request,
  });

export const useAdvanceSlot = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: AdvanceVariables) => advanceSlot(cycleId, variables) });
