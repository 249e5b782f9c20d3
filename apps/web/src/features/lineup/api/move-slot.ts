import type { LineupCommandResult, MoveSlotRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';
import { moveSlotLocally } from '../lineup-model.js';

export const moveSlot = (cycleId: number, request: MoveSlotRequest) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/moves`, { method: 'POST', body: request });

export const useMoveSlot = (cycleId: number) =>
  useLineupCommand({
    cycleId,
    send: (request: MoveSlotRequest) => moveSlot(cycleId, request),
    optimistic: moveSlotLocally,
  });
