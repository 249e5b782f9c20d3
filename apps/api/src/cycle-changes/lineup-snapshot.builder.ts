import {
  type AircraftClass,
  isLandingAreaInUse,
  type LaneView,
  type LaunchConfiguration,
  type LaunchFigures,
  type LaunchTimingView,
  type LineupSnapshot,
  type SlotStatus,
  type SlotView,
} from '@catline/contracts';
import { deckHoldOf } from './deck-holds.js';
import {
  afterburnerRequired,
  catapultClosedReason,
  catapultWind,
  clearingTurn,
  degrees,
  departureFor,
  epochMs,
  launchTiming,
  pounds,
  priorityForRole,
  projectLaunchTimes,
  readyToLaunchAt,
  seconds,
  secondsToMilliseconds,
  takeOffTrim,
  type EpochMs,
  type LaunchPriority,
  type Projection,
  type ReadinessPosition,
  type UnschedulableReason,
  type WindComponents,
} from '@catline/launch-math';
import { toCycleView } from './cycle.mapper.js';
import type { Catapult } from '../database/entities/catapult.entity.js';
import type { Slot } from '../database/entities/slot.entity.js';
import { grossWeightParts } from './gross-weight-parts.js';
import { launchFiguresView } from './launch-figures.js';
import { recordedFigures } from './launch-record.js';
import { catapultReadinessSteps, shipReadinessSteps } from './readiness-steps.js';
import { slotLaunchGates } from './slot-launch-gates.js';
import {
  aircraftProfile,
  cycleDensityRatio,
  cycleRelativeWind,
  launchCatapult,
  shipProfile,
  signedTurn,
} from './launch-math.adapter.js';
import type { LineupState } from './lineup-state.js';
import { clearBefore, deckLayout, deckLayoutData, deckPositionView, taxiSeconds } from './deck-positions.js';

/** Slots that have left the lineup for good; every other slot with a catapult is in that catapult's lane. */
const OUT_OF_LINEUP: readonly SlotStatus[] = ['down', 'scratched'];

/** "9" before "10". One collator for all: localeCompare with options builds a new one per comparison. */
const SIDE_NUMBER_ORDER = new Intl.Collator('en', { numeric: true });

export const isInPool = (slot: Slot) => slot.catapultId === null && !OUT_OF_LINEUP.includes(slot.status);

/**
 * A spare the handler has not called yet: it stays aside, in no lane and out of the cycle's count.
 * Calling it (for a down aircraft) is what `replacedBySlotId` of the down slot records.
 */
export const isHeldSpare = (state: LineupState, slot: Slot) =>
  slot.spare && slot.status === 'planned' && !state.slots.some((other) => other.replacedBySlotId === slot.id);

/** The cycle's aircraft as "launched x of y" counts them: every one but the spares still held. */
export const countedSlots = (state: LineupState) => state.slots.filter((slot) => !isHeldSpare(state, slot));

/** A lane's slots in launch order. */
export function laneSlots(state: LineupState, catapultId: number): Slot[] {
  return state.slots
    .filter((slot) => slot.catapultId === catapultId)
    .sort((a, b) => (a.position ?? 0) - (b.position ?? 0) || a.id - b.id);
}

export function launchPriority(slot: Pick<Slot, 'tanker' | 'earlyWarning' | 'spare'>): LaunchPriority {
  return priorityForRole(
    slot.tanker ? 'tanker' : slot.earlyWarning ? 'early_warning' : slot.spare ? 'spare' : 'mission',
  );
}

const iso = (instant: Date | EpochMs | null | undefined): string | null =>
  instant === null || instant === undefined ? null : new Date(instant).toISOString();

/** The cycle's catapults for launch-math, each marked inside the landing area or not as the ship says. */
export const launchCatapults = (state: LineupState) => {
  const inside = deckLayoutData(state.ship, state.catapults).landingAreaCatapults;
  return state.catapults.map((catapult) => launchCatapult(catapult, inside.includes(catapult.number)));
};

/**
 * launch-math's projection of a lineup (slot ids per catapult id): launched slots at their recorded
 * times, none out of its row before the aircraft parked in front of it. While planning (or with no
 * `now`), planned slots go no earlier than their taxi from where they stand, counted from the planned
 * start. Once launching, what is left is re-based on now (or the planned start, if later): each slot no
 * earlier than what its readiness step leaves to do (launch-math's readyToLaunchAt), nothing before now.
 * `asPlanned` projects every slot as if nothing had launched and each set off from its spot at the
 * planned start with every step to do: the plan launching is measured against.
 */
export function projectLineup(
  state: LineupState,
  lanes: Record<string, string[]>,
  now?: EpochMs,
  asPlanned = false,
): Projection {
  const { cycle } = state;
  const layout = deckLayout(state.ship, state.catapults);
  const planned = epochMs(cycle.plannedLaunchAt.getTime());
  const launching = asPlanned || (now !== undefined && cycle.state === 'executing');
  const start = asPlanned || now === undefined ? planned : epochMs(Math.max(planned, now));
  const steps = shipReadinessSteps(state);
  const slotById = new Map(state.slots.map((slot) => [String(slot.id), slot]));
  const launched: Record<string, EpochMs> = {};
  const notBefore: Record<string, EpochMs> = {};
  const priorities: Record<string, LaunchPriority> = {};
  for (const catapult of state.catapults) {
    for (const slotId of lanes[String(catapult.id)] ?? []) {
      const slot = slotById.get(slotId)!;
      priorities[slotId] = launchPriority(slot);
      if (slot.launchedAt && !asPlanned) {
        launched[slotId] = epochMs(slot.launchedAt.getTime());
        continue;
      }
      // In a lane and not launched: planned, suspended or at a readiness step.
      const where: ReadinessPosition = asPlanned ? 'planned' : (slot.status as ReadinessPosition);
      const taxi = where === 'planned' || where === 'taxiing' ? taxiSeconds(state, layout, slot, catapult) : 0;
      if (launching) {
        notBefore[slotId] = readyToLaunchAt({
          position: where,
          since: epochMs(slot.statusAt?.getTime() ?? start),
          taxi: seconds(taxi ?? 0),
          steps,
          now: start,
        });
      } else if (where === 'planned' && taxi !== undefined) {
        notBefore[slotId] = epochMs(start + secondsToMilliseconds(seconds(taxi)));
      }
    }
  }
  return projectLaunchTimes({
    cycleStart: start,
    window: { start: epochMs(cycle.windowStartAt.getTime()), end: epochMs(cycle.windowEndAt.getTime()) },
    catapults: launchCatapults(state),
    landingAreaInUse: isLandingAreaInUse(cycle.landingArea),
    lanes,
    pairMinimumGap: seconds(state.ship.pairGapS),
    launched,
    notBefore,
    priorities,
    now: launching && !asPlanned ? start : undefined,
    clearBefore: clearBefore(state, layout),
  });
}

interface LaneConditions {
  catapult: Catapult;
  wind: WindComponents;
  closedReason: UnschedulableReason | null;
  clearingTurnDeg: number;
}

interface CycleConditions {
  density: number;
  /** The ship profile's settingCrossCheckTolerance. */
  crossCheckTolerance: number | undefined;
  /** The departure an aircraft of the class flies in the cycle's weather case. */
  departure: (aircraftClass: AircraftClass) => string;
  lanes: Map<number, LaneConditions>;
}

function cycleConditions(state: LineupState): CycleConditions {
  const { cycle } = state;
  const catapults = new Map(launchCatapults(state).map((catapult) => [catapult.id, catapult]));
  const relative = cycleRelativeWind(cycle);
  const profile = shipProfile(state.ship.profile);
  return {
    density: cycleDensityRatio(cycle),
    crossCheckTolerance: state.ship.profile.settingCrossCheckTolerance,
    departure: (aircraftClass) => departureFor(profile, cycle.weatherCase, aircraftClass).summary,
    lanes: new Map(
      state.catapults.map((catapult) => [
        catapult.id,
        {
          catapult,
          wind: catapultWind(relative, degrees(catapult.axisAngleDeg)),
          closedReason: catapultClosedReason(
            catapults.get(String(catapult.id))!,
            isLandingAreaInUse(cycle.landingArea),
          ),
          clearingTurnDeg: signedTurn(clearingTurn(profile, catapult.position, cycle.weatherCase)),
        },
      ]),
    ),
  };
}

function figuresIn(conditions: CycleConditions, slot: Slot): LaunchFigures | null {
  const lane = slot.catapultId === null ? undefined : conditions.lanes.get(slot.catapultId);
  return lane
    ? launchFiguresView({
        type: slot.aircraft.type,
        grossWeightLb: launchWeight(slot),
        configuration: launchConfiguration(slot),
        densityRatio: conditions.density,
        crossCheckTolerance: conditions.crossCheckTolerance,
        ...lane,
      })
    : null;
}

/**
 * Which approved setting table the aircraft launches on: with stores when its load lists any or, before
 * a load is built, when the air plan's stores column is filled in.
 */
export const launchConfiguration = (slot: Slot): LaunchConfiguration =>
  (slot.loadBuild ? slot.loadBuild.stores.length > 0 : slot.stores.trim() !== '') ? 'stores' : 'clean';

/** The weight the figures are worked out for: the agreed one once the crew recorded it, the planned one before. */
export const launchWeight = (slot: Slot): number => slot.agreedWeightLb ?? slot.grossWeightLb;

/** The figures of one slot on its catapult under the cycle's conditions; null in the deck pool. */
export const slotFigures = (state: LineupState, slot: Slot): LaunchFigures | null =>
  figuresIn(cycleConditions(state), slot);

/**
 * How each timed slot runs against the window's end and, once launching, against the plan (the lineup
 * projected from the planned start as if nothing had launched).
 */
function slotTimings(
  state: LineupState,
  lanes: Record<string, string[]>,
  projection: Projection,
  now: EpochMs | undefined,
): Map<number, LaunchTimingView> {
  const windowEnd = epochMs(state.cycle.windowEndAt.getTime());
  const plan =
    now !== undefined && state.cycle.state === 'executing'
      ? new Map(projectLineup(state, lanes, undefined, true).slots.map((slot) => [slot.slotId, slot.time]))
      : undefined;
  return new Map(
    projection.slots.map((slot) => [Number(slot.slotId), launchTiming(slot.time, windowEnd, plan?.get(slot.slotId))]),
  );
}

/**
 * The lineup snapshot of a cycle, every figure from @catline/launch-math; pure, so equal states (at an
 * equal `now`) give equal snapshots. `now` re-bases a launching cycle's projection on it.
 */
export function buildSnapshot(state: LineupState, now?: EpochMs): LineupSnapshot {
  const { cycle } = state;
  const conditions = cycleConditions(state);
  const laneOrder = new Map(state.catapults.map((catapult) => [catapult.id, laneSlots(state, catapult.id)]));
  const laneIds = Object.fromEntries(
    [...laneOrder].map(([catapultId, slots]) => [String(catapultId), slots.map((slot) => String(slot.id))]),
  );
  const projection = projectLineup(state, laneIds, now);
  const timings = slotTimings(state, laneIds, projection, now);
  const projected = new Map(projection.slots.map((slot) => [Number(slot.slotId), slot]));
  const mustMove = new Map(projection.unschedulable.map((slot) => [slot.slotId, slot.mustMove ?? []]));
  const sideOf = new Map(state.slots.map((slot) => [String(slot.id), slot.aircraft.sideNumber]));

  const slots: SlotView[] = state.slots.map((slot) => {
    const type = aircraftProfile(slot.aircraft.type);
    const projectedSlot = projected.get(slot.id);
    // A launched aircraft shows what was used at the shot, never figures from the conditions of now.
    const record = slot.launchRecord;
    const figures = record ? recordedFigures(record) : figuresIn(conditions, slot);
    return {
      id: slot.id,
      cycleId: slot.cycleId,
      aircraftId: slot.aircraftId,
      sideNumber: slot.aircraft.sideNumber,
      typeId: slot.aircraft.typeId,
      typeDesignation: slot.aircraft.type.designation,
      aircraftClass: slot.aircraft.type.aircraftClass,
      squadronId: slot.aircraft.squadronId,
      squadronCode: slot.aircraft.squadron.code,
      pilotId: slot.pilotId,
      pilotName: slot.pilot?.name ?? null,
      mission: slot.mission,
      fuelLb: slot.fuelLb,
      stores: slot.stores,
      storesList: slot.loadBuild?.stores ?? [],
      grossWeightLb: slot.grossWeightLb,
      grossWeightParts: slot.loadBuild ? grossWeightParts(slot.fuelLb, slot.loadBuild) : null,
      armState: slot.armState,
      armStateAt: iso(slot.armStateAt),
      armStateBy: slot.armStateBy,
      tanker: slot.tanker,
      earlyWarning: slot.earlyWarning,
      spare: slot.spare,
      heldSpare: isHeldSpare(state, slot),
      catapultId: slot.catapultId,
      downFromCatapultId: slot.downCatapultId,
      position: slot.position,
      status: slot.status,
      version: slot.version,
      trimDeg: record ? record.trimDeg : takeOffTrim(type, pounds(launchWeight(slot))),
      afterburnerRequired: record?.afterburnerRequired ?? afterburnerRequired(type, pounds(launchWeight(slot))),
      departure: conditions.departure(slot.aircraft.type.aircraftClass),
      pilotWeightAckAt: iso(slot.pilotWeightAckAt),
      pilotWeightAckLb: slot.pilotWeightAckLb,
      agreedWeightLb: slot.agreedWeightLb,
      catapultWeightAckAt: iso(slot.catapultWeightAckAt),
      weightAgreedBy: slot.weightAgreedBy,
      settingReadBack: slot.settingReadBack,
      holdbackElement: slot.aircraft.type.holdbackElement,
      suspendReason: slot.suspendReason,
      overrideReason: slot.overrideReason,
      reverifyCause: slot.reverifyCause,
      waivers: (slot.waivers ?? []).map(({ gate, reason, byName, at }) => ({ gate, reason, by: byName, at })),
      launchedAt: iso(slot.launchedAt),
      statusAt: iso(slot.statusAt),
      statusBy: slot.statusBy?.name ?? null,
      projectedLaunchAt: iso(projectedSlot?.time),
      missesWindow: projectedSlot?.missesWindow ?? false,
      timing: timings.get(slot.id) ?? null,
      figures,
      launchRecord: record,
      gates: figures && !record ? slotLaunchGates(state, slot, figures, null).views : null,
      deckPosition: slot.status === 'launched' ? null : deckPositionView(slot),
      mustMove: (mustMove.get(String(slot.id)) ?? []).map((id) => sideOf.get(id) ?? id),
    };
  });
  const viewOf = new Map(slots.map((view) => [view.id, view]));

  const lanes: LaneView[] = state.catapults.map((catapult) => {
    const lane = conditions.lanes.get(catapult.id)!;
    const ids = laneOrder.get(catapult.id)!.map((slot) => slot.id);
    const hold = deckHoldOf(state.cycle, catapult.id);
    return {
      catapultId: catapult.id,
      number: catapult.number,
      position: catapult.position,
      status: catapult.status,
      closed: lane.closedReason === 'waist_closed',
      deckClear: hold === undefined,
      deckHoldReason: hold?.reason ?? null,
      headwindKt: lane.wind.headwind,
      crosswindKt: lane.wind.crosswind,
      crosswindSide: lane.wind.side,
      slotIds: ids,
      readinessSteps: catapultReadinessSteps(state, catapult.id),
      go: ids.every((id) => {
        const view = viewOf.get(id)!;
        return view.status === 'launched' || view.figures?.go === true;
      }),
    };
  });
  const pool = state.slots
    .filter(isInPool)
    .sort((a, b) => SIDE_NUMBER_ORDER.compare(a.aircraft.sideNumber, b.aircraft.sideNumber))
    .map((slot) => slot.id);

  return {
    readinessSteps: shipReadinessSteps(state),
    cycle: toCycleView(cycle, state.ship.profile, {
      slotCount: countedSlots(state).length,
      launchedCount: state.slots.filter((slot) => slot.status === 'launched').length,
    }),
    lanes,
    pool,
    slots,
    lastLaunchAt: iso(projection.lastLaunch),
    version: cycle.version,
  };
}
