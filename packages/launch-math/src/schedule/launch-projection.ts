import type { CatapultPosition } from '../catapult/end-speed.js';
import { LaunchMathInputError, requireFinite, requireNonNegative } from '../errors.js';
import { epochMs, secondsToMilliseconds, type EpochMs, type Seconds } from '../units/units.js';
import { scheduleLaunches, type FixedLaunch } from './launch-scheduler.js';

/** A catapult as the timing sees it. */
export interface LaunchCatapult {
  readonly id: string;
  /** The catapult's number on deck; lower numbers win ties. */
  readonly number: number;
  readonly position: CatapultPosition;
  /** Catapults sharing a pair id keep the pair's minimum gap between their launches. */
  readonly pairId: string;
  /** Launch to next launch on this catapult, seconds. */
  readonly resetInterval: Seconds;
  readonly up: boolean;
  /** Whether the catapult lies in the landing area (default: the waist catapults). */
  readonly inLandingArea?: boolean;
}

/** The cycle's launch window, epoch ms. */
export interface LaunchWindow {
  readonly start: EpochMs;
  readonly end: EpochMs;
}

/** Launch priority: tankers and early warning `first`, spares `last`. */
export type LaunchPriority = 'first' | 'normal' | 'last';

export interface ProjectionInput {
  /** When launching may begin, epoch ms. */
  readonly cycleStart: EpochMs;
  readonly window: LaunchWindow;
  readonly catapults: readonly LaunchCatapult[];
  /** While the landing area is recovering or fouled the catapults inside it are paused. */
  readonly landingAreaInUse: boolean;
  /** Ordered slot ids per catapult id. */
  readonly lanes: Readonly<Record<string, readonly string[]>>;
  /** Minimum time between launches on the two catapults of a pair, seconds. */
  readonly pairMinimumGap: Seconds;
  /** Actual launch times (epoch ms) of slots already launched. */
  readonly launched?: Readonly<Record<string, EpochMs>>;
  /** Per slot, the earliest it can launch (epoch ms): its taxi arrival at the catapult. */
  readonly notBefore?: Readonly<Record<string, EpochMs>>;
  /** Per slot priority (default `normal`); when given, no slot launches before a higher priority one. */
  readonly priorities?: Readonly<Record<string, LaunchPriority>>;
  /** Current time (epoch ms): nothing still to launch is projected before it. */
  readonly now?: EpochMs;
  /**
   * Per slot, the slots parked in front of it in its row that must have taxied out before it can
   * (from {@link blockingAircraft}). Each aircraft is taken to leave its spot its taxi time
   * (`notBefore` minus `cycleStart`) before its launch. Launched blockers have gone.
   */
  readonly clearBefore?: Readonly<Record<string, readonly string[]>>;
}

export interface ProjectedSlot {
  readonly slotId: string;
  readonly catapultId: string;
  /** 1-based place in its lane. */
  readonly place: number;
  /** Projected launch time, or the actual one when `launched`, epoch ms. */
  readonly time: EpochMs;
  readonly launched: boolean;
  /** Whether the time is after the window's end. */
  readonly missesWindow: boolean;
}

/** `waist_closed`: a catapult in the landing area, paused while it recovers or is fouled. */
export type UnschedulableReason = 'catapult_down' | 'waist_closed' | 'spot_blocked';

export interface UnschedulableSlot {
  readonly slotId: string;
  readonly catapultId: string;
  readonly reason: UnschedulableReason;
  /** For `spot_blocked`: the aircraft that must move (it is parked in front and does not go first). */
  readonly mustMove?: readonly string[];
}

export interface Projection {
  /** Every slot with a time, in time order (ties by catapult number). */
  readonly slots: readonly ProjectedSlot[];
  /** The cycle's last launch, projected or actual; null when nothing can launch. */
  readonly lastLaunch: EpochMs | null;
  /** Slots whose time is after the window's end, in time order. */
  readonly missingWindow: readonly string[];
  /** Slots still to launch from a catapult that is down or closed. */
  readonly unschedulable: readonly UnschedulableSlot[];
}

const PRIORITY_TIER: Readonly<Record<LaunchPriority, number>> = { first: 0, normal: 1, last: 2 };

/** Priority tier of a launch priority: 0 launches first. */
export const priorityTier = (priority: LaunchPriority | undefined): number => PRIORITY_TIER[priority ?? 'normal'];

/**
 * Priority tiers with the clear-before rule applied: an aircraft parked in front of others takes the
 * highest priority of any aircraft it holds in (directly or down the row), since it must go first to
 * let them out. `tiers` is indexed like `ids`; blockers outside `ids` are ignored.
 */
export function clearingTiers(
  ids: readonly string[],
  tiers: readonly number[],
  clearBefore: Readonly<Record<string, readonly string[]>> | undefined,
): number[] {
  const lifted = [...tiers];
  if (clearBefore === undefined) return lifted;
  const indexOf = new Map(ids.map((id, index) => [id, index]));
  // Rows are short: lifting until nothing changes settles within a row's length of passes.
  for (let changed = true, passes = 0; changed && passes <= ids.length; passes += 1) {
    changed = false;
    ids.forEach((id, index) => {
      for (const blocker of clearBefore[id] ?? []) {
        const at = indexOf.get(blocker);
        if (at !== undefined && lifted[at] > lifted[index]) {
          lifted[at] = lifted[index];
          changed = true;
        }
      }
    });
  }
  return lifted;
}

/** Whether a catapult lies in the landing area: as the ship marks it, else the waist catapults. */
export const inLandingArea = (catapult: Pick<LaunchCatapult, 'position' | 'inLandingArea'>): boolean =>
  catapult.inLandingArea ?? catapult.position === 'waist';

/** Whether a catapult can launch now: up, and not in the landing area while that is in use. */
export function catapultClosedReason(catapult: LaunchCatapult, landingAreaInUse: boolean): UnschedulableReason | null {
  if (!catapult.up) return 'catapult_down';
  return landingAreaInUse && inLandingArea(catapult) ? 'waist_closed' : null;
}

/** Catapults in tie-break order (by number), after checking their figures. */
export function orderedCatapults(catapults: readonly LaunchCatapult[]): LaunchCatapult[] {
  const ids = new Set<string>();
  for (const catapult of catapults) {
    if (ids.has(catapult.id)) throw new LaunchMathInputError(`Catapult ${catapult.id} is listed twice`);
    ids.add(catapult.id);
    requireFinite(catapult.number, `Catapult ${catapult.id} number`);
    requireNonNegative(catapult.resetInterval, `Catapult ${catapult.id} reset interval (s)`);
  }
  return [...catapults].sort((a, b) => a.number - b.number);
}

/** The earliest any launch may happen: cycle start, window start and now, whichever is latest. */
export function earliestLaunch(
  input: Pick<ProjectionInput, 'cycleStart' | 'window' | 'now' | 'pairMinimumGap'>,
): number {
  requireFinite(input.cycleStart, 'Cycle start');
  requireFinite(input.window.start, 'Window start');
  requireFinite(input.window.end, 'Window end');
  if (input.window.end < input.window.start) throw new LaunchMathInputError('The launch window ends before it starts');
  requireNonNegative(input.pairMinimumGap, 'Pair minimum gap (s)');
  return Math.max(input.cycleStart, input.window.start, input.now ?? Number.NEGATIVE_INFINITY);
}

/**
 * Projected launch time of every slot of a lineup: lane order, reset intervals, the pair gap, taxi
 * arrivals, priority holds, catapults down and waist catapults closed while the landing area is in
 * use; with the last launch and the slots that miss the window. Slots already launched keep their
 * actual times and hold their catapult and its partner like any other launch.
 */
export function projectLaunchTimes(input: ProjectionInput): Projection {
  const earliest = earliestLaunch(input);
  const catapults = orderedCatapults(input.catapults);
  const indexOf = new Map(catapults.map((catapult, index) => [catapult.id, index]));
  for (const catapultId of Object.keys(input.lanes)) {
    if (!indexOf.has(catapultId)) throw new LaunchMathInputError(`Lane for unknown catapult ${catapultId}`);
  }

  const slotIds: string[] = [];
  const slotCatapult: number[] = [];
  const slotPlace: number[] = [];
  const pendingLanes: number[][] = catapults.map(() => []);
  const launchedSlots: number[] = [];
  const unschedulable: UnschedulableSlot[] = [];
  const seen = new Set<string>();
  catapults.forEach((catapult, catapultIndex) => {
    const closed = catapultClosedReason(catapult, input.landingAreaInUse);
    (input.lanes[catapult.id] ?? []).forEach((slotId, laneIndex) => {
      if (seen.has(slotId)) throw new LaunchMathInputError(`Slot ${slotId} is in the lineup twice`);
      seen.add(slotId);
      const launchedAt = input.launched?.[slotId];
      if (launchedAt === undefined && closed !== null) {
        unschedulable.push({ slotId, catapultId: catapult.id, reason: closed });
        return;
      }
      const slot = slotIds.length;
      slotIds.push(slotId);
      slotCatapult.push(catapultIndex);
      slotPlace.push(laneIndex + 1);
      if (launchedAt === undefined) pendingLanes[catapultIndex].push(slot);
      else {
        requireFinite(launchedAt, `Launch time of ${slotId}`);
        launchedSlots.push(slot);
      }
    });
  });

  const notBefore = slotIds.map((slotId) => input.notBefore?.[slotId] ?? Number.NEGATIVE_INFINITY);
  notBefore.forEach((time, slot) => {
    if (Number.isNaN(time)) throw new LaunchMathInputError(`Earliest launch of ${slotIds[slot]} is not a number`);
  });
  const indexOfSlot = new Map(slotIds.map((slotId, slot) => [slotId, slot]));
  const tier = clearingTiers(
    slotIds,
    slotIds.map((slotId) => priorityTier(input.priorities?.[slotId])),
    input.clearBefore,
  );
  const fixed: FixedLaunch[] = launchedSlots.map((slot) => ({
    catapult: slotCatapult[slot],
    time: input.launched![slotIds[slot]],
    tier: tier[slot],
  }));
  const clearAfter = slotIds.map((slotId) => {
    const blockers = input.clearBefore?.[slotId]?.filter((blocker) => input.launched?.[blocker] === undefined);
    return blockers === undefined || blockers.length === 0
      ? undefined
      : blockers.map((blocker) => indexOfSlot.get(blocker) ?? -1);
  });
  const times = scheduleLaunches({
    earliest,
    taxiStart: input.cycleStart,
    clearAfter,
    pairGapMs: secondsToMilliseconds(input.pairMinimumGap),
    catapults: catapults.map((catapult) => ({
      resetMs: secondsToMilliseconds(catapult.resetInterval),
      group: catapult.pairId,
    })),
    lanes: pendingLanes,
    notBefore,
    tier,
    fixed,
  });
  // Launched slots are not scheduled: their recorded time stands.
  const timeOf = (slot: number): number => input.launched?.[slotIds[slot]] ?? times[slot];
  // A slot left without a time waits on an aircraft in front of its spot that does not go first, or
  // stands in its lane behind one that does: it names the aircraft that must move.
  for (const lane of pendingLanes) {
    let ahead: readonly string[] = [];
    for (const slot of lane) {
      if (!Number.isNaN(times[slot])) continue;
      const own = (input.clearBefore?.[slotIds[slot]] ?? []).filter((blocker) => {
        const index = indexOfSlot.get(blocker);
        return input.launched?.[blocker] === undefined && (index === undefined || Number.isNaN(times[index]));
      });
      if (own.length > 0) ahead = own;
      unschedulable.push({
        slotId: slotIds[slot],
        catapultId: catapults[slotCatapult[slot]].id,
        reason: 'spot_blocked',
        mustMove: ahead,
      });
    }
  }

  const slots: ProjectedSlot[] = slotIds
    .flatMap((slotId, slot) => (Number.isNaN(timeOf(slot)) ? [] : [{ slotId, slot }]))
    .map(({ slotId, slot }) => ({
      slotId,
      catapultId: catapults[slotCatapult[slot]].id,
      place: slotPlace[slot],
      time: epochMs(timeOf(slot)),
      launched: input.launched?.[slotId] !== undefined,
      missesWindow: timeOf(slot) > input.window.end,
    }))
    .sort((a, b) => a.time - b.time || (indexOf.get(a.catapultId) ?? 0) - (indexOf.get(b.catapultId) ?? 0));
  return {
    slots,
    lastLaunch: slots.length === 0 ? null : epochMs(Math.max(...slots.map((slot) => slot.time))),
    missingWindow: slots.filter((slot) => slot.missesWindow).map((slot) => slot.slotId),
    unschedulable,
  };
}
