import type { LineupCommandResult, UndoStepRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useLineupCommand } from '../../../lib/live/use-lineup-command.js';

export interface UndoVariables extends UndoStepRequest {
  slotId: number;
}

export const undoStep = (cycleId: number, { slotId, ...request }: UndoVariables) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/lineup/slots/${slotId}/undo`, { method: 'POST', body: request });

export const useUndoStep = (cycleId: number) =>
  useLineupCommand({ cycleId, send: (variables: UndoVariables) => undoStep(cycleId, variables) });
