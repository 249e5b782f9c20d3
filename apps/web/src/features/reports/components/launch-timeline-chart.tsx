import { useId, useMemo } from 'react';
import { Box, Text } from '@chakra-ui/react';
import {
  CartesianGrid,
  Legend,
  ReferenceLine,
  Scatter,
  ScatterChart,
  Tooltip,
  XAxis,
  YAxis,
  type TooltipContentProps,
} from 'recharts';
import type { CycleReport } from '@catline/contracts';
import { EmptyState } from '../../../components/query-states.js';
import { useShipClock } from '../../../lib/ship-time.js';
import { timelinePoints, timelineSummary, type TimelinePoint } from '../report-model.js';

// This file is the only one that imports recharts: it loads with the reports route, never with the shell.

const colour = {
  actual: 'var(--chakra-colors-accent-solid)',
  planned: 'var(--chakra-colors-fg-muted)',
  grid: 'var(--chakra-colors-border-muted)',
  text: 'var(--chakra-colors-fg-muted)',
  window: 'var(--chakra-colors-caution-fg)',
};

const MARGIN_MS = 30_000;

interface MarkProps {
  cx?: number;
  cy?: number;
  payload?: TimelinePoint;
}

/** A launch as flown: a filled dot carrying its own accessible label. */
function ActualMark({ cx, cy, payload }: MarkProps) {
  if (cx === undefined || cy === undefined || !payload) return null;
  return (
    <circle
      cx={cx}
      cy={cy}
      r={6}
      style={{ fill: colour.actual }}
      data-testid="launch-mark"
      data-side={payload.side}
      aria-label={payload.label}
    >
      <title>{payload.label}</title>
    </circle>
  );
}

/** A launch as planned when the cycle started: a hollow diamond. */
function PlannedMark({ cx, cy, payload }: MarkProps) {
  if (cx === undefined || cy === undefined || !payload) return null;
  return (
    <path
      d={`M${cx} ${cy - 7}L${cx + 7} ${cy}L${cx} ${cy + 7}L${cx - 7} ${cy}Z`}
      style={{ fill: 'var(--chakra-colors-bg-panel)', stroke: colour.planned, strokeWidth: 2 }}
      data-testid="planned-mark"
      data-side={payload.side}
      aria-label={payload.label}
    >
      <title>{payload.label}</title>
    </path>
  );
}

function PointTooltip({ active, payload }: TooltipContentProps) {
  const point = payload?.[0]?.payload as TimelinePoint | undefined;
  if (!active || !point) return null;
  return (
    <Box bg="bg.panel" borderWidth="1px" rounded="card" px="2" py="1" fontSize="sm" boxShadow="md">
      {point.label}
    </Box>
  );
}

/** Planned against actual launch times, one row per catapult, with a text alternative beneath. */
export function LaunchTimelineChart({ report }: { report: CycleReport }) {
  const { clock } = useShipClock();
  const summaryId = useId();
  const { planned, actual } = useMemo(() => timelinePoints(report), [report]);
  const times = [...planned, ...actual].map((point) => point.time);
  if (times.length === 0) {
    return (
      <EmptyState title="Nothing to draw">No aircraft was planned on a catapult or launched in this cycle.</EmptyState>
    );
  }
  const numbers = report.catapults.map((catapult) => catapult.number);
  const plannedBySlot = new Map(planned.map((point) => [point.slotId, point]));
  const title = `Cycle ${report.cycle.number}: planned and actual launch times per catapult`;

  return (
    <Box as="figure" m="0" minW="0" aria-describedby={summaryId} data-testid="launch-timeline">
      <Text as="figcaption" fontWeight="700" mb="1">
        {title}
      </Text>
      <ScatterChart
        responsive
        style={{ width: '100%', height: 90 + 56 * numbers.length }}
        margin={{ top: 8, right: 16, bottom: 24, left: 8 }}
        title={title}
        desc={timelineSummary(report)}
      >
        <CartesianGrid stroke={colour.grid} strokeDasharray="3 3" />
        <XAxis
          type="number"
          dataKey="time"
          name="Time"
          domain={[Math.min(...times) - MARGIN_MS, Math.max(...times) + MARGIN_MS]}
          tickFormatter={(value: number) => clock(new Date(value))}
          tick={{ fill: colour.text, fontSize: 12 }}
          stroke={colour.text}
          label={{
            value: 'Time (hh:mm:ss, this device)',
            position: 'insideBottom',
            offset: -16,
            fill: colour.text,
            fontSize: 12,
          }}
        />
        <YAxis
          type="number"
          dataKey="catapult"
          name="Catapult"
          domain={[0.5, Math.max(...numbers) + 0.5]}
          ticks={numbers}
          reversed
          width={72}
          tickFormatter={(value: number) => `Cat ${value}`}
          tick={{ fill: colour.text, fontSize: 12 }}
          stroke={colour.text}
          label={{ value: 'Catapult', angle: -90, position: 'insideLeft', fill: colour.text, fontSize: 12 }}
        />
        <ReferenceLine
          x={Date.parse(report.cycle.windowStartAt)}
          stroke={colour.window}
          strokeDasharray="6 3"
          label={{ value: 'Window opens', fill: colour.window, fontSize: 11, position: 'insideTopRight' }}
        />
        <ReferenceLine
          x={Date.parse(report.cycle.windowEndAt)}
          stroke={colour.window}
          strokeDasharray="6 3"
          label={{ value: 'Window closes', fill: colour.window, fontSize: 11, position: 'insideTopLeft' }}
        />
        {actual.flatMap((point) => {
          const plan = plannedBySlot.get(point.slotId);
          return plan
            ? [
                <ReferenceLine
                  key={point.slotId}
                  segment={[
                    { x: plan.time, y: plan.catapult },
                    { x: point.time, y: point.catapult },
                  ]}
                  stroke={colour.planned}
                  ifOverflow="extendDomain"
                />,
              ]
            : [];
        })}
        <Tooltip content={PointTooltip} cursor={false} />
        <Legend verticalAlign="top" height={28} />
        <Scatter
          name="Planned at the start"
          data={planned}
          shape={PlannedMark}
          legendType="diamond"
          fill={colour.planned}
          isAnimationActive={false}
        />
        <Scatter
          name="Launched"
          data={actual}
          shape={ActualMark}
          legendType="circle"
          fill={colour.actual}
          isAnimationActive={false}
        />
      </ScatterChart>
      <Text id={summaryId} fontSize="sm" color="fg.muted" mt="1" data-testid="timeline-summary">
        {timelineSummary(report)}
      </Text>
    </Box>
  );
}
