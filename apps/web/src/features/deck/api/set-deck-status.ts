import type { LineupCommandResult, SetDeckStatusRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export const setDeckStatus = (cycleId: number, request: SetDeckStatusRequest) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/deck/catapult-status`, { method: 'POST', body: request });

export const useSetDeckStatus = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (request: SetDeckStatusRequest) => setDeckStatus(cycleId, request) });
