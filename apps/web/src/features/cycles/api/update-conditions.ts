import type { LineupCommandResult, UpdateCycleConditionsRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useCycleCommand } from './cycle-command.js';

export const updateConditions = (cycleId: number, request: UpdateCycleConditionsRequest) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/conditions`, { method: 'PATCH', body: request });

export const useUpdateConditions = (cycleId: number) =>
  useCycleCommand((request: UpdateCycleConditionsRequest) => updateConditions(cycleId, request));
