import { LaunchMathInputError, requireNonNegative } from '../errors.js';
import { epochMs, secondsToMilliseconds, type EpochMs, type Seconds } from '../units/units.js';
import {
  catapultClosedReason,
  clearingTiers,
  earliestLaunch,
  orderedCatapults,
  priorityTier,
  projectLaunchTimes,
  type LaunchCatapult,
  type LaunchPriority,
  type LaunchWindow,
  type Projection,
} from './launch-projection.js';
import { LaunchScheduler } from './launch-scheduler.js';

/** What an aircraft is flying in the cycle, as far as launch order cares. */
export type SortieRole = 'tanker' | 'early_warning' | 'spare' | 'mission';

/** Tankers and early warning launch first, spares last. */
export const priorityForRole = (role: SortieRole): LaunchPriority =>
  role === 'tanker' || role === 'early_warning' ? 'first' : role === 'spare' ? 'last' : 'normal';

export interface CycleAircraft {
  readonly id: string;
  readonly priority: LaunchPriority;
}

export interface SuggestionInput {
  /** When launching may begin (and taxiing starts), epoch ms. */
  readonly cycleStart: EpochMs;
  readonly window: LaunchWindow;
  readonly catapults: readonly LaunchCatapult[];
  readonly landingAreaInUse: boolean;
  /** Minimum time between launches on the two catapults of a pair, seconds. */
  readonly pairMinimumGap: Seconds;
  readonly aircraft: readonly CycleAircraft[];
  /**
   * Taxi time in seconds from each aircraft's parking spot to each catapult:
   * `taxiTimes[aircraftId][catapultId]`. A missing entry means the aircraft cannot reach that catapult.
   */
  readonly taxiTimes: Readonly<Record<string, Readonly<Record<string, Seconds>>>>;
  /**
   * Per aircraft, the aircraft parked in front of it that must taxi out first (from
   * {@link blockingAircraft}); one blocked by an aircraft not in the list cannot be placed.
   */
  readonly clearBefore?: Readonly<Record<string, readonly string[]>>;
}

export interface UnplacedAircraft {
  readonly aircraftId: string;
  readonly reason: 'no_catapult_reachable' | 'spot_blocked';
  /** For `spot_blocked`: the aircraft in front, outside the cycle or unplaced themselves, that must move. */
  readonly mustMove?: readonly string[];
}

export interface LineupSuggestion {
  /** Ordered aircraft ids for every catapult id; closed catapults get an empty lane. */
  readonly lanes: Readonly<Record<string, readonly string[]>>;
  /** Each placed aircraft's taxi arrival at its catapult, epoch ms: pass it on to {@link projectLaunchTimes}. */
  readonly notBefore: Readonly<Record<string, EpochMs>>;
  /** Each placed aircraft's priority, as passed on to {@link projectLaunchTimes}. */
  readonly priorities: Readonly<Record<string, LaunchPriority>>;
  /** The lineup's projection, exactly as {@link projectLaunchTimes} gives it. */
  readonly projection: Projection;
  readonly unplaced: readonly UnplacedAircraft[];
}

/** Index-based view of the problem for the search. */
interface SearchSpace {
  readonly earliest: number;
  /** arrival[aircraft][catapult], epoch ms; +Infinity when unreachable. */
  readonly arrival: readonly Float64Array[];
  readonly tier: readonly number[];
  /** Per aircraft, the aircraft (indices) that must leave their spots before it can taxi out; none when undefined. */
  readonly clearAfter: readonly (readonly number[] | undefined)[] | undefined;
  /** Runs every lineup the search evaluates, reusing its buffers. */
  readonly scheduler: LaunchScheduler;
  /** Per aircraft, its taxi arrival at its lane's catapult in the lineup being evaluated. */
  readonly notBefore: Float64Array;
  /** Reset interval of each catapult, ms. */
  readonly resetMs: readonly number[];
  /** Evaluations spent so far, so the search stays within its budget. */
  readonly evaluations: { count: number };
}

type Lanes = number[][];

interface Score {
  /** Aircraft left waiting for one in front that never goes before them: no lineup the handler can use. */
  readonly stranded: number;
  readonly lastLaunch: number;
  readonly totalTime: number;
}

// No aircraft stranded comes first; then finishing soonest; among equal finishes the lineup whose
// launches come earlier overall.
const isBetter = (a: Score, b: Score): boolean =>
  a.stranded < b.stranded ||
  (a.stranded === b.stranded &&
    (a.lastLaunch < b.lastLaunch || (a.lastLaunch === b.lastLaunch && a.totalTime < b.totalTime)));

// Limits of the search, set against the exhaustive optimum on 2,200 random cycles of up to 8 aircraft
// (as in lineup-suggestion-optimum.spec.ts): with them the worst cycle finished 3.1% late and all but
// three were optimal; the evaluation budget keeps a 40-aircraft cycle under a second.
const MAX_PASSES = 200;
const MAX_KICKS = 40;
/** Kicks in a row without a new best after which the search stops. */
const KICK_PATIENCE = 12;
const KICK_EVALUATION_BUDGET = 40_000;
const AIRCRAFT_MOVED_PER_KICK = 3;
const KICK_SEED = 0x5eed;
/** Lineup evaluations the pair moves after the kicks may spend. */
const PAIR_MOVE_EVALUATION_BUDGET = 5_000;
/** Cycles up to this size are searched to the proven optimum after the heuristic (when the budget allows). */
const EXACT_SEARCH_MAX_AIRCRAFT = 8;
/** Branches the exact search may visit; a cycle that needs more keeps the heuristic's lineup. */
const EXACT_SEARCH_BRANCH_BUDGET = 5_000;

/** Each aircraft's taxi arrival at the catapult of its lane, into the search's buffer. */
function arrivalsIn(space: SearchSpace, lanes: Lanes): Float64Array {
  lanes.forEach((lane, catapult) => {
    for (const aircraft of lane) space.notBefore[aircraft] = space.arrival[aircraft][catapult];
  });
  return space.notBefore;
}

/** Each aircraft's launch time in the lineup, by index (NaN when stranded or in no lane); valid until the next evaluation. */
function launchTimes(space: SearchSpace, lanes: Lanes): Float64Array {
  space.evaluations.count += 1;
  space.scheduler.run(lanes, arrivalsIn(space, lanes));
  return space.scheduler.times;
}

/** The score of the lineup the scheduler ran last. */
function scoreOfRun(space: SearchSpace, lanes: Lanes): Score {
  const times = space.scheduler.times;
  let stranded = 0;
  let lastLaunch = space.earliest;
  let totalTime = 0;
  for (const lane of lanes) {
    for (const aircraft of lane) {
      if (Number.isNaN(times[aircraft])) {
        stranded += 1;
        continue;
      }
      lastLaunch = Math.max(lastLaunch, times[aircraft]);
      totalTime += times[aircraft] - space.earliest;
    }
  }
  return { stranded, lastLaunch, totalTime };
}

function evaluate(space: SearchSpace, lanes: Lanes): Score {
  launchTimes(space, lanes);
  return scoreOfRun(space, lanes);
}

/**
 * The lineup's score when it beats `toBeat` (always when that is null), else null. The scheduler gives
 * up on it as soon as a launch falls after `toBeat`'s last one, which decides it when `toBeat` strands
 * no aircraft; and, given the step of the recorded lineup from which this one differs (see
 * LaunchScheduler.stepBefore), it starts from there. Counted as one evaluation either way, so the
 * search's budgets, and so its lineups, stay what a full evaluation of every lineup gave.
 */
function evaluateAgainst(
  space: SearchSpace,
  lanes: Lanes,
  toBeat: Score | null,
  fromStep: number | null,
): Score | null {
  space.evaluations.count += 1;
  const notBefore = arrivalsIn(space, lanes);
  const latestAllowed = toBeat === null || toBeat.stranded > 0 ? Number.POSITIVE_INFINITY : toBeat.lastLaunch;
  const finished =
    fromStep === null
      ? space.scheduler.run(lanes, notBefore, latestAllowed)
      : space.scheduler.resume(lanes, notBefore, fromStep, latestAllowed);
  if (!finished) return null;
  const score = scoreOfRun(space, lanes);
  return toBeat === null || isBetter(score, toBeat) ? score : null;
}

/** Records the lineup as it stands, for evaluations of lineups that differ from it in a place or two. */
const recordLineup = (space: SearchSpace, lanes: Lanes): void =>
  space.scheduler.record(lanes, arrivalsIn(space, lanes));

const fitsAt = (space: SearchSpace, lane: readonly number[], position: number, tier: number): boolean =>
  (position === 0 || space.tier[lane[position - 1]] <= tier) &&
  (position === lane.length || space.tier[lane[position]] >= tier);

/** Whether the aircraft at `position` keeps the priority order with its neighbours. */
const inOrderAround = (space: SearchSpace, lane: readonly number[], position: number): boolean =>
  (position === 0 || space.tier[lane[position - 1]] <= space.tier[lane[position]]) &&
  (position === lane.length - 1 || space.tier[lane[position + 1]] >= space.tier[lane[position]]);

/** How many aircraft stand in front of one in its row, down to the row's front. */
function rowDepth(space: SearchSpace): number[] {
  const depth = space.tier.map(() => -1);
  const of = (aircraft: number, guard: number): number => {
    if (depth[aircraft] < 0) {
      const ahead = space.clearAfter?.[aircraft] ?? [];
      depth[aircraft] = guard > depth.length ? 0 : Math.max(0, ...ahead.map((front) => of(front, guard + 1) + 1));
    }
    return depth[aircraft];
  };
  return depth.map((_, aircraft) => of(aircraft, 0));
}

/**
 * Greedy start: in the given order (tiers first, then an aircraft before those parked behind it), each
 * aircraft goes to the end of the lane that scores best.
 */
function construct(space: SearchSpace, order: readonly number[]): Lanes {
  const lanes: Lanes = space.resetMs.map(() => []);
  const depth = rowDepth(space);
  for (const aircraft of [...order].sort((a, b) => space.tier[a] - space.tier[b] || depth[a] - depth[b])) {
    let best: { lane: number; score: Score } | null = null;
    recordLineup(space, lanes);
    for (let catapult = 0; catapult < lanes.length; catapult += 1) {
      if (!Number.isFinite(space.arrival[aircraft][catapult])) continue;
      const step = space.scheduler.stepBefore(catapult, lanes[catapult].length);
      lanes[catapult].push(aircraft);
      const score = evaluateAgainst(space, lanes, best?.score ?? null, step);
      lanes[catapult].pop();
      if (score !== null) best = { lane: catapult, score };
    }
    if (best !== null) lanes[best.lane].push(aircraft);
  }
  return lanes;
}

/** Moves one aircraft to its best place anywhere else, if that scores better. */
function relocate(space: SearchSpace, lanes: Lanes, aircraft: number, current: Score): Score | null {
  const from = lanes.findIndex((lane) => lane.includes(aircraft));
  const fromPosition = lanes[from].indexOf(aircraft);
  lanes[from].splice(fromPosition, 1);
  recordLineup(space, lanes);
  let best: { lane: number; position: number; score: Score } | null = null;
  for (let catapult = 0; catapult < lanes.length; catapult += 1) {
    if (!Number.isFinite(space.arrival[aircraft][catapult])) continue;
    const lane = lanes[catapult];
    for (let position = 0; position <= lane.length; position += 1) {
      if ((catapult === from && position === fromPosition) || !fitsAt(space, lane, position, space.tier[aircraft]))
        continue;
      const step = space.scheduler.stepBefore(catapult, position);
      lane.splice(position, 0, aircraft);
      const score = evaluateAgainst(space, lanes, best?.score ?? current, step);
      lane.splice(position, 1);
      if (score !== null) best = { lane: catapult, position, score };
    }
  }
  if (best === null) {
    lanes[from].splice(fromPosition, 0, aircraft);
    return null;
  }
  lanes[best.lane].splice(best.position, 0, aircraft);
  return best.score;
}

/**
 * Swaps two aircraft's places when both can use the other's catapult and that scores better; the
 * lineup before the swap must be the one recorded.
 */
function swap(
  space: SearchSpace,
  lanes: Lanes,
  a: [number, number],
  b: [number, number],
  current: Score,
): Score | null {
  const first = lanes[a[0]][a[1]];
  const second = lanes[b[0]][b[1]];
  if (!Number.isFinite(space.arrival[first][b[0]]) || !Number.isFinite(space.arrival[second][a[0]])) return null;
  lanes[a[0]][a[1]] = second;
  lanes[b[0]][b[1]] = first;
  if (inOrderAround(space, lanes[a[0]], a[1]) && inOrderAround(space, lanes[b[0]], b[1])) {
    const step = Math.min(space.scheduler.stepBefore(a[0], a[1]), space.scheduler.stepBefore(b[0], b[1]));
    const score = evaluateAgainst(space, lanes, current, step);
    if (score !== null) return score;
  }
  lanes[a[0]][a[1]] = first;
  lanes[b[0]][b[1]] = second;
  return null;
}

/** Local search to a lineup no single relocation or swap improves. */
function improve(space: SearchSpace, lanes: Lanes): { lanes: Lanes; score: Score } {
  let current = evaluate(space, lanes);
  for (let pass = 0, improved = true; improved && pass < MAX_PASSES; pass += 1) {
    improved = false;
    for (const aircraft of lanes.flat()) {
      const score = relocate(space, lanes, aircraft, current);
      if (score !== null) {
        current = score;
        improved = true;
      }
    }
    const places = lanes.flatMap((lane, catapult) => lane.map((_, position): [number, number] => [catapult, position]));
    recordLineup(space, lanes);
    for (let i = 0; i < places.length; i += 1) {
      for (let j = i + 1; j < places.length; j += 1) {
        const score = swap(space, lanes, places[i], places[j], current);
        if (score !== null) {
          current = score;
          improved = true;
          recordLineup(space, lanes);
        }
      }
    }
  }
  return { lanes, score: current };
}

/** mulberry32: a small seeded generator, so the same cycle always gets the same suggestion. */
function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A copy of the lineup with a few aircraft moved to random places that keep the rules. */
function kick(space: SearchSpace, lanes: Lanes, random: () => number): Lanes {
  const next = lanes.map((lane) => [...lane]);
  const all = next.flat();
  for (let moved = 0; moved < AIRCRAFT_MOVED_PER_KICK && all.length > 0; moved += 1) {
    const aircraft = all[Math.floor(random() * all.length)];
    const from = next.find((lane) => lane.includes(aircraft)) ?? [];
    from.splice(from.indexOf(aircraft), 1);
    const places = next.flatMap((lane, catapult) =>
      Number.isFinite(space.arrival[aircraft][catapult])
        ? Array.from({ length: lane.length + 1 }, (_, position) => position)
            .filter((position) => fitsAt(space, lane, position, space.tier[aircraft]))
            .map((position) => [catapult, position] as const)
        : [],
    );
    const [catapult, position] = places[Math.floor(random() * places.length)];
    next[catapult].splice(position, 0, aircraft);
  }
  return next;
}

/**
 * Iterated local search: kick the lineup, search locally again, keep the result unless it is worse
 * (drifting across equal scores), and remember the best seen; until the kicks or the budget run out,
 * twelve kicks in a row bring nothing better, or the last launch is as early as any lineup could make it.
 */
function iterate(space: SearchSpace, start: { lanes: Lanes; score: Score }): { lanes: Lanes; score: Score } {
  const random = seededRandom(KICK_SEED);
  const budget = space.evaluations.count + KICK_EVALUATION_BUDGET;
  // No lineup finishes before every aircraft has reached its nearest catapult.
  const floor = Math.max(space.earliest, ...start.lanes.flat().map((aircraft) => Math.min(...space.arrival[aircraft])));
  let best = start;
  let current = start;
  let sinceBest = 0;
  for (
    let kicks = 0;
    kicks < MAX_KICKS && sinceBest < KICK_PATIENCE && space.evaluations.count < budget && best.score.lastLaunch > floor;
    kicks += 1
  ) {
    const candidate = improve(space, kick(space, current.lanes, random));
    if (!isBetter(current.score, candidate.score)) current = candidate;
    sinceBest += 1;
    if (isBetter(current.score, best.score)) {
      best = current;
      sinceBest = 0;
    }
  }
  return best;
}

/** The aircraft whose launch is the lineup's last, in lane order. */
function launchingLast(lanes: Lanes, times: Float64Array): number[] {
  let last = Number.NEGATIVE_INFINITY;
  for (const lane of lanes)
    for (const aircraft of lane) if (Number.isFinite(times[aircraft])) last = Math.max(last, times[aircraft]);
  return lanes.flatMap((lane) => lane.filter((aircraft) => times[aircraft] === last));
}

/**
 * Two-aircraft moves that neither a single move nor the kicks find reliably: one aircraft goes to
 * another place, even one that alone makes the lineup worse, and then an aircraft now launching last
 * goes to its best place (e.g. a tanker moved behind another on one catapult frees its pair partner
 * but holds the rest longer, until the spare stuck behind them moves to an idle catapult). Taken only
 * when the pair scores better; local search follows each pair taken, until none helps or the budget
 * is spent.
 */
function pairMoves(space: SearchSpace, found: { lanes: Lanes; score: Score }): { lanes: Lanes; score: Score } {
  const lanes = found.lanes.map((lane) => [...lane]);
  let current = found.score;
  const budget = space.evaluations.count + PAIR_MOVE_EVALUATION_BUDGET;
  const pairFrom = (first: number): Score | null => {
    const from = lanes.findIndex((lane) => lane.includes(first));
    const fromPosition = lanes[from].indexOf(first);
    lanes[from].splice(fromPosition, 1);
    for (let catapult = 0; catapult < lanes.length; catapult += 1) {
      if (!Number.isFinite(space.arrival[first][catapult])) continue;
      const lane = lanes[catapult];
      for (let position = 0; position <= lane.length; position += 1) {
        if ((catapult === from && position === fromPosition) || !fitsAt(space, lane, position, space.tier[first]))
          continue;
        if (space.evaluations.count >= budget) break;
        lane.splice(position, 0, first);
        for (const second of launchingLast(lanes, launchTimes(space, lanes))) {
          if (second === first) continue;
          const score = relocate(space, lanes, second, current);
          if (score !== null) return score;
        }
        lane.splice(position, 1);
      }
    }
    lanes[from].splice(fromPosition, 0, first);
    return null;
  };
  for (let taken = true; taken && space.evaluations.count < budget;) {
    taken = false;
    for (const first of lanes.flat()) {
      if (pairFrom(first) === null) continue;
      current = improve(space, lanes).score;
      taken = true;
      break;
    }
  }
  return { lanes, score: current };
}

/**
 * A lower bound on the last launch of any lineup grown from `lanes` by placing `rest` more aircraft: each
 * lane launches no earlier than its aircraft sorted by arrival, one reset interval apart, and each aircraft
 * still to place costs a reset interval on whichever lane that costs least (as if it could reach any).
 * Pair gaps, priority holds and clear-before waits only delay launches, so they are left out.
 */
function lastLaunchBound(space: SearchSpace, lanes: Lanes, rest: number): number {
  const ends = lanes.map((lane, catapult) => {
    const arrivals = lane.map((aircraft) => Math.max(space.earliest, space.arrival[aircraft][catapult]));
    arrivals.sort((a, b) => a - b);
    const reset = space.resetMs[catapult];
    return arrivals.reduce(
      (end, arrival, j) => Math.max(end, arrival + (arrivals.length - 1 - j) * reset),
      space.earliest,
    );
  });
  const counts = lanes.map((lane) => lane.length);
  for (let placed = 0; placed < rest; placed += 1) {
    const cost = (catapult: number): number =>
      Math.max(ends[catapult], space.earliest + counts[catapult] * space.resetMs[catapult]);
    const cheapest = ends.reduce((chosen, _, catapult) => (cost(catapult) < cost(chosen) ? catapult : chosen), 0);
    ends[cheapest] = cost(cheapest);
    counts[cheapest] += 1;
  }
  return Math.max(space.earliest, ...ends);
}

/**
 * On a small cycle, branch and bound over every lineup that keeps the rules (aircraft inserted tier by
 * tier at every place of every lane they reach), starting from the heuristic's lineup as the one to beat:
 * the heuristic alone can land a few per cent behind on cycles whose pair and priority holds need three or
 * more aircraft to move at once. A cycle too large, or a search that runs out of branches, keeps the best
 * lineup found so far.
 */
function provenBest(space: SearchSpace, found: { lanes: Lanes; score: Score }): { lanes: Lanes; score: Score } {
  const order = found.lanes.flat().sort((a, b) => space.tier[a] - space.tier[b]);
  if (order.length > EXACT_SEARCH_MAX_AIRCRAFT) return found;
  const lanes: Lanes = space.resetMs.map(() => []);
  let best = found;
  let branches = 0;
  const search = (next: number): void => {
    branches += 1;
    // A lineup with an aircraft stranded is beaten by any that finishes, however late.
    const toBeat = best.score.stranded > 0 ? Number.POSITIVE_INFINITY : best.score.lastLaunch;
    if (branches > EXACT_SEARCH_BRANCH_BUDGET || lastLaunchBound(space, lanes, order.length - next) >= toBeat) return;
    if (next === order.length) {
      const score = evaluateAgainst(space, lanes, best.score, null);
      if (score !== null) best = { lanes: lanes.map((lane) => [...lane]), score };
      return;
    }
    const aircraft = order[next];
    lanes.forEach((lane, catapult) => {
      if (!Number.isFinite(space.arrival[aircraft][catapult])) return;
      for (let position = 0; position <= lane.length; position += 1) {
        if (!fitsAt(space, lane, position, space.tier[aircraft])) continue;
        lane.splice(position, 0, aircraft);
        search(next + 1);
        lane.splice(position, 1);
      }
    });
  };
  search(0);
  return best;
}

/** Start orders for the search: nearest first, farthest first, and as given. */
function startOrders(space: SearchSpace, aircraft: readonly number[]): number[][] {
  const nearest = (index: number): number => Math.min(...space.arrival[index]);
  const ascending = [...aircraft].sort((a, b) => nearest(a) - nearest(b) || a - b);
  return [ascending, [...ascending].reverse(), [...aircraft]];
}

/**
 * Suggested lineup: which open catapult each aircraft goes to and in what order, finishing the
 * cycle soonest under the projection's own timing (taxi arrival, reset intervals, pair gap,
 * priority holds). No aircraft is queued behind a lower-priority one.
 *
 * Heuristic, deterministic: three greedy starts (nearest aircraft first, farthest first, as listed),
 * each placing aircraft tier by tier at the end of whichever lane scores best, then improved by
 * local search (move one aircraft anywhere, or swap two) until no move helps. The best of those is
 * refined by iterated local search, because the pair gap and the priority holds often need two
 * aircraft to move at once: up to 40 seeded kicks, each moving three aircraft at random before
 * searching locally again, stopping after 12 kicks in a row without a better lineup or 40,000
 * lineup evaluations. Last, pair moves: each aircraft tries every other place, and an aircraft then
 * launching last its best place (at most 5,000 more evaluations: every pair on a cycle of about ten
 * aircraft). Last, on cycles of up to eight aircraft, a branch and bound search proves that lineup
 * optimal or finds a better one (within 5,000 branches; a cycle that needs more keeps the lineup found so
 * far). Scores compare the last launch, then the sum of launch times.
 */
export function suggestLineup(input: SuggestionInput): LineupSuggestion {
  const earliest = earliestLaunch(input);
  const open = orderedCatapults(input.catapults).filter(
    (catapult) => catapultClosedReason(catapult, input.landingAreaInUse) === null,
  );
  const listed = new Set<string>();
  for (const aircraft of input.aircraft) {
    if (listed.has(aircraft.id)) throw new LaunchMathInputError(`Aircraft ${aircraft.id} is listed twice`);
    listed.add(aircraft.id);
  }
  const arrivalOf = (aircraftId: string): Float64Array =>
    Float64Array.from(open, (catapult) => {
      const taxi = input.taxiTimes[aircraftId]?.[catapult.id];
      if (taxi === undefined) return Number.POSITIVE_INFINITY;
      requireNonNegative(taxi, `Taxi time of ${aircraftId} to catapult ${catapult.id} (s)`);
      return input.cycleStart + secondsToMilliseconds(taxi);
    });
  const ids = input.aircraft.map((aircraft) => aircraft.id);
  const indexOf = new Map(ids.map((id, index) => [id, index]));
  const reachable = input.aircraft.map((aircraft) => arrivalOf(aircraft.id));
  const blocked = blockedOutright(input, (front) => {
    const index = indexOf.get(front);
    return index === undefined || !reachable[index].some(Number.isFinite);
  });
  const arrival = input.aircraft.map((aircraft, index) =>
    blocked.has(aircraft.id) ? Float64Array.from(open, () => Number.POSITIVE_INFINITY) : reachable[index],
  );
  // Left out when no aircraft waits on another, so the scheduler's inner loop skips the rule entirely.
  const clearAfter =
    input.clearBefore === undefined || Object.keys(input.clearBefore).length === 0
      ? undefined
      : ids.map((id) =>
          blocked.has(id) ? undefined : input.clearBefore?.[id]?.map((front) => indexOf.get(front) ?? -1),
        );
  const placeable = input.aircraft.flatMap((_, index) => (arrival[index].some(Number.isFinite) ? [index] : []));
  // Only aircraft the lineup holds lift the priority of those parked in front of them, as in the lineup's
  // projection: an aircraft left out must not hurry its row's front past aircraft that wait on it.
  const placed = new Set(placeable.map((index) => ids[index]));
  const tier = clearingTiers(
    ids,
    input.aircraft.map((aircraft) => priorityTier(aircraft.priority)),
    input.clearBefore && Object.fromEntries(Object.entries(input.clearBefore).filter(([behind]) => placed.has(behind))),
  );
  const catapults = open.map((catapult) => ({
    resetMs: secondsToMilliseconds(catapult.resetInterval),
    group: catapult.pairId,
  }));
  const space: SearchSpace = {
    earliest,
    clearAfter,
    arrival,
    tier,
    scheduler: new LaunchScheduler({
      earliest,
      pairGapMs: secondsToMilliseconds(input.pairMinimumGap),
      catapults,
      tier,
      fixed: [],
      taxiStart: input.cycleStart,
      clearAfter,
    }),
    notBefore: new Float64Array(ids.length),
    resetMs: catapults.map((catapult) => catapult.resetMs),
    evaluations: { count: 0 },
  };
  const best = provenBest(
    space,
    pairMoves(
      space,
      iterate(
        space,
        startOrders(space, placeable)
          .map((order) => improve(space, construct(space, order)))
          .reduce((winner, candidate) => (isBetter(candidate.score, winner.score) ? candidate : winner)),
      ),
    ),
  );

  const lanes: Record<string, string[]> = Object.fromEntries(input.catapults.map((catapult) => [catapult.id, []]));
  const notBefore: Record<string, EpochMs> = {};
  const priorities: Record<string, LaunchPriority> = {};
  best.lanes.forEach((lane, catapult) => {
    for (const index of lane) {
      const aircraft = input.aircraft[index];
      lanes[open[catapult].id].push(aircraft.id);
      notBefore[aircraft.id] = epochMs(arrival[index][catapult]);
      priorities[aircraft.id] = aircraft.priority;
    }
  });
  return {
    lanes,
    notBefore,
    priorities,
    projection: projectLaunchTimes({ ...input, lanes, notBefore, priorities }),
    unplaced: input.aircraft.flatMap((aircraft, index): UnplacedAircraft[] => {
      if (placeable.includes(index)) return [];
      const mustMove = reachable[index].some(Number.isFinite) ? blocked.get(aircraft.id) : undefined;
      return mustMove === undefined
        ? [{ aircraftId: aircraft.id, reason: 'no_catapult_reachable' }]
        : [{ aircraftId: aircraft.id, reason: 'spot_blocked', mustMove }];
    }),
  };
}

/**
 * Aircraft that cannot taxi out whatever the lineup: parked behind an aircraft that cannot go (outside
 * the cycle, or reaching no open catapult), or behind one blocked itself; each with the aircraft in
 * front that must move.
 */
function blockedOutright(input: SuggestionInput, cannotGo: (aircraftId: string) => boolean): Map<string, string[]> {
  const blocked = new Map<string, string[]>();
  for (let changed = true; changed;) {
    changed = false;
    for (const aircraft of input.aircraft) {
      if (blocked.has(aircraft.id)) continue;
      const stuck = (input.clearBefore?.[aircraft.id] ?? []).filter((front) => cannotGo(front) || blocked.has(front));
      if (stuck.length > 0) {
        blocked.set(aircraft.id, stuck);
        changed = true;
      }
    }
  }
  return blocked;
}
