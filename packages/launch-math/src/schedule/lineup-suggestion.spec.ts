import fc from 'fast-check';
import { LaunchMathInputError } from '../errors.js';
import {
  at,
  CYCLE_START,
  fourCatapults,
  suggestionInputArbitrary,
  suggestionViolations,
} from '../testing/cycles.fixture.js';
import { seconds } from '../units/units.js';
import { projectLaunchTimes } from './launch-projection.js';
import { priorityForRole, suggestLineup, type SuggestionInput } from './lineup-suggestion.js';

const everywhere = (taxi: number) => Object.fromEntries([1, 2, 3, 4].map((n) => [`cat${n}`, seconds(taxi)]));

const cycle = (overrides: Partial<SuggestionInput> = {}): SuggestionInput => ({
  cycleStart: CYCLE_START,
  window: { start: CYCLE_START, end: at(1800) },
  catapults: fourCatapults(60),
  landingAreaInUse: false,
  pairMinimumGap: seconds(0),
  aircraft: [],
  taxiTimes: {},
  ...overrides,
});

/** Aircraft in rows, in the order listed: each waits for every aircraft in front of it in its row. */
function rowsOf(ids: readonly string[], rowLengths: readonly number[]): Record<string, string[]> {
  const clearBefore: Record<string, string[]> = {};
  let rowStart = 0;
  ids.forEach((id, index) => {
    if (index - rowStart >= rowLengths[rowStart]) rowStart = index;
    if (index > rowStart) clearBefore[id] = ids.slice(rowStart, index).reverse();
  });
  return clearBefore;
}

describe('suggested lineup', () => {
  it('maps tankers and early warning to first and spares to last', () => {
    expect(['tanker', 'early_warning', 'mission', 'spare'].map((role) => priorityForRole(role as never))).toEqual([
      'first',
      'first',
      'normal',
      'last',
    ]);
  });

  it('spreads aircraft over the open catapults and sends each to the one it reaches first', () => {
    const input = cycle({
      landingAreaInUse: true,
      aircraft: [
        { id: 'near1', priority: 'normal' },
        { id: 'near2', priority: 'normal' },
      ],
      taxiTimes: {
        near1: { cat1: seconds(30), cat2: seconds(300), cat3: seconds(10) },
        near2: { cat1: seconds(300), cat2: seconds(30) },
      },
    });
    const suggestion = suggestLineup(input);
    expect(suggestion.lanes).toEqual({ cat1: ['near1'], cat2: ['near2'], cat3: [], cat4: [] });
    expect(suggestion.projection.lastLaunch).toBe(at(30));
  });

  it('puts the tanker first and the spare last', () => {
    const input = cycle({
      catapults: fourCatapults(60, [true, false, false, false]),
      aircraft: [
        { id: 'spare', priority: 'last' },
        { id: 'fighter', priority: 'normal' },
        { id: 'tanker', priority: 'first' },
      ],
      taxiTimes: { spare: everywhere(0), fighter: everywhere(0), tanker: everywhere(120) },
    });
    expect(suggestLineup(input).lanes.cat1).toEqual(['tanker', 'fighter', 'spare']);
  });

  it('leaves out only aircraft that cannot reach an open catapult', () => {
    const input = cycle({
      catapults: fourCatapults(60, [true, true, false, true]),
      aircraft: [
        { id: 'stuck', priority: 'normal' },
        { id: 'free', priority: 'normal' },
      ],
      taxiTimes: { stuck: { cat3: seconds(60) }, free: everywhere(60) },
    });
    const suggestion = suggestLineup(input);
    expect(suggestion.unplaced).toEqual([{ aircraftId: 'stuck', reason: 'no_catapult_reachable' }]);
    expect(Object.values(suggestion.lanes).flat()).toEqual(['free']);
  });

  // Worked example, by hand (invented times, common practice, no source): one catapult, reset 60 s.
  // B taxis 10 s but is parked behind A, which taxis 60 s. Ignoring the row, B then A finishes at
  // 10 + 60 = 70 s. With it, B cannot leave before A: A launches at 60 s (leaving at 0 s) and B at
  // 60 + 60 = 120 s; B first would strand both.
  it('sends the aircraft in front of a row before the one parked behind it', () => {
    const input = cycle({
      catapults: fourCatapults(60, [true, false, false, false]),
      aircraft: [
        { id: 'B', priority: 'normal' },
        { id: 'A', priority: 'normal' },
      ],
      taxiTimes: { A: everywhere(60), B: everywhere(10) },
    });
    expect(suggestLineup(input).lanes.cat1).toEqual(['B', 'A']);
    expect(suggestLineup(input).projection.lastLaunch).toBe(at(70));
    const rowed = suggestLineup({ ...input, clearBefore: { B: ['A'] } });
    expect(rowed.lanes.cat1).toEqual(['A', 'B']);
    expect(rowed.projection.lastLaunch).toBe(at(120));
    expect(rowed.projection.unschedulable).toEqual([]);
  });

  it('keeps the priority of an aircraft whose row holds only aircraft left out', () => {
    // The row property below found this with fast-check seed 1179357029 (shrunk). `spare` is parked in front
    // of `stuck`, which reaches no catapult: the search once lifted `spare` to first for `stuck`'s sake, put
    // it in front of `tanker` on cat 2, and the lineup's projection (which holds spares last) stranded
    // `escort`, parked behind `tanker`. Worked by hand: `escort` launches at once from cat 1, `tanker` when
    // it has taxied 67 s to cat 2, and `spare`, held until the first-priority aircraft go, at 67 s from cat 1.
    const suggestion = suggestLineup(
      cycle({
        catapults: fourCatapults(40),
        aircraft: [
          { id: 'tanker', priority: 'first' },
          { id: 'escort', priority: 'first' },
          { id: 'spare', priority: 'last' },
          { id: 'stuck', priority: 'first' },
        ],
        taxiTimes: {
          tanker: { cat2: seconds(67) },
          escort: { cat1: seconds(0) },
          spare: { cat1: seconds(0), cat2: seconds(0) },
        },
        clearBefore: { escort: ['tanker'], stuck: ['spare'] },
      }),
    );
    expect(suggestion.projection.unschedulable).toEqual([]);
    expect(suggestion.projection.lastLaunch).toBe(at(67));
    expect(suggestion.unplaced).toEqual([{ aircraftId: 'stuck', reason: 'no_catapult_reachable' }]);
  });

  it('leaves out, naming who must move, aircraft parked behind one that does not launch in the cycle', () => {
    const suggestion = suggestLineup(
      cycle({
        aircraft: [
          { id: 'behind', priority: 'normal' },
          { id: 'further', priority: 'normal' },
          { id: 'free', priority: 'normal' },
        ],
        taxiTimes: { behind: everywhere(30), further: everywhere(40), free: everywhere(30) },
        clearBefore: { behind: ['parked'], further: ['behind', 'parked'] },
      }),
    );
    expect(suggestion.unplaced).toEqual([
      { aircraftId: 'behind', reason: 'spot_blocked', mustMove: ['parked'] },
      { aircraftId: 'further', reason: 'spot_blocked', mustMove: ['behind', 'parked'] },
    ]);
    expect(Object.values(suggestion.lanes).flat()).toEqual(['free']);
  });

  it('strands no aircraft behind another in its row, and gives the same times as projecting its lineup', () => {
    fc.assert(
      fc.property(
        suggestionInputArbitrary(10).chain((input) =>
          fc
            .array(fc.integer({ min: 1, max: 3 }), {
              minLength: input.aircraft.length,
              maxLength: input.aircraft.length,
            })
            .map((rowLengths) => ({
              ...input,
              clearBefore: rowsOf(
                input.aircraft.map((a) => a.id),
                rowLengths,
              ),
            })),
        ),
        (input) => {
          const suggestion = suggestLineup(input);
          const again = projectLaunchTimes({
            ...input,
            lanes: suggestion.lanes,
            notBefore: suggestion.notBefore,
            priorities: suggestion.priorities,
          });
          expect(again).toEqual(suggestion.projection);
          expect(suggestion.projection.unschedulable.filter((slot) => slot.reason === 'spot_blocked')).toEqual([]);
          // Checked apart from the scheduler: each aircraft leaves its spot its taxi time before its launch,
          // and none leaves before every aircraft in front of it in its row.
          const time = new Map(suggestion.projection.slots.map((slot) => [slot.slotId, slot.time as number]));
          const leaves = (id: string) => time.get(id)! - (suggestion.notBefore[id] - CYCLE_START);
          for (const [behind, fronts] of Object.entries(input.clearBefore ?? {})) {
            if (!time.has(behind)) continue;
            for (const front of fronts) expect(time.has(front) && leaves(front) <= leaves(behind)).toBe(true);
          }
        },
      ),
      { numRuns: 60 },
    );
  });

  it('moves two aircraft at once when the last to launch needs a place another holds', () => {
    // The cycle the optimum property test found with fast-check seed 1133753927 (shrunk), where the
    // suggestion finished at 130 s, 44 % behind. Worked by hand: the first tier launches at 0 s (a4 cat1,
    // a8 cat2, a1 cat4) and 42 s (a9, one reset after a4 on cat1); the normal a7 at 42 s on cat4 and a5 at
    // 90 s, its taxi time; the last tier waits for a5, then a0 (cat1), a2 (cat3) and a6 (cat2) go at 90 s
    // together. Nothing launches a5 before 90 s, so 90 s is the optimum. Only a2 moving to cat3 frees cat2
    // for a6; either move alone leaves a6 behind a5 on cat4 at 130 s.
    const bow = { position: 'bow' as const, pairId: 'bow', resetInterval: seconds(42), up: true };
    const waist = { position: 'waist' as const, pairId: 'waist', resetInterval: seconds(40), up: true };
    const input = cycle({
      catapults: [
        { id: 'cat1', number: 1, ...bow },
        { id: 'cat2', number: 2, ...bow },
        { id: 'cat3', number: 3, ...waist },
        { id: 'cat4', number: 4, ...waist },
      ],
      aircraft: [
        { id: 'a0', priority: 'last' },
        { id: 'a1', priority: 'first' },
        { id: 'a2', priority: 'last' },
        { id: 'a3', priority: 'first' },
        { id: 'a4', priority: 'first' },
        { id: 'a5', priority: 'normal' },
        { id: 'a6', priority: 'last' },
        { id: 'a7', priority: 'normal' },
        { id: 'a8', priority: 'first' },
        { id: 'a9', priority: 'first' },
      ],
      taxiTimes: {
        a0: { cat1: seconds(0) },
        a1: { cat4: seconds(0) },
        a2: { cat2: seconds(0), cat3: seconds(0) },
        a3: {},
        a4: { cat1: seconds(0) },
        a5: { cat4: seconds(90) },
        a6: { cat1: seconds(0), cat2: seconds(0), cat4: seconds(0) },
        a7: { cat4: seconds(0) },
        a8: { cat2: seconds(0) },
        a9: { cat1: seconds(0) },
      },
    });
    const suggestion = suggestLineup(input);
    expect(suggestion.projection.lastLaunch).toBe(at(90));
    expect(suggestion.lanes.cat3).toEqual(['a2']);
    expect(suggestionViolations(input, suggestion)).toEqual([]);
  });

  it('takes a move that alone makes the lineup later when a second move then gains more', () => {
    // The cycle the optimum property test found with fast-check seed 121483936 (shrunk), where the
    // suggestion finished at 88 s, 10 % behind. Worked by hand: a1 reaches only cat2 (reset 88 s), a0 and a3
    // only cat3 (reset 40 s). With the tankers a4 and a6 on two catapults at 0 s, one of them is on cat2 and
    // a1 waits for its reset: 88 s at best. With both on cat1 (0 s and 40 s) the normal tier starts at 40 s:
    // a1 on cat2 and a0 on cat3 at 40 s, a2 on cat1 and a3 on cat3 at 80 s, the spare a5 on cat4 at 80 s.
    // So 80 s is the optimum. Moving a6 to cat1 alone puts the spare behind a3 on cat3 at 120 s; only
    // the spare's move to cat4 after it gains.
    const catapults = fourCatapults(40).map((catapult) =>
      catapult.id === 'cat2' ? { ...catapult, resetInterval: seconds(88) } : catapult,
    );
    const input = cycle({
      catapults,
      aircraft: [
        { id: 'a0', priority: 'normal' },
        { id: 'a1', priority: 'normal' },
        { id: 'a2', priority: 'normal' },
        { id: 'a3', priority: 'normal' },
        { id: 'a4', priority: 'first' },
        { id: 'a5', priority: 'last' },
        { id: 'a6', priority: 'first' },
      ],
      taxiTimes: {
        a0: { cat3: seconds(0) },
        a1: { cat2: seconds(0) },
        a2: { cat1: seconds(0) },
        a3: { cat3: seconds(0) },
        a4: { cat1: seconds(0), cat2: seconds(4) },
        a5: { cat1: seconds(93), cat3: seconds(0), cat4: seconds(0) },
        a6: { cat1: seconds(0), cat2: seconds(0) },
      },
    });
    const suggestion = suggestLineup(input);
    expect(suggestion.projection.lastLaunch).toBe(at(80));
    expect(suggestion.lanes.cat4).toEqual(['a5']);
    expect(suggestionViolations(input, suggestion)).toEqual([]);
  });

  it('gives the same times as projecting its lineup', () => {
    fc.assert(
      fc.property(suggestionInputArbitrary(10), (input) => {
        const suggestion = suggestLineup(input);
        const again = projectLaunchTimes({
          ...input,
          lanes: suggestion.lanes,
          notBefore: suggestion.notBefore,
          priorities: suggestion.priorities,
        });
        expect(again).toEqual(suggestion.projection);
        expect(suggestionViolations(input, suggestion)).toEqual([]);
      }),
      { numRuns: 60, seed: 7 },
    );
  });

  it('refuses the same aircraft twice or a negative taxi time', () => {
    expect(() =>
      suggestLineup(
        cycle({
          aircraft: [
            { id: 'a', priority: 'normal' },
            { id: 'a', priority: 'normal' },
          ],
        }),
      ),
    ).toThrow(LaunchMathInputError);
    expect(() =>
      suggestLineup(cycle({ aircraft: [{ id: 'a', priority: 'normal' }], taxiTimes: { a: { cat1: seconds(-5) } } })),
    ).toThrow(LaunchMathInputError);
  });
});
