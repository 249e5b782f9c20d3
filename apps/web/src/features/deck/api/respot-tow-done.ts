import type { LineupCommandResult, RespotTowDoneRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export const respotTowDone = (cycleId: number, step: number, request: RespotTowDoneRequest) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/deck/respot/tows/${step}`, { method: 'POST', body: request });

export const useRespotTowDone = (cycleId: number) =>
  useLineupCommand({
    cycleId,
    send: ({ step, ...request }: RespotTowDoneRequest & { step: number }) => respotTowDone(cycleId, step, request),
  });
