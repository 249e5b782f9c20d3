import type { CatapultEventRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface CatapultEventVariables extends CatapultEventRequest {
  slotId: number;
}

export const reportHangfire = (cycleId: number, { slotId, ...request }: CatapultEventVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/hangfire`, {
    method: 'POST',
    body: request,
  });

export const useReportHangfire = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: CatapultEventVariables) => reportHangfire(cycleId, variables) });
