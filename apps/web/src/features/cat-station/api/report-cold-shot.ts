import type { LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';
import type { CatapultEventVariables } from './report-hangfire.js';

export const reportColdShot = (cycleId: number, { slotId, ...request }: CatapultEventVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/cold-shot`, {
    method: 'POST',
    body: request,
  });

export const useReportColdShot = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: CatapultEventVariables) => reportColdShot(cycleId, variables) });
