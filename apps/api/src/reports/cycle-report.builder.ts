import type {
  CatapultTimeline,
  CycleReport,
  LineupChange,
  PairTimeline,
  ReportDown,
  ReportLaunch,
  ReportWaiver,
  ReportSuspend,
  SquadronReport,
} from '@catline/contracts';
import { toCycleView } from '../cycle-changes/cycle.mapper.js';
import { countedSlots } from '../cycle-changes/lineup-snapshot.builder.js';
import type { Slot } from '../database/entities/slot.entity.js';
import type { LineupState } from '../cycle-changes/lineup-state.js';
import { readChangeLog, type ChangeLogReading } from './change-log-reading.js';
import {
  countFigures,
  insideWindow,
  intervalSpread,
  launchIntervals,
  secondsBetween,
  type FlownLaunch,
} from './report-figures.js';

/** A cycle's record as read at one version: its state and every change up to that version. */
export interface CycleRecord {
  state: LineupState;
  changes: LineupChange[];
}

/** A slot's line before it is placed on a catapult's timeline (aircraft that never were in a lane have no catapult). */
type SlotLine = Omit<ReportLaunch, 'catapultNumber'> & { catapultNumber: number | null };

interface PlannedPlace {
  catapultId: number;
  at: string | null;
}

/**
 * Where a slot was planned to launch at the basis. A spare that was still in the deck pool then
 * inherits the planned place of the down aircraft whose place it took.
 */
function plannedPlace(slot: Slot, state: LineupState, log: ChangeLogReading): PlannedPlace | null {
  const placeOf = (slotId: number): PlannedPlace | null => {
    const view = log.plannedViews.get(slotId);
    return view?.catapultId == null ? null : { catapultId: view.catapultId, at: view.projectedLaunchAt };
  };
  const own = placeOf(slot.id);
  if (own) return own;
  const replaced = state.slots.find((other) => other.replacedBySlotId === slot.id);
  return replaced ? placeOf(replaced.id) : null;
}

const iso = (instant: Date | null) => instant?.toISOString() ?? null;

function byLaunchThenPlan(a: SlotLine, b: SlotLine): number {
  const time = (value: string | null) => (value === null ? Number.POSITIVE_INFINITY : Date.parse(value));
  if (a.launchedAt !== null || b.launchedAt !== null)
    return time(a.launchedAt) - time(b.launchedAt) || a.slotId - b.slotId;
  return time(a.plannedAt) - time(b.plannedAt) || a.sideNumber.localeCompare(b.sideNumber, 'en', { numeric: true });
}

const flown = (lines: readonly SlotLine[]): FlownLaunch[] =>
  lines.flatMap((line) =>
    line.launchedAt !== null && line.catapultNumber !== null
      ? [
          {
            slotId: line.slotId,
            sideNumber: line.sideNumber,
            catapultNumber: line.catapultNumber,
            launchedAtMs: Date.parse(line.launchedAt),
          },
        ]
      : [],
  );

/** The report of a cycle from its record; pure, so the same record always gives the same report. */
export function buildCycleReport({ state, changes }: CycleRecord): CycleReport {
  const { cycle } = state;
  const log = readChangeLog(changes);
  const numbers = new Map(state.catapults.map((catapult) => [catapult.id, catapult.number]));
  const numberOf = (catapultId: number | null) => (catapultId === null ? null : (numbers.get(catapultId) ?? null));
  const window = { startAt: cycle.windowStartAt.toISOString(), endAt: cycle.windowEndAt.toISOString() };
  const slotById = new Map(state.slots.map((slot) => [slot.id, slot]));

  const lines: SlotLine[] = state.slots.map((slot) => {
    const planned = plannedPlace(slot, state, log);
    const launchedAt = iso(slot.launchedAt);
    const plannedAt = planned?.at ?? null;
    return {
      slotId: slot.id,
      sideNumber: slot.aircraft.sideNumber,
      typeDesignation: slot.aircraft.type.designation,
      squadronId: slot.aircraft.squadronId,
      squadronCode: slot.aircraft.squadron.code,
      pilotName: slot.pilot?.name ?? null,
      mission: slot.mission,
      catapultNumber: numberOf(slot.catapultId) ?? numberOf(planned?.catapultId ?? null),
      plannedCatapultNumber: numberOf(planned?.catapultId ?? null),
      plannedAt,
      launchedAt,
      deltaS: plannedAt !== null && launchedAt !== null ? secondsBetween(plannedAt, launchedAt) : null,
      inWindow: launchedAt === null ? null : insideWindow(launchedAt, window),
      status: slot.status,
      waiverReason: slot.status === 'launched' ? slot.overrideReason : null,
      launchRecord: slot.status === 'launched' ? slot.launchRecord : null,
    };
  });

  const catapults: CatapultTimeline[] = state.catapults.map((catapult) => {
    const own = lines
      .filter((line): line is ReportLaunch => line.catapultNumber === catapult.number)
      .sort(byLaunchThenPlan);
    const intervals = launchIntervals(flown(own));
    return {
      catapultId: catapult.id,
      number: catapult.number,
      position: catapult.position,
      pair: catapult.pair,
      resetIntervalS: catapult.resetIntervalS,
      launches: own,
      intervals,
      spread: intervalSpread(intervals),
    };
  });

  const pairs: PairTimeline[] = [...new Set(state.catapults.map((catapult) => catapult.pair))]
    .sort((a, b) => a - b)
    .map((pair) => {
      const members = state.catapults.filter((catapult) => catapult.pair === pair).map((catapult) => catapult.number);
      const intervals = launchIntervals(
        flown(lines.filter((line) => line.catapultNumber !== null && members.includes(line.catapultNumber))),
      );
      return {
        pair,
        catapultNumbers: members,
        minimumGapS: state.ship.pairGapS,
        intervals,
        spread: intervalSpread(intervals),
      };
    });

  const aircraftOf = (slotId: number) => {
    const slot = slotById.get(slotId)!;
    return { slotId, sideNumber: slot.aircraft.sideNumber, squadronCode: slot.aircraft.squadron.code };
  };

  const suspends: ReportSuspend[] = log.suspends.map((event) => ({
    ...aircraftOf(event.slotId),
    catapultNumber: numberOf(event.catapultId),
    at: event.at,
    reason: event.reason,
    by: event.by,
    resumedAt: event.resumedAt,
  }));

  const downs: ReportDown[] = log.downs.map((event) => {
    const spareId = slotById.get(event.slotId)!.replacedBySlotId;
    return {
      ...aircraftOf(event.slotId),
      catapultNumber: numberOf(event.catapultId),
      at: event.at,
      by: event.by,
      spare: spareId === null ? null : aircraftOf(spareId),
    };
  });

  const waivers: ReportWaiver[] = lines.flatMap((line) =>
    line.waiverReason !== null && line.launchedAt !== null && line.catapultNumber !== null
      ? [
          {
            slotId: line.slotId,
            sideNumber: line.sideNumber,
            squadronCode: line.squadronCode,
            catapultNumber: line.catapultNumber,
            launchedAt: line.launchedAt,
            reason: line.waiverReason,
            by: log.launchedBy.get(line.slotId) ?? null,
          },
        ]
      : [],
  );

  const suspendsOf = (slotIds: Set<number>) => log.suspends.filter((event) => slotIds.has(event.slotId)).length;
  const squadrons: SquadronReport[] = [
    ...new Map(state.slots.map((slot) => [slot.aircraft.squadronId, slot.aircraft.squadron])).values(),
  ]
    .sort((a, b) => a.code.localeCompare(b.code))
    .map((squadron) => {
      const own = lines.filter((line) => line.squadronId === squadron.id);
      return {
        squadronId: squadron.id,
        squadronCode: squadron.code,
        squadronName: squadron.name,
        ...countFigures(own, suspendsOf(new Set(own.map((line) => line.slotId)))),
      };
    });

  const launchTimes = lines.flatMap((line) => (line.launchedAt === null ? [] : [line.launchedAt])).sort();
  return {
    cycle: toCycleView(cycle, state.ship.profile, {
      slotCount: countedSlots(state).length,
      launchedCount: lines.filter((line) => line.status === 'launched').length,
    }),
    plannedBasis: log.plannedBasis,
    plannedAtVersion: log.plannedAtVersion,
    startedAt: log.startedAt,
    closedAt: log.closedAt,
    firstLaunchAt: launchTimes[0] ?? null,
    lastLaunchAt: launchTimes.at(-1) ?? null,
    catapults,
    pairs,
    suspends,
    downs,
    waivers,
    totals: countFigures(lines, log.suspends.length),
    squadrons,
  };
}
