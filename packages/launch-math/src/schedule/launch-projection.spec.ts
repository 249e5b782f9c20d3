import fc from 'fast-check';
import { LaunchMathInputError } from '../errors.js';
import {
  at,
  CYCLE_START,
  fourCatapults,
  projectionInputArbitrary,
  scheduleViolations,
} from '../testing/cycles.fixture.js';
import { seconds } from '../units/units.js';
import { projectLaunchTimes, type ProjectionInput } from './launch-projection.js';

const base = (overrides: Partial<ProjectionInput> = {}): ProjectionInput => ({
  cycleStart: CYCLE_START,
  window: { start: CYCLE_START, end: at(3600) },
  catapults: fourCatapults(60),
  landingAreaInUse: false,
  lanes: {},
  pairMinimumGap: seconds(0),
  ...overrides,
});

const timesOf = (input: ProjectionInput): Record<string, number> =>
  Object.fromEntries(projectLaunchTimes(input).slots.map((slot) => [slot.slotId, (slot.time - CYCLE_START) / 1000]));

describe('projected launch times', () => {
  it('launch a lane one reset interval apart, in lane order', () => {
    expect(timesOf(base({ lanes: { cat1: ['a', 'b', 'c'] } }))).toEqual({ a: 0, b: 60, c: 120 });
  });

  it('keep the pair gap between the two catapults of a pair but not across pairs', () => {
    const times = timesOf(base({ pairMinimumGap: seconds(20), lanes: { cat1: ['a'], cat2: ['b'], cat3: ['c'] } }));
    expect(times).toEqual({ a: 0, b: 20, c: 0 });
  });

  // PBS Frontline ("Launch and land"): each of four catapults can launch every 1 min 45 s. By hand: four
  // catapults each busy 105 s per launch give 105 / 4 = 26.25 s per launch over a long run (the source
  // rounds it to "about one plane every 30 seconds"). The pair gap of 10 s is common practice, no source.
  it('sustain one launch every 26.25 s from four catapults each launching every 1 min 45 s', () => {
    const lanes = Object.fromEntries(
      [1, 2, 3, 4].map((n) => [`cat${n}`, Array.from({ length: 30 }, (_, i) => `c${n}-${i}`)]),
    );
    const projection = projectLaunchTimes(
      base({
        catapults: fourCatapults(105),
        pairMinimumGap: seconds(10),
        lanes,
        window: { start: CYCLE_START, end: at(7200) },
      }),
    );
    const times = projection.slots.map((slot) => (slot.time - CYCLE_START) / 1000);
    // 120 launches: each catapult's last launch at 29 x 105 = 3,045 s; one more reset ends its run at 3,150 s.
    expect(Math.max(...times) + 105).toBe(3150 + 10); // by hand: the second of each pair runs 10 s behind the first
    expect((Math.max(...times) + 105 - 10) / times.length).toBe(26.25); // by hand: 3,150 s / 120 launches
    // The pair gap, not the input interval, is what this checks: the second catapult of a pair always
    // fires 10 s after the first, never with it.
    const of = (catapult: string) =>
      projection.slots.filter((slot) => slot.catapultId === catapult).map((slot) => (slot.time - CYCLE_START) / 1000);
    expect(of('cat2').map((time, i) => time - of('cat1')[i])).toEqual(Array(30).fill(10));
  });

  it('list the slots that miss the window and the last launch', () => {
    const projection = projectLaunchTimes(
      base({ window: { start: CYCLE_START, end: at(100) }, lanes: { cat1: ['a', 'b', 'c'] } }),
    );
    expect(projection.missingWindow).toEqual(['c']);
    expect(projection.lastLaunch).toBe(at(120));
    expect(projection.slots.map((slot) => slot.missesWindow)).toEqual([false, false, true]);
  });

  it('wait for the window to open', () => {
    expect(timesOf(base({ window: { start: at(300), end: at(900) }, lanes: { cat1: ['a'] } }))).toEqual({ a: 300 });
  });

  it('cannot schedule slots on a catapult that is down or on the waist while the landing area is in use', () => {
    const projection = projectLaunchTimes(
      base({
        catapults: fourCatapults(60, [false, true, true, true]),
        landingAreaInUse: true,
        lanes: { cat1: ['a'], cat2: ['b'], cat3: ['c'] },
      }),
    );
    expect(projection.slots.map((slot) => slot.slotId)).toEqual(['b']);
    expect(projection.unschedulable).toEqual([
      { slotId: 'a', catapultId: 'cat1', reason: 'catapult_down' },
      { slotId: 'c', catapultId: 'cat3', reason: 'waist_closed' },
    ]);
  });

  it('keep launched slots at their actual times and count the reset from them', () => {
    const projection = projectLaunchTimes(base({ lanes: { cat1: ['a', 'b'] }, launched: { a: at(45) } }));
    expect(projection.slots).toEqual([
      { slotId: 'a', catapultId: 'cat1', place: 1, time: at(45), launched: true, missesWindow: false },
      { slotId: 'b', catapultId: 'cat1', place: 2, time: at(105), launched: false, missesWindow: false },
    ]);
  });

  // Worked by hand (times invented, common practice, no source): planned from 0 s, a and c would go at
  // 0 s, b at 60 s, d at 60 s. Launching ran late: a went at 300 s and c at 310 s, and it is now 320 s.
  // b follows a's reset, 300 + 60 = 360 s; d follows c's, 310 + 60 = 370 s; e, on a third catapult
  // with nothing launched, goes now, at 320 s, not at 0 s as planned.
  it('re-base what is left on the launches made and now', () => {
    const lanes = { cat1: ['a', 'b'], cat3: ['c', 'd'], cat4: ['e'] };
    expect(timesOf(base({ lanes }))).toEqual({ a: 0, b: 60, c: 0, d: 60, e: 0 });
    expect(timesOf(base({ lanes, launched: { a: at(300), c: at(310) }, now: at(320) }))).toEqual({
      a: 300,
      b: 360,
      c: 310,
      d: 370,
      e: 320,
    });
  });

  it('project nothing before now or before an aircraft reaches its catapult', () => {
    expect(timesOf(base({ now: at(30), lanes: { cat1: ['a'], cat3: ['b'] }, notBefore: { b: at(200) } }))).toEqual({
      a: 30,
      b: 200,
    });
  });

  it('hold lower priorities until every higher priority has launched', () => {
    const times = timesOf(
      base({
        lanes: { cat1: ['tanker'], cat3: ['fighter', 'spare'] },
        notBefore: { tanker: at(90) },
        priorities: { tanker: 'first', spare: 'last' },
      }),
    );
    expect(times).toEqual({ tanker: 90, fighter: 90, spare: 150 });
  });

  it('lets nothing overtake what is ahead of it in its lane', () => {
    const times = timesOf(
      base({ lanes: { cat1: ['spare', 'tanker'], cat3: ['fighter'] }, priorities: { tanker: 'first', spare: 'last' } }),
    );
    expect(times).toEqual({ fighter: 0, spare: 0, tanker: 60 });
  });

  // Worked example, by hand (times invented, common practice, no source): A parked at the front of a
  // row taxis 60 s to catapult 1; B behind it taxis 30 s to catapult 3. A leaves its spot just in time
  // for its launch: catapult 1 is busy with x until 120 s, so A launches at 120 s and leaves at
  // 120 - 60 = 60 s. B can leave then and launches at 60 + 30 = 90 s, not at its 30 s taxi arrival.
  it('let an aircraft parked behind another taxi out only once the one in front has left', () => {
    const input = base({
      catapults: fourCatapults(120),
      lanes: { cat1: ['x', 'A'], cat3: ['B'] },
      notBefore: { A: at(60), B: at(30) },
      clearBefore: { B: ['A'] },
    });
    expect(timesOf(input)).toEqual({ x: 0, A: 120, B: 90 });
    // Without the rule B would go at its arrival.
    expect(timesOf({ ...input, clearBefore: undefined })).toEqual({ x: 0, A: 120, B: 30 });
  });

  it('take a launched aircraft in front as gone', () => {
    const input = base({
      lanes: { cat1: ['A'], cat3: ['B'] },
      launched: { A: at(10) },
      notBefore: { B: at(30) },
      clearBefore: { B: ['A'] },
    });
    expect(timesOf(input)).toEqual({ A: 10, B: 30 });
  });

  it('send the aircraft in front first when the one behind has the higher priority', () => {
    // The tanker is parked behind a fighter: the fighter takes the tanker's priority so that the
    // tanker is not stuck waiting for it; the spare on catapult 2 then waits for both.
    const times = timesOf(
      base({
        lanes: { cat1: ['fighter'], cat3: ['tanker'], cat2: ['other'] },
        notBefore: { fighter: at(40), tanker: at(20), other: at(0) },
        priorities: { tanker: 'first' },
        clearBefore: { tanker: ['fighter'] },
      }),
    );
    // By hand: fighter at 40 s (left at 0 s), tanker at max(20, 0 + 20) = 20 s; other holds for both: 40 s.
    expect(times).toEqual({ fighter: 40, tanker: 20, other: 40 });
  });

  it('name the aircraft that must move when the one in front does not go first', () => {
    // B is ahead of A in the lane but parked behind it: neither can go, and everything behind B waits.
    // C is parked behind an aircraft in no lane at all.
    const projection = projectLaunchTimes(
      base({
        lanes: { cat1: ['B', 'A', 'D'], cat2: ['C'], cat3: ['E'] },
        clearBefore: { B: ['A'], C: ['parked'] },
      }),
    );
    expect(projection.slots.map((slot) => slot.slotId)).toEqual(['E']);
    expect(projection.unschedulable).toEqual([
      { slotId: 'B', catapultId: 'cat1', reason: 'spot_blocked', mustMove: ['A'] },
      { slotId: 'A', catapultId: 'cat1', reason: 'spot_blocked', mustMove: ['A'] },
      { slotId: 'D', catapultId: 'cat1', reason: 'spot_blocked', mustMove: ['A'] },
      { slotId: 'C', catapultId: 'cat2', reason: 'spot_blocked', mustMove: ['parked'] },
    ]);
  });

  it('pause the catapults the ship marks as inside the landing area while it is in use', () => {
    // A ship whose landing area covers catapult 2 and not the waist catapult 4.
    const catapults = fourCatapults(60).map((catapult) => ({
      ...catapult,
      inLandingArea: catapult.id === 'cat2' || catapult.id === 'cat3',
    }));
    const lanes = { cat1: ['a'], cat2: ['b'], cat3: ['c'], cat4: ['d'] };
    const recovering = projectLaunchTimes(base({ catapults, landingAreaInUse: true, lanes }));
    expect(recovering.slots.map((slot) => slot.slotId)).toEqual(['a', 'd']);
    expect(recovering.unschedulable.map((slot) => [slot.slotId, slot.reason])).toEqual([
      ['b', 'waist_closed'],
      ['c', 'waist_closed'],
    ]);
    expect(projectLaunchTimes(base({ catapults, landingAreaInUse: false, lanes })).unschedulable).toEqual([]);
  });

  it('refuses a slot in two lanes or a lane for an unknown catapult', () => {
    expect(() => projectLaunchTimes(base({ lanes: { cat1: ['a'], cat2: ['a'] } }))).toThrow(LaunchMathInputError);
    expect(() => projectLaunchTimes(base({ lanes: { cat9: ['a'] } }))).toThrow(LaunchMathInputError);
    expect(() => projectLaunchTimes(base({ window: { start: at(10), end: at(5) } }))).toThrow(LaunchMathInputError);
  });

  it('never break a reset interval, a pair gap, an earliest time, a priority or lane order', () => {
    fc.assert(
      fc.property(projectionInputArbitrary, (input) => {
        expect(scheduleViolations(input, projectLaunchTimes(input))).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });
});
