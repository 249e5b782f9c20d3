import type { LineupCommandResult, SetCatapultStatusRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface CatapultStatusVariables extends SetCatapultStatusRequest {
  catapultId: number;
}

export const setCatapultStatus = (cycleId: number, { catapultId, ...request }: CatapultStatusVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/catapults/${catapultId}/status`, {
    method: 'POST',
    body: request,
  });

export const useSetCatapultStatus = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: CatapultStatusVariables) => setCatapultStatus(cycleId, variables) });
