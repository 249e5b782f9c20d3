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
