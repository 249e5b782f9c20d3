import type { LineupCommandResult, WaiveGateRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface WaiveGateVariables extends WaiveGateRequest {
  slotId: number;
}

export const waiveGate = (cycleId: number, { slotId, ...request }: WaiveGateVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/waivers`, {
    method: 'POST',
    body: request,
  });

export const useWaiveGate = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: WaiveGateVariables) => waiveGate(cycleId, variables) });
