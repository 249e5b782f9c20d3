import type { LineupCommandResult, SetLoadRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface SetLoadVariables extends SetLoadRequest {
  slotId: number;
}

export const setLoad = (cycleId: number, { slotId, ...request }: SetLoadVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/load`, { method: 'POST', body: request });

export const useSetLoad = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: SetLoadVariables) => setLoad(cycleId, variables) });
