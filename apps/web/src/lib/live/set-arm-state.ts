import type { LineupCommandResult, SetArmStateRequest } from '@catline/contracts';
import { apiRequest } from '../api-client.js';
import { useLineupCommand } from './use-lineup-command.js';

// Sent from the Cat station and from the handler's lineup, so it lives here, not in a feature.

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
