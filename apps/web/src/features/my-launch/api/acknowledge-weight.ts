import type { LineupCommandResult, WeightAckRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface WeightAckVariables extends WeightAckRequest {
  slotId: number;
}

export const acknowledgeWeight = (cycleId: number, { slotId, ...request }: WeightAckVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/weight-ack`, {
    method: 'POST',
    body: request,
  });

export const useAcknowledgeWeight = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: WeightAckVariables) => acknowledgeWeight(cycleId, variables) });
