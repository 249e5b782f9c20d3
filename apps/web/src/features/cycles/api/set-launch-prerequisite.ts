import type { LineupCommandResult, SetLaunchPrerequisiteRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';
import { useCycleCommand } from './cycle-command.js';

/** `number` is the prerequisite's place in the ship profile's list, from 1. */
export interface LaunchPrerequisiteTick {
  number: number;
  request: SetLaunchPrerequisiteRequest;
}

export const setLaunchPrerequisite = (cycleId: number, { number, request }: LaunchPrerequisiteTick) =>
  apiRequest<LineupCommandResult>(`/cycles/${cycleId}/prerequisites/${number}`, { method: 'PUT', body: request });

export const useSetLaunchPrerequisite = (cycleId: number) =>
  useCycleCommand((tick: LaunchPrerequisiteTick) => setLaunchPrerequisite(cycleId, tick));
