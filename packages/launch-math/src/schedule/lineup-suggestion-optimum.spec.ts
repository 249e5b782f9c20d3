import fc from 'fast-check';
import { suggestionInputArbitrary, suggestionViolations } from '../testing/cycles.fixture.js';
import { epochMs } from '../units/units.js';
import { priorityTier, projectLaunchTimes } from './launch-projection.js';
import { suggestLineup, type SuggestionInput } from './lineup-suggestion.js';

interface PlainCycle {
  readonly earliest: number;
  readonly pairGapMs: number;
  readonly resetMs: readonly number[];
  readonly pair: readonly string[];
  /** arrival[aircraft][catapult], epoch ms; Infinity when out of reach. */
  readonly arrival: readonly (readonly number[])[];
  readonly tier: readonly number[];
}

/**
 * The last launch of a lineup, simulated plainly from the rules as the package README states them
 * (lane order, reset interval, taxi arrival, pair gap, priority holds with no overtaking in a lane,
 * earliest launch first, ties to the lower catapult): written apart from launch-scheduler.ts, and
 * slow, so that the optimum below does not lean on the code it judges.
 */
function plainLastLaunch(cycle: PlainCycle, lanes: readonly (readonly number[])[]): number {
  const launches: { catapult: number; time: number; tier: number }[] = [];
  const effective = lanes.map((lane) =>
    lane.map((_, place) => Math.max(...lane.slice(0, place + 1).map((aircraft) => cycle.tier[aircraft]))),
  );
  const head = lanes.map(() => 0);
  let last = cycle.earliest;
  for (;;) {
    const waiting = lanes.flatMap((lane, catapult) => (head[catapult] < lane.length ? [catapult] : []));
    if (waiting.length === 0) return last;
    const phase = Math.min(...waiting.map((catapult) => effective[catapult][head[catapult]]));
    const hold = Math.max(
      cycle.earliest,
      ...launches.filter((launch) => launch.tier < phase).map((launch) => launch.time),
    );
    let chosen = { catapult: -1, time: Infinity };
    for (const catapult of waiting) {
      if (effective[catapult][head[catapult]] !== phase) continue;
      const own = launches
        .filter((launch) => launch.catapult === catapult)
        .map((launch) => launch.time + cycle.resetMs[catapult]);
      let time = Math.max(hold, cycle.arrival[lanes[catapult][head[catapult]]][catapult], ...own);
      const partners = launches.filter(
        (launch) => launch.catapult !== catapult && cycle.pair[launch.catapult] === cycle.pair[catapult],
      );
      for (let clash = partners.find((launch) => Math.abs(launch.time - time) < cycle.pairGapMs); clash;) {
        time = clash.time + cycle.pairGapMs;
        clash = partners.find((launch) => Math.abs(launch.time - time) < cycle.pairGapMs);
      }
      if (time < chosen.time) chosen = { catapult, time };
    }
    launches.push({ catapult: chosen.catapult, time: chosen.time, tier: phase });
    head[chosen.catapult] += 1;
    last = Math.max(last, chosen.time);
  }
}

/**
 * The earliest possible last launch over every lineup that keeps the rules (open catapults in reach,
 * no aircraft behind a lower priority), by exhaustive search. Lineups are built by inserting aircraft
 * one at a time, tier by tier, at every place of every lane, so each lineup is met exactly once; a
 * branch is skipped only when a lower bound on its last launch cannot beat the best already found.
 * Null when the search would visit more than `branchBudget` branches: the yardstick cannot judge that
 * cycle in the time a test has.
 */
function optimumLastLaunch(input: SuggestionInput, upperBound: number, branchBudget = Infinity): number | null {
  const open = [...input.catapults]
    .sort((a, b) => a.number - b.number)
    .filter((catapult) => catapult.up && !(input.landingAreaInUse && catapult.position === 'waist'));
  const cycle: PlainCycle = {
    earliest: Math.max(input.cycleStart, input.window.start),
    pairGapMs: input.pairMinimumGap * 1000,
    resetMs: open.map((catapult) => catapult.resetInterval * 1000),
    pair: open.map((catapult) => catapult.pairId),
    arrival: input.aircraft.map((aircraft) =>
      open.map((catapult) => {
        const taxi = input.taxiTimes[aircraft.id]?.[catapult.id];
        return taxi === undefined ? Infinity : input.cycleStart + taxi * 1000;
      }),
    ),
    tier: input.aircraft.map((aircraft) => ({ first: 0, normal: 1, last: 2 })[aircraft.priority]),
  };
  const order = input.aircraft
    .map((_, index) => index)
    .filter((index) => cycle.arrival[index].some(Number.isFinite))
    .sort((a, b) => cycle.tier[a] - cycle.tier[b]);
  const lanes: number[][] = open.map(() => []);
  let best = upperBound;

  // A lane's last launch is no earlier than its aircraft sorted by arrival, each one reset apart.
  const laneBound = (lane: readonly number[], catapult: number): number => {
    const arrivals = lane
      .map((aircraft) => Math.max(cycle.earliest, cycle.arrival[aircraft][catapult]))
      .sort((a, b) => a - b);
    return Math.max(
      cycle.earliest,
      ...arrivals.map((time, j) => time + (arrivals.length - 1 - j) * cycle.resetMs[catapult]),
    );
  };

  // With the aircraft still to place, each lane's last launch is also no earlier than its count of
  // aircraft, one reset apart from the earliest time: fill the lanes where that costs least (as if
  // any aircraft could reach any lane, so the bound stays below every real lineup).
  const withRest = (next: number): number => {
    const counts = lanes.map((lane) => lane.length);
    const ends = lanes.map((lane, catapult) => laneBound(lane, catapult));
    for (let rest = next; rest < order.length; rest += 1) {
      const cost = (catapult: number): number =>
        Math.max(ends[catapult], cycle.earliest + counts[catapult] * cycle.resetMs[catapult]);
      const cheapest = lanes.reduce((chosen, _, catapult) => (cost(catapult) < cost(chosen) ? catapult : chosen), 0);
      ends[cheapest] = cost(cheapest);
      counts[cheapest] += 1;
    }
    return Math.max(...ends);
  };

  let branches = 0;
  const search = (next: number): void => {
    branches += 1;
    if (branches > branchBudget || withRest(next) >= best) return;
    if (next === order.length) {
      best = Math.min(best, plainLastLaunch(cycle, lanes));
      return;
    }
    const aircraft = order[next];
    lanes.forEach((lane, catapult) => {
      if (!Number.isFinite(cycle.arrival[aircraft][catapult])) return;
      const firstPlace = lane.filter((other) => cycle.tier[other] < cycle.tier[aircraft]).length;
      for (let place = firstPlace; place <= lane.length; place += 1) {
        lane.splice(place, 0, aircraft);
        search(next + 1);
        lane.splice(place, 1);
      }
    });
  };
  search(0);
  return branches > branchBudget ? null : best;
}

const permutations = <T>(items: readonly T[]): T[][] =>
  items.length <= 1
    ? [[...items]]
    : items.flatMap((item, index) =>
        permutations(items.filter((_, other) => other !== index)).map((rest) => [item, ...rest]),
      );

/** The same optimum the plain way: every assignment, every order, through the public projection, no bound. */
function plainOptimumLastLaunch(input: SuggestionInput): number {
  const open = input.catapults.filter(
    (catapult) => catapult.up && !(input.landingAreaInUse && catapult.position === 'waist'),
  );
  const reachable = input.aircraft.filter((aircraft) =>
    open.some((catapult) => input.taxiTimes[aircraft.id]?.[catapult.id] !== undefined),
  );
  const tierOf = new Map(input.aircraft.map((aircraft) => [aircraft.id, priorityTier(aircraft.priority)]));
  let best = Infinity;
  const assign = (index: number, lanes: Record<string, string[]>): void => {
    if (index === reachable.length) {
      const orders = Object.entries(lanes).map(([catapultId, lane]) =>
        permutations(lane)
          .filter((order) =>
            order.every((id, place) => place === 0 || (tierOf.get(order[place - 1]) ?? 1) <= (tierOf.get(id) ?? 1)),
          )
          .map((order) => [catapultId, order] as const),
      );
      const combine = (lane: number, chosen: Record<string, string[]>): void => {
        if (lane === orders.length) {
          const notBefore = Object.fromEntries(
            Object.entries(chosen).flatMap(([catapultId, order]) =>
              order.map((id) => [id, epochMs(input.cycleStart + (input.taxiTimes[id]?.[catapultId] ?? 0) * 1000)]),
            ),
          );
          const priorities = Object.fromEntries(input.aircraft.map((aircraft) => [aircraft.id, aircraft.priority]));
          const projection = projectLaunchTimes({ ...input, lanes: chosen, notBefore, priorities });
          best = Math.min(best, projection.lastLaunch ?? input.cycleStart);
          return;
        }
        for (const [catapultId, order] of orders[lane]) combine(lane + 1, { ...chosen, [catapultId]: order });
      };
      combine(0, {});
      return;
    }
    const aircraft = reachable[index];
    for (const catapult of open) {
      if (input.taxiTimes[aircraft.id]?.[catapult.id] === undefined) continue;
      assign(index + 1, { ...lanes, [catapult.id]: [...(lanes[catapult.id] ?? []), aircraft.id] });
    }
  };
  assign(0, {});
  return reachable.length === 0 ? input.cycleStart : best;
}

describe('exhaustive search used as the yardstick', () => {
  it('agrees with plain enumeration through the public projection on cycles of up to 4 aircraft', () => {
    fc.assert(
      fc.property(suggestionInputArbitrary(4), (input) => {
        expect(optimumLastLaunch(input, Infinity)).toBe(plainOptimumLastLaunch(input));
      }),
      { numRuns: 60 },
    );
  });
});

// Both rows run on the suite's fast-check seed (jest.config.js draws a fresh one each run and prints it;
// FC_SEED=<seed> repeats a run). The 1-8 row once kept a fixed seed while fresh ones found the suggestion
// 10 % and 16 % behind the optimum (FC_SEED=121483936 and 1), until the branch and bound stage that ends
// the suggestion on cycles of up to eight aircraft. On ten aircraft, where that stage does not run, a few
// cycles take the exhaustive yardstick minutes (FC_SEED=1187696669 drew one of 235-370 s on the loaded
// 2-core machine): the yardstick gives up on a cycle past its branch budget, which the row prints, and
// the row fails unless it judged at least six of its ten cycles (with twice this budget, one cycle in
// twenty went past it, on FC_SEED=1702726021 and 1187696669).
const TEN_AIRCRAFT_BRANCH_BUDGET = 1_000_000;

describe('suggested lineup against the exhaustive optimum', () => {
  it.each([
    { cycles: 200, minAircraft: 1, maxAircraft: 8, branchBudget: Infinity, judgedAtLeast: 200 },
    { cycles: 10, minAircraft: 10, maxAircraft: 10, branchBudget: TEN_AIRCRAFT_BRANCH_BUDGET, judgedAtLeast: 6 },
  ])(
    'finishes within 5% of the optimum on $cycles random cycles of $minAircraft to $maxAircraft aircraft and breaks no rule',
    ({ cycles, minAircraft, maxAircraft, branchBudget, judgedAtLeast }) => {
      const { seed } = fc.readConfigureGlobal();
      const gaps: number[] = [];
      let unjudged = 0;
      fc.assert(
        fc.property(suggestionInputArbitrary(maxAircraft, minAircraft), (input) => {
          const suggestion = suggestLineup(input);
          expect(suggestionViolations(input, suggestion)).toEqual([]);
          const suggested = suggestion.projection.lastLaunch ?? input.cycleStart;
          const optimum = optimumLastLaunch(input, suggested + 1, branchBudget);
          if (optimum === null) {
            unjudged += 1;
            return;
          }
          expect(optimum).toBeLessThanOrEqual(suggested);
          const gap = optimum === input.cycleStart ? 0 : (suggested - optimum) / (optimum - input.cycleStart);
          gaps.push(gap);
          expect(gap).toBeLessThanOrEqual(0.05);
        }),
        { numRuns: cycles, seed },
      );
      const worst = Math.max(...gaps);
      const optimal = gaps.filter((gap) => gap === 0).length;
      console.info(
        `Suggested lineup vs optimum over ${gaps.length} cycles of ${minAircraft}-${maxAircraft} aircraft (fast-check seed ${seed}): worst gap ${(worst * 100).toFixed(2)}%, optimal in ${optimal}; past the yardstick's budget: ${unjudged}`,
      );
      expect(gaps.length).toBeGreaterThanOrEqual(judgedAtLeast);
    },
    600_000,
  );
});
