import type { IntervalSpread, LaunchInterval, ReportFigures, ReportLaunch } from '@catline/contracts';

// The arithmetic of a cycle report, kept apart from reading the record so each rule has its own spec.

/** A launch on the record: which aircraft left which catapult when (epoch ms). */
export interface FlownLaunch {
  slotId: number;
  sideNumber: string;
  catapultNumber: number;
  launchedAtMs: number;
}

const seconds = (ms: number) => ms / 1000;

/** Seconds from `from` to `to`, both ISO instants; positive when `to` is later. */
export function secondsBetween(from: string, to: string): number {
  return seconds(Date.parse(to) - Date.parse(from));
}

/** A launch is inside the window when it is no earlier than its start and no later than its end. */
export function insideWindow(launchedAt: string, window: { startAt: string; endAt: string }): boolean {
  const at = Date.parse(launchedAt);
  return at >= Date.parse(window.startAt) && at <= Date.parse(window.endAt);
}

/**
 * The time between each launch and the one before it, taken in launch order (ties by slot id so the
 * order is stable). The launches are one catapult's, or every catapult's of a pair.
 */
export function launchIntervals(launches: readonly FlownLaunch[]): LaunchInterval[] {
  const ordered = [...launches].sort((a, b) => a.launchedAtMs - b.launchedAtMs || a.slotId - b.slotId);
  return ordered.slice(1).map((to, i) => {
    const from = ordered[i];
    return {
      fromSlotId: from.slotId,
      fromSideNumber: from.sideNumber,
      fromCatapultNumber: from.catapultNumber,
      toSlotId: to.slotId,
      toSideNumber: to.sideNumber,
      toCatapultNumber: to.catapultNumber,
      seconds: seconds(to.launchedAtMs - from.launchedAtMs),
    };
  });
}

/** Shortest, mean (to the millisecond) and longest interval. */
export function intervalSpread(intervals: readonly LaunchInterval[]): IntervalSpread {
  if (intervals.length === 0) return { shortestS: null, meanS: null, longestS: null };
  const ms = intervals.map((interval) => Math.round(interval.seconds * 1000));
  return {
    shortestS: seconds(Math.min(...ms)),
    meanS: seconds(Math.round(ms.reduce((sum, value) => sum + value, 0) / ms.length)),
    longestS: seconds(Math.max(...ms)),
  };
}

/** How one aircraft's part in the cycle ended. */
export type SlotOutcome = Pick<ReportLaunch, 'status' | 'inWindow' | 'waiverReason'>;

/** The counts over a set of aircraft (a squadron's, or the cycle's) and the suspends they had. */
export function countFigures(outcomes: readonly SlotOutcome[], suspends: number): ReportFigures {
  const count = (test: (outcome: SlotOutcome) => boolean) => outcomes.filter(test).length;
  return {
    aircraft: outcomes.length,
    launched: count((outcome) => outcome.status === 'launched'),
    onTime: count((outcome) => outcome.inWindow === true),
    outsideWindow: count((outcome) => outcome.inWindow === false),
    suspends,
    down: count((outcome) => outcome.status === 'down'),
    waivers: count((outcome) => outcome.waiverReason !== null),
    scratched: count((outcome) => outcome.status === 'scratched'),
  };
}
