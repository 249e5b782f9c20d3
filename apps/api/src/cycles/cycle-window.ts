import { CyclesException } from './cycles.exception.js';

export interface CycleTimes {
  plannedLaunchAt: Date;
  windowStartAt: Date;
  windowEndAt: Date;
}

/** The launch window must open before it closes, and the planned first launch must fall inside it. */
export function checkWindow(times: CycleTimes): void {
  if (times.windowEndAt.getTime() <= times.windowStartAt.getTime()) {
    throw new CyclesException('invalid_window', 'The launch window must end after it starts.');
  }
  const planned = times.plannedLaunchAt.getTime();
  if (planned < times.windowStartAt.getTime() || planned > times.windowEndAt.getTime()) {
    throw new CyclesException('invalid_window', 'The planned launch time must fall inside the launch window.');
  }
}
