import { Global } from '@emotion/react';
import { Box, Button, Heading, HStack, Stack, Table, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router-dom';
import {
  isLandingAreaInUse,
  shipClock,
  shipTime,
  type CycleView,
  type LaneView,
  type LineupSnapshot,
  type SlotView,
} from '@catline/contracts';
import { CautionLine } from '../../../components/caution-line.js';
import { CyclePicker } from '../../../components/cycle-picker.js';
import { GoBadge } from '../../../components/go-badge.js';
import { EmptyState, LoadingState, QueryView } from '../../../components/query-states.js';
import { formatDegrees, formatKnots, formatPounds, formatSignedKnots, formatWhole } from '../../../lib/format.js';
import { useLiveCycle } from '../../../lib/live/use-live-cycle.js';
import { useShips } from '../../../lib/queries/ships-query.js';
import { useViewedCycle } from '../../../lib/queries/use-viewed-cycle.js';
import { ShipTimeZone, useShipClock } from '../../../lib/ship-time.js';
import { useNow } from '../../../lib/use-now.js';
import { TableScroll } from '../../../components/table-scroll.js';

// Printed, the sheet is the page: the app's header and menus go, colours turn to black on white, a
// catapult's table is kept on one page when it fits and its header repeats when it does not.
const printStyles = `
  @page { size: auto; margin: 12mm; }
  @media print {
    html, body { background: #fff !important; }
    #root header, nav[aria-label="Screens"], .no-print { display: none !important; }
    main { padding: 0 !important; }
    .launch-sheet, .launch-sheet * {
      color: #000 !important;
      background: transparent !important;
      border-color: #777 !important;
      box-shadow: none !important;
    }
    .launch-sheet { font-size: 9pt; }
    .launch-sheet h1 { font-size: 14pt; }
    .launch-sheet .sheet-lane { break-inside: avoid-page; }
    .launch-sheet .sheet-table-wrap { overflow: visible !important; border: none !important; }
    .launch-sheet table { width: 100%; table-layout: fixed; }
    .launch-sheet th, .launch-sheet td { padding: 1.5pt 3pt !important; font-size: 8.5pt; white-space: normal !important; }
    .launch-sheet td { overflow-wrap: anywhere; }
    .launch-sheet th { vertical-align: bottom; }
    .launch-sheet thead { display: table-header-group; }
    .launch-sheet tr { break-inside: avoid; }
  }
`;

/** Each column's share of the printed width, so every catapult's table lines up with the others. */
const COLUMN_WIDTHS: Record<string, string> = {
  '#': '3%',
  Side: '5%',
  Type: '5%',
  Sqn: '5%',
  Pilot: '10.5%',
  Time: '8.5%',
  'Gross weight': '9.5%',
  Setting: '6.5%',
  'End speed': '8%',
  'Req. WOD': '7.5%',
  Margin: '7.5%',
  // A non-breaking hyphen: the header wraps after the slash, not inside no-go.
  'Go / no\u2011go': '7.5%',
  Trim: '5.5%',
  Afterburner: '11.5%',
};
const COLUMNS = Object.keys(COLUMN_WIDTHS);
const NUMERIC = new Set(['#', 'Time', 'Gross weight', 'Setting', 'End speed', 'Req. WOD', 'Margin', 'Trim']);

function conditionsLine(cycle: CycleView): string {
  return [
    `Ship ${formatWhole(cycle.shipCourseDeg)}° at ${formatWhole(cycle.shipSpeedKt)} kt`,
    `true wind from ${formatWhole(cycle.trueWindFromDeg)}° at ${formatWhole(cycle.trueWindSpeedKt)} kt`,
    `${cycle.temperatureC} °C, ${cycle.pressureHpa} hPa`,
    `case ${cycle.weatherCase}, ${cycle.night ? 'night' : 'day'}`,
    isLandingAreaInUse(cycle.landingArea)
      ? `landing area ${cycle.landingArea}${cycle.landingAreaReason ? ` (${cycle.landingAreaReason})` : ''}, its catapults paused`
      : null,
    `planned launch ${shipTime(cycle.plannedLaunchAt, cycle.timeZone)}, window ${shipTime(cycle.windowStartAt, cycle.timeZone)}–${shipTime(cycle.windowEndAt, cycle.timeZone)}`,
  ]
    .filter(Boolean)
    .join(' · ');
}

function laneHeading(lane: LaneView): string {
  const cross =
    lane.crosswindSide === 'none'
      ? 'no crosswind'
      : `crosswind ${formatKnots(lane.crosswindKt)} from ${lane.crosswindSide}`;
  const state = lane.status === 'down' ? ' · DOWN' : lane.closed ? ' · CLOSED' : '';
  return `Cat ${lane.number} · ${lane.position} · headwind ${formatKnots(lane.headwindKt)}, ${cross}${state}`;
}

function SheetRow({ slot, place }: { slot: SlotView; place: number }) {
  const { clock, optionalClock } = useShipClock();
  const figures = slot.figures;
  const cells = [
    place,
    <Text as="span" fontWeight="700" key="side">
      {slot.sideNumber}
    </Text>,
    slot.typeDesignation,
    slot.squadronCode,
    slot.pilotName ?? '—',
    slot.launchedAt ? `Off ${clock(slot.launchedAt)}` : optionalClock(slot.projectedLaunchAt),
    formatPounds(slot.launchRecord?.grossWeightLb ?? slot.grossWeightLb),
    figures?.catapultSetting ?? 'None approved',
    figures ? formatKnots(figures.endSpeedKt) : '—',
    formatKnots(figures?.requiredWindOverDeckKt ?? null),
    formatSignedKnots(figures?.marginKt ?? null),
    figures ? <GoBadge verdict={figures.go ? 'go' : 'nogo'} key="go" /> : '—',
    slot.trimDeg === null ? '—' : formatDegrees(slot.trimDeg),
    slot.afterburnerRequired ? 'Required' : 'No',
  ];
  return (
    <Table.Row data-testid="sheet-row" data-side-number={slot.sideNumber}>
      {cells.map((cell, i) => (
        <Table.Cell
          key={COLUMNS[i]}
          textAlign={NUMERIC.has(COLUMNS[i]) ? 'end' : 'start'}
          textStyle={NUMERIC.has(COLUMNS[i]) ? 'figure' : undefined}
          whiteSpace="nowrap"
        >
          {cell}
        </Table.Cell>
      ))}
    </Table.Row>
  );
}

function SheetLane({ lane, slots }: { lane: LaneView; slots: Map<number, SlotView> }) {
  const lineup = lane.slotIds.map((id) => slots.get(id)!);
  const noGo = lineup.filter((slot) => slot.status !== 'launched' && slot.figures && !slot.figures.go);
  return (
    <Stack as="section" className="sheet-lane" aria-label={`Cat ${lane.number}`} gap="1.5" data-testid="sheet-lane">
      <Heading as="h2" size="sm">
        {laneHeading(lane)}
      </Heading>
      {lineup.length === 0 ? (
        <Text fontSize="sm" color="fg.muted">
          No aircraft on this catapult.
        </Text>
      ) : (
        <TableScroll label={`Launch order on cat ${lane.number}`} className="sheet-table-wrap">
          <Table.Root size="sm">
            <Table.Caption srOnly>{`Launch order on cat ${lane.number}`}</Table.Caption>
            <colgroup>
              {COLUMNS.map((column) => (
                <col key={column} style={{ width: COLUMN_WIDTHS[column] }} />
              ))}
            </colgroup>
            <Table.Header>
              <Table.Row bg="bg.muted">
                {COLUMNS.map((column) => (
                  <Table.ColumnHeader
                    key={column}
                    textAlign={NUMERIC.has(column) ? 'end' : 'start'}
                    whiteSpace="nowrap"
                  >
                    {column}
                  </Table.ColumnHeader>
                ))}
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {lineup.map((slot, index) => (
                <SheetRow key={slot.id} slot={slot} place={index + 1} />
              ))}
            </Table.Body>
          </Table.Root>
        </TableScroll>
      )}
      {noGo.map((slot) => (
        <Text key={slot.id} fontSize="sm" color="nogo.fg">
          {slot.sideNumber} no-go: {slot.figures!.reasons.map((reason) => reason.message).join(' ')}
        </Text>
      ))}
    </Stack>
  );
}

function Sheet({ snapshot, shipName }: { snapshot: LineupSnapshot; shipName: string | undefined }) {
  const slots = new Map(snapshot.slots.map((slot) => [slot.id, slot]));
  const pool = snapshot.pool.map((id) => slots.get(id)!);
  const { cycle } = snapshot;
  const now = useNow(10_000);
  return (
    <Stack gap="3" className="launch-sheet" data-testid="launch-sheet">
      <Stack gap="0.5">
        <Heading as="h1" size="xl">
          Launch sheet · Cycle {cycle.number}
          {shipName ? ` · ${shipName}` : ''}
        </Heading>
        <Text fontSize="sm">{conditionsLine(cycle)}</Text>
        <Text fontSize="xs" color="fg.muted">
          The lineup at change {snapshot.version} ({cycle.state}); printed {shipClock(new Date(now), cycle.timeZone)}.
          Times are the ship's clock.
        </Text>
      </Stack>
      <CautionLine />
      {snapshot.lanes.map((lane) => (
        <SheetLane key={lane.catapultId} lane={lane} slots={slots} />
      ))}
      <Text fontSize="sm">
        <Text as="span" fontWeight="700">
          Deck pool (in no lane):{' '}
        </Text>
        {pool.length === 0
          ? 'none'
          : pool.map((slot) => `${slot.sideNumber}${slot.spare ? ' (spare)' : ''}`).join(', ')}
      </Text>
    </Stack>
  );
}

function SheetForCycle({ cycle }: { cycle: CycleView }) {
  const { lineup } = useLiveCycle(cycle.id);
  const ships = useShips();
  const shipName = ships.data?.find((ship) => ship.id === cycle.shipId)?.name;
  return (
    <QueryView query={lineup}>
      {(snapshot) => (
        <ShipTimeZone zone={snapshot.cycle.timeZone}>
          <Sheet snapshot={snapshot} shipName={shipName} />
        </ShipTimeZone>
      )}
    </QueryView>
  );
}

/** The planned lineup per catapult with each aircraft's launch figures, laid out to print on A4 or US Letter. */
export function LaunchSheetScreen() {
  const { cycles, cycle, choose, finding } = useViewedCycle();
  return (
    <Stack gap="3">
      <Global styles={printStyles} />
      <HStack gap="2" wrap="wrap" justify="space-between" className="no-print">
        <QueryView query={cycles}>
          {(list) => <CyclePicker cycles={list} value={cycle?.id} onChange={choose} />}
        </QueryView>
        <HStack gap="2">
          {cycle && (
            <Button asChild size="sm" variant="outline">
              <RouterLink to={`/reports?cycle=${cycle.id}`}>Report</RouterLink>
            </Button>
          )}
          <Button size="sm" colorPalette="accent" onClick={() => window.print()} disabled={!cycle}>
            Print
          </Button>
        </HStack>
      </HStack>
      <Box>
        {cycle ? (
          <SheetForCycle key={cycle.id} cycle={cycle} />
        ) : finding ? (
          <LoadingState label="Finding the current cycle…" />
        ) : (
          <EmptyState title="No cycles yet">A launch sheet needs a cycle with a lineup.</EmptyState>
        )}
      </Box>
    </Stack>
  );
}
