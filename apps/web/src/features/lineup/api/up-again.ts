import type { LineupCommandResult, UpAgainRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface UpAgainVariables extends UpAgainRequest {
  slotId: number;
}

export const upAgain = (cycleId: number, { slotId, ...request }: UpAgainVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/up`, { method: 'POST', body: request });

export const useUpAgain = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: UpAgainVariables) => upAgain(cycleId, variables) });
