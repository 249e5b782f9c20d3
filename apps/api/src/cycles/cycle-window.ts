import { shipTime } from '@catline/contracts';
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

/** Launching outside the window is allowed only once the air boss confirms it, having been warned. */
export function checkStartInWindow(times: CycleTimes, now: Date, confirmed: boolean, timeZone: string): void {
  const early = now.getTime() < times.windowStartAt.getTime();
  const late = now.getTime() > times.windowEndAt.getTime();
  if (confirmed || (!early && !late)) return;
  const clock = (instant: Date) => shipTime(instant, timeZone);
  const window = `${clock(times.windowStartAt)} to ${clock(times.windowEndAt)}`;
  throw new CyclesException(
    'outside_window',
    `The launch window is ${window}; now, ${clock(now)}, is ${early ? 'before it opens' : 'after it closed'}. ` +
      'Confirm to start launching anyway.',
  );
}
