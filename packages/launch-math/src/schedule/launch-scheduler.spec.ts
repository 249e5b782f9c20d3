import fc from 'fast-check';
import { LaunchScheduler, type SchedulerSetup } from './launch-scheduler.js';

const SLOTS = 9;
const EARLIEST = 1_000_000;

interface Case {
  readonly setup: SchedulerSetup;
  readonly lanes: number[][];
  readonly notBefore: number[];
  /** A slot in no lane, for inserting. */
  readonly spare: number;
}

/**
 * A random problem on up to four catapults (two pairs), with tiers, taxi arrivals and, now and then,
 * slots waiting on others in their row; one slot is kept out of the lanes. Figures are invented: they
 * only need to make launches collide.
 */
const caseArbitrary: fc.Arbitrary<Case> = fc
  .record({
    catapults: fc.integer({ min: 1, max: 4 }),
    resets: fc.array(fc.integer({ min: 0, max: 90_000 }), { minLength: 4, maxLength: 4 }),
    pairGapMs: fc.integer({ min: 0, max: 40_000 }),
    tier: fc.array(fc.integer({ min: 0, max: 2 }), { minLength: SLOTS, maxLength: SLOTS }),
    arrivals: fc.array(fc.integer({ min: 0, max: 400_000 }), { minLength: SLOTS, maxLength: SLOTS }),
    lane: fc.array(fc.nat(), { minLength: SLOTS, maxLength: SLOTS }),
    order: fc.shuffledSubarray([...Array(SLOTS).keys()], { minLength: SLOTS, maxLength: SLOTS }),
    blockers: fc.array(fc.option(fc.integer({ min: 0, max: SLOTS - 1 }), { freq: 3 }), {
      minLength: SLOTS,
      maxLength: SLOTS,
    }),
  })
  .map(({ catapults, resets, pairGapMs, tier, arrivals, lane, order, blockers }) => {
    const lanes: number[][] = Array.from({ length: catapults }, () => []);
    const spare = order[SLOTS - 1];
    for (const slot of order.slice(0, -1)) lanes[lane[slot] % catapults].push(slot);
    return {
      setup: {
        earliest: EARLIEST,
        pairGapMs,
        catapults: resets
          .slice(0, catapults)
          .map((resetMs, catapult) => ({ resetMs, group: catapult < 2 ? 'bow' : 'waist' })),
        tier,
        fixed: [],
        taxiStart: EARLIEST,
        clearAfter: blockers.map((blocker, slot) => (blocker === null || blocker === slot ? undefined : [blocker])),
      },
      lanes,
      notBefore: arrivals.map((arrival) => EARLIEST + arrival),
      spare,
    };
  });

const fromScratch = (setup: SchedulerSetup, lanes: readonly (readonly number[])[], notBefore: number[]): number[] => {
  const scheduler = new LaunchScheduler(setup);
  scheduler.run(lanes, notBefore);
  return Array.from(scheduler.times);
};

describe('launch scheduler shortcuts', () => {
  it('gives a lineup with one slot inserted, resumed from the recorded lineup, the times of a run from scratch', () => {
    fc.assert(
      fc.property(caseArbitrary, fc.nat(), fc.nat(), ({ setup, lanes, notBefore, spare }, laneDraw, placeDraw) => {
        const scheduler = new LaunchScheduler(setup);
        scheduler.record(lanes, notBefore);
        const catapult = laneDraw % lanes.length;
        const place = placeDraw % (lanes[catapult].length + 1);
        const step = scheduler.stepBefore(catapult, place);
        lanes[catapult].splice(place, 0, spare);
        scheduler.resume(lanes, notBefore, step);
        expect(Array.from(scheduler.times)).toEqual(fromScratch(setup, lanes, notBefore));
      }),
      { numRuns: 500 },
    );
  });

  it('gives a lineup with two slots swapped, resumed from the recorded lineup, the times of a run from scratch', () => {
    fc.assert(
      fc.property(caseArbitrary, fc.nat(), fc.nat(), ({ setup, lanes, notBefore }, firstDraw, secondDraw) => {
        const places = lanes.flatMap((lane, catapult) => lane.map((_, place) => [catapult, place] as const));
        const [a, b] = [places[firstDraw % places.length], places[secondDraw % places.length]];
        const scheduler = new LaunchScheduler(setup);
        scheduler.record(lanes, notBefore);
        const step = Math.min(scheduler.stepBefore(...a), scheduler.stepBefore(...b));
        [lanes[a[0]][a[1]], lanes[b[0]][b[1]]] = [lanes[b[0]][b[1]], lanes[a[0]][a[1]]];
        scheduler.resume(lanes, notBefore, step);
        expect(Array.from(scheduler.times)).toEqual(fromScratch(setup, lanes, notBefore));
      }),
      { numRuns: 500 },
    );
  });

  it('stops a run given a latest time only when some slot launches after it or never, else gives the full times', () => {
    fc.assert(
      fc.property(
        caseArbitrary,
        fc.nat(),
        fc.integer({ min: -1, max: 1 }),
        ({ setup, lanes, notBefore }, slotDraw, offset) => {
          const full = fromScratch(setup, lanes, notBefore);
          // Just before, at or just after some slot's launch: where a wrong comparison would show.
          const near = full[lanes.flat()[slotDraw % lanes.flat().length]];
          const latest = (Number.isNaN(near) ? EARLIEST + 300_000 : near) + offset;
          const tooLate = lanes.flat().some((slot) => !(full[slot] <= latest));
          const scheduler = new LaunchScheduler(setup);
          expect(scheduler.run(lanes, notBefore, latest)).toBe(!tooLate);
          if (!tooLate) expect(Array.from(scheduler.times)).toEqual(full);
        },
      ),
      { numRuns: 500 },
    );
  });
});
