import type { LineupCommandResult, SuspendReasonRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface SuspendReasonVariables extends SuspendReasonRequest {
  slotId: number;
}

export const giveSuspendReason = (cycleId: number, { slotId, ...request }: SuspendReasonVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/suspend-reason`, {
    method: 'POST',
    body: request,
  });

export const useGiveSuspendReason = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: SuspendReasonVariables) => giveSuspendReason(cycleId, variables) });
