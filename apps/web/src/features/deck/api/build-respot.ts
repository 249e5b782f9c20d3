import type { BuildRespotRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export const buildRespot = (cycleId: number, request: BuildRespotRequest) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/deck/respot`, { method: 'POST', body: request });

export const useBuildRespot = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (request: BuildRespotRequest) => buildRespot(cycleId, request) });
