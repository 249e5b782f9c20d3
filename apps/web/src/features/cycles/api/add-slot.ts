import type { AddSlotRequest, LineupCommandResult } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useCycleCommand } from './cycle-command.js';

export const addSlot = (cycleId: number, request: AddSlotRequest) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/slots`, { method: 'POST', body: request });

export const useAddSlot = (cycleId: number) => useCycleCommand((request: AddSlotRequest) => addSlot(cycleId, request));
