import type { LaunchSlotRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface LaunchVariables extends LaunchSlotRequest {
  slotId: number;
}

export const launchSlot = (cycleId: number, { slotId, ...request }: LaunchVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/launch`, {
    method: 'POST',
    body: request,
  });

export const useLaunchSlot = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: LaunchVariables) => launchSlot(cycleId, variables) });
