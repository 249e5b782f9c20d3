import { requireFinite } from '../errors.js';
import type { EpochMs } from '../units/units.js';

export type TimingVerdict = 'early' | 'on_time' | 'late';

/** How a launch time runs against a reference, in whole minutes (0 when on time). */
export interface TimingAgainst {
  readonly verdict: TimingVerdict;
  readonly minutes: number;
}

/** How an aircraft runs against its window's end and, when it has one, its planned time. */
export interface LaunchTiming {
  readonly window: TimingAgainst;
  readonly plan: TimingAgainst | null;
}

const MINUTE_MS = 60_000;

/**
 * Against the window's end: any launch after it is late, by the minutes started (10 s past the end is
 * "1 min late": the window is missed whatever the amount); at or before it the launch is on time, with
 * the whole minutes to spare.
 */
export function timingAgainstWindow(time: EpochMs, windowEnd: EpochMs): TimingAgainst {
  requireFinite(time, 'Launch time');
  requireFinite(windowEnd, 'Window end');
  return time > windowEnd
    ? { verdict: 'late', minutes: Math.ceil((time - windowEnd) / MINUTE_MS) }
    : { verdict: 'on_time', minutes: Math.floor((windowEnd - time) / MINUTE_MS) };
}

/**
 * Against a planned time, to the nearest whole minute: less than half a minute either way is on time (the
 * board shows minutes; common practice, no source), else early or late by the rounded minutes.
 */
export function timingAgainstPlan(time: EpochMs, planned: EpochMs): TimingAgainst {
  requireFinite(time, 'Launch time');
  requireFinite(planned, 'Planned time');
  const minutes = Math.round(Math.abs(time - planned) / MINUTE_MS);
  if (minutes === 0) return { verdict: 'on_time', minutes: 0 };
  return { verdict: time > planned ? 'late' : 'early', minutes };
}

/** An aircraft's launch time against its window's end and its planned time, when there is one. */
export const launchTiming = (time: EpochMs, windowEnd: EpochMs, planned?: EpochMs): LaunchTiming => ({
  window: timingAgainstWindow(time, windowEnd),
  plan: planned === undefined ? null : timingAgainstPlan(time, planned),
});
