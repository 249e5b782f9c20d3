import type { LineupCommandResult, StartCycleRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useCycleCommand } from './cycle-command.js';

export const startCycle = (cycleId: number, request: StartCycleRequest) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/start`, { method: 'POST', body: request });

export const useStartCycle = (cycleId: number) =>
  useCycleCommand((request: StartCycleRequest) => startCycle(cycleId, request));
