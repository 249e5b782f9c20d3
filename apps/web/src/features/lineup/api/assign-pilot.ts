import type { AssignPilotRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface AssignPilotVariables extends AssignPilotRequest {
  slotId: number;
}

export const assignPilot = (cycleId: number, { slotId, ...request }: AssignPilotVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/pilot`, { method: 'POST', body: request });

export const useAssignPilot = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: AssignPilotVariables) => assignPilot(cycleId, variables) });
