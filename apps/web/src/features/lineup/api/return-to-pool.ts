import type { LineupCommandResult, ReturnToPoolRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface ReturnToPoolVariables extends ReturnToPoolRequest {
  slotId: number;
}

export const returnToPool = (cycleId: number, { slotId, ...request }: ReturnToPoolVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/return`, {
    method: 'POST',
    body: request,
  });

export const useReturnToPool = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: ReturnToPoolVariables) => returnToPool(cycleId, variables) });
