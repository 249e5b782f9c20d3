import type { LineupCommandResult, SetArmStateRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface SetArmStateVariables extends SetArmStateRequest {
  slotId: number;
}

export const setArmState = (cycleId: number, { slotId, ...request }: SetArmStateVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/arm-state`, {
    method: 'POST',
    body: request,
  });

export const useSetArmState = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: SetArmStateVariables) => setArmState(cycleId, variables) });
