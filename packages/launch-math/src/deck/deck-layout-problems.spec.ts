import { seconds } from '../units/units.js';
import { deckLayoutProblems } from './deck-layout-problems.js';
import type { DeckLayout } from './deck-positions.js';

// An invented deck (common practice, no source): a bow row b1 (front) ← b2 ← b3 with the area's taxi times,
// a waist spot w1 with its own, one elevator of 45 s per trip and a hangar bay it serves; catapults c1, c2.
const CATAPULTS = ['c1', 'c2'];
const layout: DeckLayout = {
  areas: [
    { id: 'bow', taxi: { c1: seconds(60), c2: seconds(75) } },
    { id: 'waist', taxi: {} },
  ],
  spots: [
    { id: 'b1', areaId: 'bow' },
    { id: 'b2', areaId: 'bow', clearBefore: ['b1'] },
    { id: 'b3', areaId: 'bow', clearBefore: ['b2', 'b1'], taxi: { c1: seconds(90) } },
    { id: 'w1', areaId: 'waist', taxi: { c1: seconds(150), c2: seconds(0) } },
  ],
  elevators: [{ id: 'el1', cycleTime: seconds(45), taxi: { c1: seconds(100), c2: seconds(120) } }],
  hangarBays: [{ id: 'bay1', elevatorIds: ['el1'] }],
};

const changed = (change: Partial<DeckLayout>): DeckLayout => ({ ...layout, ...change });
const codes = (candidate: DeckLayout) => deckLayoutProblems(candidate, CATAPULTS).map((problem) => problem.code);

describe('deck layout problems', () => {
  it('finds none in a layout every rule accepts, a zero taxi time included', () => {
    expect(deckLayoutProblems(layout, CATAPULTS)).toEqual([]);
  });

  it('names a spot, elevator or hangar bay given twice', () => {
    const twice = changed({
      spots: [...layout.spots, { id: 'b1', areaId: 'bow' }],
      elevators: [...layout.elevators, layout.elevators[0]],
      hangarBays: [...layout.hangarBays, layout.hangarBays[0]],
    });
    expect(deckLayoutProblems(twice, CATAPULTS)).toEqual([
      {
        code: 'duplicate_name',
        subject: 'spot b1',
        message: 'The name b1 is given to more than one spot; each needs its own.',
      },
      {
        code: 'duplicate_name',
        subject: 'elevator el1',
        message: 'The name el1 is given to more than one elevator; each needs its own.',
      },
      {
        code: 'duplicate_name',
        subject: 'hangar bay bay1',
        message: 'The name bay1 is given to more than one hangar bay; each needs its own.',
      },
    ]);
  });

  it('refuses a clear-before naming a spot the deck lacks or a spot of another area', () => {
    const wrong = changed({
      spots: [
        ...layout.spots.slice(0, 3),
        { id: 'w1', areaId: 'waist', clearBefore: ['b3', 'w0'], taxi: { c1: seconds(150), c2: seconds(140) } },
      ],
    });
    expect(deckLayoutProblems(wrong, CATAPULTS).map((problem) => problem.message)).toEqual([
      'Spot w1 waits for spot b3, which is in another area; only spots of its own row can stand in front of it.',
      'Spot w1 waits for spot w0, which the deck does not have.',
    ]);
  });

  it('refuses a clear-before circle, naming the first one found', () => {
    // Worked example, by hand: b1 waits for b3, b3 for b2 and b1, b2 for b1. Following the lists in order from
    // b1: b1 → b3 → b2 → b1 closes first (b1 → b3 → b1 is a second circle, named once the first is gone).
    const circle = changed({
      spots: [{ id: 'b1', areaId: 'bow', clearBefore: ['b3'] }, ...layout.spots.slice(1)],
    });
    expect(deckLayoutProblems(circle, CATAPULTS)).toEqual([
      {
        code: 'clear_before_cycle',
        subject: 'spot b1',
        message: 'Spots b1 → b3 → b2 → b1 wait for each other in a circle, so none of them could taxi out.',
      },
    ]);
    // A spot waiting for itself is the shortest circle.
    const self = changed({ spots: [{ id: 'b1', areaId: 'bow', clearBefore: ['b1'] }, ...layout.spots.slice(1)] });
    expect(deckLayoutProblems(self, CATAPULTS).map((problem) => problem.message)).toEqual([
      'Spots b1 → b1 wait for each other in a circle, so none of them could taxi out.',
    ]);
  });

  it('takes a spot without its own taxi time to a catapult from its area, and refuses one neither gives', () => {
    // b1 and b2 have no times of their own: the bow area's 60 and 75 s serve. w1 gives c1 only, and the
    // waist area gives none.
    const missing = changed({
      spots: [...layout.spots.slice(0, 3), { id: 'w1', areaId: 'waist', taxi: { c1: seconds(150) } }],
    });
    expect(deckLayoutProblems(missing, CATAPULTS)).toEqual([
      { code: 'taxi_missing', subject: 'spot w1', message: 'The spot w1 needs a taxi time to catapult c2.' },
    ]);
  });

  it('refuses a negative taxi time and one to a catapult the ship lacks, from a spot or an elevator', () => {
    const wrong = changed({
      spots: [
        ...layout.spots.slice(0, 3),
        { id: 'w1', areaId: 'waist', taxi: { c1: seconds(-5), c2: seconds(140), c9: seconds(30) } },
      ],
      elevators: [{ id: 'el1', cycleTime: seconds(45), taxi: { c1: seconds(100) } }],
    });
    expect(deckLayoutProblems(wrong, CATAPULTS).map((problem) => problem.message)).toEqual([
      'The taxi time from the spot w1 to catapult c1 is -5 s; it cannot be below 0.',
      'The spot w1 gives a taxi time to catapult c9, which the ship does not have.',
      'The elevator el1 needs a taxi time to catapult c2.',
    ]);
  });

  it.each([
    [4, ['elevator_cycle_out_of_range']],
    [5, []],
    [600, []],
    [601, ['elevator_cycle_out_of_range']],
    [Number.NaN, ['elevator_cycle_out_of_range']],
  ])('takes an elevator trip of %d s only within 5 to 600 s', (cycleTime, expected) => {
    const elevators = [{ ...layout.elevators[0], cycleTime: seconds(cycleTime) }];
    expect(codes(changed({ elevators }))).toEqual(expected);
  });

  it('says which elevator an elevator trip is out of range for', () => {
    const elevators = [{ ...layout.elevators[0], cycleTime: seconds(900) }];
    expect(deckLayoutProblems(changed({ elevators }), CATAPULTS)[0].message).toBe(
      'Elevator el1 takes 900 s per trip; a trip must take 5 to 600 s.',
    );
  });

  it('refuses a hangar bay served by an elevator the deck lacks', () => {
    const hangarBays = [{ id: 'bay1', elevatorIds: ['el1', 'el7'] }];
    expect(deckLayoutProblems(changed({ hangarBays }), CATAPULTS)).toEqual([
      {
        code: 'unknown_elevator',
        subject: 'hangar bay bay1',
        message: 'Hangar bay bay1 is served by elevator el7, which the deck does not have.',
      },
    ]);
  });
});
