import type { CallSpareRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface CallSpareVariables extends CallSpareRequest {
  slotId: number;
}

export const callSpare = (cycleId: number, { slotId, ...request }: CallSpareVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/spare`, { method: 'POST', body: request });

export const useCallSpare = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: CallSpareVariables) => callSpare(cycleId, variables) });
