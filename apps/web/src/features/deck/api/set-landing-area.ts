import type { LineupCommandResult, SetLandingAreaRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export const setLandingArea = (cycleId: number, request: SetLandingAreaRequest) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/deck/landing-area`, { method: 'POST', body: request });

export const useSetLandingArea = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (request: SetLandingAreaRequest) => setLandingArea(cycleId, request) });
