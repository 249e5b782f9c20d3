import { Badge, Text } from '@chakra-ui/react';
import type { CycleReport, ReportLaunch } from '@catline/contracts';
import { SlotStatusBadge } from '../../../components/slot-status-badge.js';
import { formatKnots, formatPounds, formatSignedKnots } from '../../../lib/format.js';
import { shipClockIn, type ShipClock } from '../../../lib/ship-time.js';
import { formatDelta, timelineLaunches } from '../report-model.js';
import { ReportTable, type ReportColumn } from './report-table.js';

export const LAUNCH_TABLE_CAPTION = 'Launches, planned against actual';

function WindowVerdict({ inWindow }: { inWindow: boolean | null }) {
  if (inWindow === null) return <Text color="fg.muted">—</Text>;
  return (
    <Badge colorPalette={inWindow ? 'go' : 'nogo'} variant="surface">
      {inWindow ? 'Inside' : 'Outside'}
    </Badge>
  );
}

const columns = ({ optionalClock }: ShipClock): ReportColumn<ReportLaunch>[] => [
  { header: 'Cat', cell: (launch) => launch.catapultNumber, numeric: true },
  { header: 'Side', cell: (launch) => <Text fontWeight="700">{launch.sideNumber}</Text> },
  { header: 'Type', cell: (launch) => launch.typeDesignation },
  { header: 'Sqn', cell: (launch) => launch.squadronCode },
  { header: 'Planned', cell: (launch) => optionalClock(launch.plannedAt), numeric: true },
  { header: 'Launched', cell: (launch) => optionalClock(launch.launchedAt), numeric: true },
  { header: 'Against plan', cell: (launch) => formatDelta(launch.deltaS), numeric: true },
  { header: 'Window', cell: (launch) => <WindowVerdict inWindow={launch.inWindow} /> },
  { header: 'Status', cell: (launch) => <SlotStatusBadge status={launch.status} /> },
  // What was used at the shot, as the launch record froze it; nothing worked out again from today's wind.
  {
    header: 'Weight used',
    cell: (launch) => (launch.launchRecord ? formatPounds(launch.launchRecord.grossWeightLb) : '—'),
    numeric: true,
  },
  { header: 'Headwind', cell: (launch) => formatKnots(launch.launchRecord?.headwindKt ?? null), numeric: true },
  { header: 'End speed', cell: (launch) => formatKnots(launch.launchRecord?.endSpeedKt ?? null), numeric: true },
  {
    header: 'Excess WOD',
    cell: (launch) => formatSignedKnots(launch.launchRecord?.excessWindOverDeckKt ?? null),
    numeric: true,
  },
  { header: 'Margin', cell: (launch) => formatSignedKnots(launch.launchRecord?.excessWindKt ?? null), numeric: true },
  { header: 'Fired by', cell: (launch) => launch.launchRecord?.firedBy?.name ?? '—' },
];

/** The timeline's launches as a table, in the chart's order: by catapult, then by launch. */
export function LaunchTable({ report }: { report: CycleReport }) {
  return (
    <ReportTable
      caption={LAUNCH_TABLE_CAPTION}
      rows={timelineLaunches(report)}
      columns={columns(shipClockIn(report.cycle.timeZone))}
      rowKey={(launch) => launch.slotId}
      empty="No aircraft was planned on a catapult in this cycle."
    />
  );
}
