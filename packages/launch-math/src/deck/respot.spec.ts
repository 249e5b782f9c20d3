import { LaunchMathInputError } from '../errors.js';
import { seconds } from '../units/units.js';
import type { DeckLayout, DeckPosition } from './deck-positions.js';
import { respotConflicts, respotTows } from './respot.js';

// An invented deck (common practice, no source): a bow row b1 (front), b2 behind b1, b3 behind both;
// two waist spots; one elevator serving the hangar bay. Times play no part in the order of the tows.
const layout: DeckLayout = {
  areas: [
    { id: 'bow', taxi: { cat1: seconds(60) } },
    { id: 'waist', taxi: { cat1: seconds(150) } },
  ],
  spots: [
    { id: 'b1', areaId: 'bow' },
    { id: 'b2', areaId: 'bow', clearBefore: ['b1'] },
    { id: 'b3', areaId: 'bow', clearBefore: ['b2', 'b1'] },
    { id: 'w1', areaId: 'waist' },
    { id: 'w2', areaId: 'waist' },
  ],
  elevators: [{ id: 'el1', cycleTime: seconds(45), taxi: { cat1: seconds(100) } }],
  hangarBays: [{ id: 'bay1', elevatorIds: ['el1'] }],
};
const spot = (id: string): DeckPosition => ({ kind: 'spot', id });
const bay: DeckPosition = { kind: 'hangar', id: 'bay1' };
const steps = (plan: ReturnType<typeof respotTows>) =>
  plan.tows.map((tow) => `${tow.aircraftId} ${tow.from.id}→${tow.to.id}`);

describe('the respot as an ordered list of tows', () => {
  it('fills the back of a row before its front, and tows nobody into a held spot', () => {
    // Worked example, by hand: A on b1 goes to w2; B on w1 goes to b3 (behind b2 and b1); C comes up
    // from the hangar to b1. C cannot go first (b1 is held by A); once A has gone, both B and C can go,
    // but C on b1 would shut B out of b3, so B goes before C: A, B, C.
    const plan = respotTows(
      layout,
      { A: spot('b1'), B: spot('w1'), C: bay },
      { C: spot('b1'), B: spot('b3'), A: spot('w2') },
    );
    expect(steps(plan)).toEqual(['A b1→w2', 'B w1→b3', 'C bay1→b1']);
    expect(plan.stuck).toEqual([]);
  });

  it('empties the front of a row before an aircraft behind it leaves', () => {
    // Worked example, by hand: D on b2 goes down to the hangar, E on b1 (in front of it) to w1.
    // D cannot leave past E, so E first: E, D.
    const plan = respotTows(layout, { D: spot('b2'), E: spot('b1') }, { D: bay, E: spot('w1') });
    expect(steps(plan)).toEqual(['E b1→w1', 'D b2→bay1']);
  });

  it('breaks a swap by towing one aircraft aside to a spot that is nobody’s target', () => {
    // Worked example, by hand: F on w1 and G on w2 change places. Neither can go (each target is held),
    // so F is towed aside to the first free spot no one ends on, b1; then G to w1, then F to w2.
    const plan = respotTows(layout, { F: spot('w1'), G: spot('w2') }, { F: spot('w2'), G: spot('w1') });
    expect(steps(plan)).toEqual(['F w1→b1', 'G w2→w1', 'F b1→w2']);
  });

  it('names the aircraft without a target that stands in the way', () => {
    // H stays on b1 (no target); J cannot enter b2 behind it.
    const plan = respotTows(layout, { H: spot('b1'), J: spot('w1') }, { J: spot('b2') });
    expect(plan.tows).toEqual([]);
    expect(plan.stuck).toEqual([{ aircraftId: 'J', mustMove: ['H'] }]);
  });

  it('keeps the spots of the recovered aircraft free and refuses two aircraft on one spot', () => {
    // K lands on w1 after the respot, where L stays: a conflict, and the tows are not worked out.
    expect(respotConflicts({ L: spot('w1') }, {}, { K: spot('w1') })).toEqual([
      { position: spot('w1'), aircraftIds: ['L', 'K'] },
    ]);
    expect(() => respotTows(layout, { L: spot('w1') }, {}, { K: spot('w1') })).toThrow(LaunchMathInputError);
    // Any number may go down to the hangar bay.
    expect(respotConflicts({ M: spot('w1'), N: spot('w2') }, { M: bay, N: bay })).toEqual([]);
  });
});
