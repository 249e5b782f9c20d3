import fc from 'fast-check';
import { suggestionInputArbitrary, suggestionViolations } from '../testing/cycles.fixture.js';
import { epochMs } from '../units/units.js';
import { priorityTier, projectLaunchTimes } from './launch-projection.js';
import { scheduleLaunches } from './launch-scheduler.js';
import { suggestLineup, type SuggestionInput } from './lineup-suggestion.js';

/**
 * The earliest possible last launch over every lineup that keeps the rules (open catapults in reach,
 * no aircraft behind a lower priority), by exhaustive search. Lineups are built by inserting aircraft
 * one at a time, tier by tier, at every place of every lane, so each lineup is met exactly once; a
 * branch is skipped only when a lower bound on its last launch cannot beat the best already found.
 */
function optimumLastLaunch(input: SuggestionInput, upperBound: number): number {
  const open = [...input.catapults]
    .sort((a, b) => a.number - b.number)
    .filter((catapult) => catapult.up && !(input.landingAreaInUse && catapult.position === 'waist'));
  const resetMs = open.map((catapult) => catapult.resetInterval * 1000);
  const arrival = input.aircraft.map((aircraft) =>
    open.map((catapult) => {
      const taxi = input.taxiTimes[aircraft.id]?.[catapult.id];
      return taxi === undefined ? Infinity : input.cycleStart + taxi * 1000;
    }),
  );
  const tier = input.aircraft.map((aircraft) => priorityTier(aircraft.priority));
  const order = input.aircraft
    .map((_, index) => index)
    .filter((index) => arrival[index].some(Number.isFinite))
    .sort((a, b) => tier[a] - tier[b]);
  const lanes: number[][] = open.map(() => []);
  const notBefore = new Float64Array(input.aircraft.length);
  let best = upperBound;

  // A lane's last launch is no earlier than its aircraft sorted by arrival, each one reset apart.
  const laneBound = (lane: readonly number[], catapult: number): number => {
    const arrivals = lane.map((aircraft) => Math.max(input.cycleStart, arrival[aircraft][catapult])).sort((a, b) => a - b);
    return Math.max(input.cycleStart, ...arrivals.map((time, j) => time + (arrivals.length - 1 - j) * resetMs[catapult]));
  };

  const search = (next: number): void => {
    if (lanes.some((lane, catapult) => laneBound(lane, catapult) >= best)) return;
    if (next === order.length) {
      lanes.forEach((lane, catapult) => lane.forEach((aircraft) => (notBefore[aircraft] = arrival[aircraft][catapult])));
      const times = scheduleLaunches({
        earliest: input.cycleStart,
        pairGapMs: input.pairMinimumGap * 1000,
        catapults: open.map((catapult, c) => ({ resetMs: resetMs[c], group: catapult.pairId })),
        lanes,
        notBefore,
        tier,
        fixed: [],
      });
      best = Math.min(best, Math.max(input.cycleStart, ...lanes.flat().map((aircraft) => times[aircraft])));
      return;
    }
    const aircraft = order[next];
    lanes.forEach((lane, catapult) => {
      if (!Number.isFinite(arrival[aircraft][catapult])) return;
      const firstPlace = lane.filter((other) => tier[other] < tier[aircraft]).length;
      for (let place = firstPlace; place <= lane.length; place += 1) {
        lane.splice(place, 0, aircraft);
        search(next + 1);
        lane.splice(place, 1);
      }
    });
  };
  search(0);
  return best;
}

const permutations = <T>(items: readonly T[]): T[][] =>
  items.length <= 1 ? [[...items]] : items.flatMap((item, index) => permutations(items.filter((_, other) => other !== index)).map((rest) => [item, ...rest]));

/** The same optimum the plain way: every assignment, every order, through the public projection, no bound. */
function plainOptimumLastLaunch(input: SuggestionInput): number {
  const open = input.catapults.filter((catapult) => catapult.up && !(input.landingAreaInUse && catapult.position === 'waist'));
  const reachable = input.aircraft.filter((aircraft) => open.some((catapult) => input.taxiTimes[aircraft.id]?.[catapult.id] !== undefined));
  const tierOf = new Map(input.aircraft.map((aircraft) => [aircraft.id, priorityTier(aircraft.priority)]));
  let best = Infinity;
  const assign = (index: number, lanes: Record<string, string[]>): void => {
    if (index === reachable.length) {
      const orders = Object.entries(lanes).map(([catapultId, lane]) =>
        permutations(lane)
          .filter((order) => order.every((id, place) => place === 0 || (tierOf.get(order[place - 1]) ?? 1) <= (tierOf.get(id) ?? 1)))
          .map((order) => [catapultId, order] as const),
      );
      const combine = (lane: number, chosen: Record<string, string[]>): void => {
        if (lane === orders.length) {
          const notBefore = Object.fromEntries(
            Object.entries(chosen).flatMap(([catapultId, order]) => order.map((id) => [id, epochMs(input.cycleStart + (input.taxiTimes[id]?.[catapultId] ?? 0) * 1000)])),
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
      { numRuns: 60, seed: 4 },
    );
  });
});

describe('suggested lineup against the exhaustive optimum', () => {
  it('finishes within 5% of the optimum on 200 random cycles of up to 8 aircraft and breaks no rule', () => {
    const gaps: number[] = [];
    fc.assert(
      fc.property(suggestionInputArbitrary(8), (input) => {
        const suggestion = suggestLineup(input);
        expect(suggestionViolations(input, suggestion)).toEqual([]);
        const suggested = suggestion.projection.lastLaunch ?? input.cycleStart;
        const optimum = optimumLastLaunch(input, suggested + 1);
        expect(optimum).toBeLessThanOrEqual(suggested);
        const gap = optimum === input.cycleStart ? 0 : (suggested - optimum) / (optimum - input.cycleStart);
        gaps.push(gap);
        expect(gap).toBeLessThanOrEqual(0.05);
      }),
      { numRuns: 200, seed: 20261201 },
    );
    const worst = Math.max(...gaps);
    const optimal = gaps.filter((gap) => gap === 0).length;
    console.info(`Suggested lineup vs optimum over ${gaps.length} cycles: worst gap ${(worst * 100).toFixed(2)}%, optimal in ${optimal}`);
    expect(gaps).toHaveLength(200);
  });
});
