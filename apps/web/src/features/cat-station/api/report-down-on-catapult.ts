import type { DownOnCatapultRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface DownOnCatapultVariables extends DownOnCatapultRequest {
  slotId: number;
}

export const reportDownOnCatapult = (cycleId: number, { slotId, ...request }: DownOnCatapultVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/down-on-catapult`, {
    method: 'POST',
    body: request,
  });

export const useReportDownOnCatapult = (cycleId: number) =>
  useLineupCommand({
    cycleId,
    send: (variables: DownOnCatapultVariables) => reportDownOnCatapult(cycleId, variables),
  });
