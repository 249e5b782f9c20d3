import type { LineupCommandResult, TowAircraftRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export const towAircraft = (cycleId: number, request: TowAircraftRequest) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/deck/tows`, { method: 'POST', body: request });

export const useTowAircraft = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (request: TowAircraftRequest) => towAircraft(cycleId, request) });
