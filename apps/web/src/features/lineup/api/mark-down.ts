import type { LineupCommandResult, MarkDownRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface MarkDownVariables extends MarkDownRequest {
  slotId: number;
}

export const markDown = (cycleId: number, { slotId, ...request }: MarkDownVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/down`, { method: 'POST', body: request });

export const useMarkDown = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: MarkDownVariables) => markDown(cycleId, variables) });
