import type { ReactNode } from 'react';
import { Heading, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import type {
  CatapultTimeline,
  CycleReport,
  IntervalSpread,
  LaunchInterval,
  PairTimeline,
  ReportDown,
  ReportWaiver,
  ReportSuspend,
  SquadronReport,
} from '@catline/contracts';
import { FigureStat } from '../../../components/figure-stat.js';
import { shipClockIn, type ShipClock } from '../../../lib/ship-time.js';
import { formatDuration } from '../report-model.js';
import { ReportTable, type ReportColumn } from './report-table.js';

export function ReportSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Stack as="section" aria-label={title} gap="2" minW="0">
      <Heading as="h2" size="md">
        {title}
      </Heading>
      {children}
    </Stack>
  );
}

function basisSentence(report: CycleReport, { clock, time }: ShipClock): string {
  const window = `the launch window ${time(report.cycle.windowStartAt)}–${time(report.cycle.windowEndAt)}`;
  if (report.plannedBasis === 'cycle_start' && report.startedAt) {
    return `Planned times are those projected when the cycle started (${clock(report.startedAt)}, change ${report.plannedAtVersion}); launches are judged against ${window}.`;
  }
  return `The cycle has not started: planned times are its latest projection (change ${report.plannedAtVersion}); launches are judged against ${window}.`;
}

/** The cycle's totals at a glance, and what the planned times mean. */
export function ReportSummary({ report }: { report: CycleReport }) {
  const { totals } = report;
  const shipClock = shipClockIn(report.cycle.timeZone);
  return (
    <Stack gap="2">
      <SimpleGrid columns={{ base: 2, sm: 4, lg: 8 }} gap="3" data-testid="report-totals">
        <FigureStat label="Launched" value={`${totals.launched} of ${totals.aircraft}`} size="md" />
        <FigureStat
          label="Inside window"
          value={totals.onTime}
          tone={totals.onTime === totals.launched ? 'go' : undefined}
          size="md"
        />
        <FigureStat
          label="Outside window"
          value={totals.outsideWindow}
          tone={totals.outsideWindow > 0 ? 'nogo' : undefined}
          size="md"
        />
        <FigureStat
          label="Suspends"
          value={totals.suspends}
          tone={totals.suspends > 0 ? 'caution' : undefined}
          size="md"
        />
        <FigureStat label="Down" value={totals.down} tone={totals.down > 0 ? 'caution' : undefined} size="md" />
        <FigureStat
          label="Waivers"
          value={totals.waivers}
          tone={totals.waivers > 0 ? 'caution' : undefined}
          size="md"
        />
        <FigureStat label="First launch" value={shipClock.optionalClock(report.firstLaunchAt)} size="md" />
        <FigureStat label="Last launch" value={shipClock.optionalClock(report.lastLaunchAt)} size="md" />
      </SimpleGrid>
      <Text fontSize="sm" color="fg.muted">
        {basisSentence(report, shipClock)}
      </Text>
    </Stack>
  );
}

const spreadText = (spread: IntervalSpread) =>
  spread.meanS === null
    ? '—'
    : `${formatDuration(spread.shortestS!)} / ${formatDuration(spread.meanS)} / ${formatDuration(spread.longestS!)}`;

const intervalList = (intervals: LaunchInterval[]) =>
  intervals.length === 0
    ? '—'
    : intervals
        .map((interval) => `${interval.fromSideNumber}→${interval.toSideNumber} ${formatDuration(interval.seconds)}`)
        .join(', ');

const catapultColumns: ReportColumn<CatapultTimeline>[] = [
  { header: 'Cat', cell: (catapult) => `${catapult.number} (${catapult.position})` },
  {
    header: 'Launched',
    cell: (catapult) => catapult.launches.filter((launch) => launch.launchedAt !== null).length,
    numeric: true,
  },
  { header: 'Reset interval', cell: (catapult) => formatDuration(catapult.resetIntervalS), numeric: true },
  { header: 'Shortest / mean / longest', cell: (catapult) => spreadText(catapult.spread), numeric: true },
  { header: 'Between launches', cell: (catapult) => intervalList(catapult.intervals) },
];

const pairColumns: ReportColumn<PairTimeline>[] = [
  { header: 'Pair', cell: (pair) => `Cats ${pair.catapultNumbers.join(' and ')}` },
  { header: 'Minimum gap', cell: (pair) => formatDuration(pair.minimumGapS), numeric: true },
  { header: 'Shortest / mean / longest', cell: (pair) => spreadText(pair.spread), numeric: true },
  { header: 'Between launches', cell: (pair) => intervalList(pair.intervals) },
];

export function IntervalsSection({ report }: { report: CycleReport }) {
  return (
    <ReportSection title="Intervals between launches">
      <ReportTable
        caption="Intervals per catapult"
        rows={report.catapults}
        columns={catapultColumns}
        rowKey={(catapult) => catapult.catapultId}
        empty="No catapult."
      />
      <ReportTable
        caption="Intervals per catapult pair"
        rows={report.pairs}
        columns={pairColumns}
        rowKey={(pair) => pair.pair}
        empty="No catapult pair."
      />
    </ReportSection>
  );
}

const suspendColumns = ({ clock, optionalClock }: ShipClock): ReportColumn<ReportSuspend>[] => [
  { header: 'Side', cell: (event) => `${event.sideNumber} (${event.squadronCode})` },
  { header: 'Cat', cell: (event) => event.catapultNumber ?? '—', numeric: true },
  { header: 'Suspended', cell: (event) => clock(event.at), numeric: true },
  { header: 'Resumed', cell: (event) => optionalClock(event.resumedAt), numeric: true },
  { header: 'Reason', cell: (event) => event.reason },
  { header: 'By', cell: (event) => event.by },
];

const downColumns = ({ clock }: ShipClock): ReportColumn<ReportDown>[] => [
  { header: 'Down', cell: (event) => `${event.sideNumber} (${event.squadronCode})` },
  { header: 'Cat', cell: (event) => event.catapultNumber ?? 'pool', numeric: true },
  { header: 'At', cell: (event) => clock(event.at), numeric: true },
  {
    header: 'Spare in its place',
    cell: (event) => (event.spare ? `${event.spare.sideNumber} (${event.spare.squadronCode})` : 'none'),
  },
  { header: 'By', cell: (event) => event.by },
];

const waiverColumns = ({ clock }: ShipClock): ReportColumn<ReportWaiver>[] => [
  { header: 'Side', cell: (event) => `${event.sideNumber} (${event.squadronCode})` },
  { header: 'Cat', cell: (event) => event.catapultNumber, numeric: true },
  { header: 'Launched', cell: (event) => clock(event.launchedAt), numeric: true },
  { header: 'Reason', cell: (event) => event.reason },
  { header: 'By', cell: (event) => event.by ?? '—' },
];

export function EventsSection({ report }: { report: CycleReport }) {
  const shipClock = shipClockIn(report.cycle.timeZone);
  return (
    <SimpleGrid columns={{ base: 1, lg: 2 }} gap="4">
      <ReportSection title="Suspends">
        <ReportTable
          caption="Suspends"
          rows={report.suspends}
          columns={suspendColumns(shipClock)}
          rowKey={(event) => `${event.slotId}-${event.at}`}
          empty="No launch was suspended."
        />
      </ReportSection>
      <ReportSection title="Down aircraft and spares">
        <ReportTable
          caption="Down aircraft and spares"
          rows={report.downs}
          columns={downColumns(shipClock)}
          rowKey={(event) => event.slotId}
          empty="No aircraft went down."
        />
      </ReportSection>
      <ReportSection title="Launches on a waiver">
        <ReportTable
          caption="Launches on a waiver"
          rows={report.waivers}
          columns={waiverColumns(shipClock)}
          rowKey={(event) => event.slotId}
          empty="No launch needed a waiver."
        />
      </ReportSection>
    </SimpleGrid>
  );
}

const squadronColumns: ReportColumn<SquadronReport>[] = [
  { header: 'Squadron', cell: (squadron) => `${squadron.squadronName} (${squadron.squadronCode})` },
  { header: 'Aircraft', cell: (squadron) => squadron.aircraft, numeric: true },
  { header: 'Launched', cell: (squadron) => squadron.launched, numeric: true },
  { header: 'Inside window', cell: (squadron) => squadron.onTime, numeric: true },
  { header: 'Outside window', cell: (squadron) => squadron.outsideWindow, numeric: true },
  { header: 'Suspends', cell: (squadron) => squadron.suspends, numeric: true },
  { header: 'Down', cell: (squadron) => squadron.down, numeric: true },
  { header: 'Waivers', cell: (squadron) => squadron.waivers, numeric: true },
  { header: 'Scratched', cell: (squadron) => squadron.scratched, numeric: true },
];

export function SquadronsSection({ report }: { report: CycleReport }) {
  return (
    <ReportSection title="Per squadron">
      <ReportTable
        caption="Figures per squadron"
        rows={report.squadrons}
        columns={squadronColumns}
        rowKey={(squadron) => squadron.squadronId}
        empty="No aircraft in this cycle."
      />
    </ReportSection>
  );
}
