import { shipClock, type CycleReport, type CycleView, type ReportLaunch } from '@catline/contracts';

/** The cycle a report screen opens on: the one asked for, else the latest closed, else the latest. */
export function pickReportCycle(cycles: CycleView[], chosen: number | null): CycleView | undefined {
  const asked = cycles.find((cycle) => cycle.id === chosen);
  if (asked) return asked;
  const byPlan = [...cycles].sort((a, b) => Date.parse(b.plannedLaunchAt) - Date.parse(a.plannedLaunchAt));
  return byPlan.find((cycle) => cycle.state === 'closed') ?? byPlan[0];
}

/** The report's launches in timeline order: by catapult, launches first by time, then what did not launch. */
export const timelineLaunches = (report: CycleReport): ReportLaunch[] =>
  report.catapults.flatMap((catapult) => catapult.launches);

export interface TimelinePoint {
  slotId: number;
  side: string;
  catapult: number;
  /** Epoch ms. */
  time: number;
  label: string;
}

/** The planned and the actual marks of the timeline chart. */
export function timelinePoints(report: CycleReport): { planned: TimelinePoint[]; actual: TimelinePoint[] } {
  const launches = timelineLaunches(report);
  const point = (launch: ReportLaunch, at: string, what: string): TimelinePoint => ({
    slotId: launch.slotId,
    side: launch.sideNumber,
    catapult: launch.catapultNumber,
    time: Date.parse(at),
    label: `${launch.sideNumber} ${what} ${shipClock(at, report.cycle.timeZone)} on cat ${launch.catapultNumber}`,
  });
  return {
    planned: launches.flatMap((launch) => (launch.plannedAt ? [point(launch, launch.plannedAt, 'planned')] : [])),
    actual: launches.flatMap((launch) => (launch.launchedAt ? [point(launch, launch.launchedAt, 'launched')] : [])),
  };
}

const oneDecimal = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });

/** A duration for people: "58.4 s" under two minutes, "34 min 55 s" above. */
export function formatDuration(seconds: number): string {
  const abs = Math.abs(seconds);
  if (abs < 120) return `${oneDecimal.format(abs)} s`;
  const whole = Math.round(abs);
  return `${Math.floor(whole / 60)} min ${String(whole % 60).padStart(2, '0')} s`;
}

/** Actual against planned: "+12.5 s" late, "−3.0 s" early, "as planned" within a twentieth of a second. */
export function formatDelta(seconds: number | null): string {
  if (seconds === null) return '—';
  if (Math.abs(seconds) < 0.05) return 'as planned';
  return `${seconds > 0 ? '+' : '−'}${formatDuration(seconds)}`;
}

/** The chart's text alternative: per catapult, how many launched, when, and how far from the plan. */
export function timelineSummary(report: CycleReport): string {
  const lines = report.catapults
    .filter((catapult) => catapult.launches.length > 0)
    .map((catapult) => {
      const launched = catapult.launches.filter((launch) => launch.launchedAt !== null);
      const deltas = launched.flatMap((launch) => (launch.deltaS === null ? [] : [launch.deltaS]));
      const mean = deltas.length > 0 ? deltas.reduce((sum, value) => sum + value, 0) / deltas.length : null;
      const span =
        launched.length > 0
          ? `, from ${shipClock(launched[0].launchedAt!, report.cycle.timeZone)} to ${shipClock(launched.at(-1)!.launchedAt!, report.cycle.timeZone)}`
          : '';
      const against = mean === null ? '' : `, on average ${formatDelta(mean)} against the plan`;
      return `Cat ${catapult.number}: ${launched.length} of ${catapult.launches.length} launched${span}${against}.`;
    });
  return lines.length > 0 ? lines.join(' ') : 'No aircraft were planned on a catapult in this cycle.';
}
