import { LaunchMathInputError } from '../errors.js';
import { seconds } from '../units/units.js';
import { blockingAircraft, taxiTimeFrom, taxiTimesFrom, towBlockers, type DeckLayout } from './deck-positions.js';

// An invented deck (common practice, no source): a bow row of three spots (b1 at the front), a waist
// area of two spots, one elevator of 45 s per trip, and a hangar bay served by that elevator and by a
// slow one of 70 s.
const layout: DeckLayout = {
  areas: [
    { id: 'bow', taxi: { cat1: seconds(60), cat2: seconds(75) } },
    { id: 'waist', taxi: { cat1: seconds(150), cat2: seconds(140), cat3: seconds(50) } },
  ],
  spots: [
    { id: 'b1', areaId: 'bow' },
    { id: 'b2', areaId: 'bow', clearBefore: ['b1'] },
    { id: 'b3', areaId: 'bow', clearBefore: ['b2', 'b1'], taxi: { cat1: seconds(90) } },
    { id: 'w1', areaId: 'waist' },
    { id: 'w2', areaId: 'waist' },
  ],
  elevators: [
    { id: 'el1', cycleTime: seconds(45), taxi: { cat1: seconds(100), cat2: seconds(120), cat3: seconds(30) } },
    { id: 'el2', cycleTime: seconds(70), taxi: { cat1: seconds(40) } },
  ],
  hangarBays: [{ id: 'bay1', elevatorIds: ['el1', 'el2'] }],
};

describe('taxi time from a position', () => {
  it("takes a spot's own taxi time where it has one, else its area's", () => {
    // Worked example, by hand from the layout above: b3 gives 90 s to catapult 1, its area 75 s to catapult 2.
    expect(taxiTimeFrom(layout, { kind: 'spot', id: 'b3' }, 'cat1')).toBe(90);
    expect(taxiTimeFrom(layout, { kind: 'spot', id: 'b3' }, 'cat2')).toBe(75);
    expect(taxiTimeFrom(layout, { kind: 'spot', id: 'b1' }, 'cat1')).toBe(60);
  });

  it('adds one elevator trip when the aircraft starts in the hangar, by the quickest elevator', () => {
    // Worked example, by hand: to catapult 1 by el1 45 + 100 = 145 s, by el2 70 + 40 = 110 s: 110 s.
    expect(taxiTimeFrom(layout, { kind: 'hangar', id: 'bay1' }, 'cat1')).toBe(110);
    // To catapult 2 only el1 reaches: 45 + 120 = 165 s. To catapult 3: 45 + 30 = 75 s.
    expect(taxiTimeFrom(layout, { kind: 'hangar', id: 'bay1' }, 'cat2')).toBe(165);
    expect(taxiTimeFrom(layout, { kind: 'hangar', id: 'bay1' }, 'cat3')).toBe(75);
  });

  it('takes no elevator trip for an aircraft already on the elevator at deck level', () => {
    expect(taxiTimeFrom(layout, { kind: 'elevator', id: 'el1' }, 'cat1')).toBe(100);
  });

  it('leaves out catapults that cannot be reached', () => {
    expect(taxiTimesFrom(layout, { kind: 'spot', id: 'b1' }, ['cat1', 'cat2', 'cat3'])).toEqual({ cat1: 60, cat2: 75 });
    expect(taxiTimeFrom(layout, { kind: 'hangar', id: 'bay1' }, 'cat4')).toBeUndefined();
  });

  it('refuses a position the layout does not have', () => {
    expect(() => taxiTimeFrom(layout, { kind: 'spot', id: 'x9' }, 'cat1')).toThrow(LaunchMathInputError);
  });
});

describe('aircraft that must clear first', () => {
  it('names the aircraft on the spots in front in the row, and only occupied ones', () => {
    // Worked example: A on b1, C on b3, b2 empty: C waits for A only; A waits for no one.
    expect(blockingAircraft(layout, { A: { kind: 'spot', id: 'b1' }, C: { kind: 'spot', id: 'b3' } })).toEqual({
      C: ['A'],
    });
    expect(
      blockingAircraft(layout, {
        A: { kind: 'spot', id: 'b1' },
        B: { kind: 'spot', id: 'b2' },
        C: { kind: 'spot', id: 'b3' },
        H: { kind: 'hangar', id: 'bay1' },
      }),
    ).toEqual({ B: ['A'], C: ['B', 'A'] });
  });

  it('refuses two aircraft on one spot', () => {
    expect(() => blockingAircraft(layout, { A: { kind: 'spot', id: 'b1' }, B: { kind: 'spot', id: 'b1' } })).toThrow(
      LaunchMathInputError,
    );
  });
});

describe('a tow', () => {
  const spot = (id: string) => ({ kind: 'spot' as const, id });
  const free = { occupiedBy: null, mustMove: [], noRoute: false };

  it('goes when the target is free and nothing stands in front', () => {
    expect(towBlockers(layout, { A: spot('b1') }, 'A', spot('w1'))).toEqual(free);
  });

  it('is refused into an occupied spot, naming who holds it', () => {
    expect(towBlockers(layout, { A: spot('b1'), B: spot('w1') }, 'A', spot('w1')).occupiedBy).toBe('B');
  });

  it('cannot leave a spot, nor enter one, past an aircraft parked in front', () => {
    // C on b3 is behind A on b1 (b3 clears b2 and b1 first); D goes into b2, which is behind b1.
    expect(towBlockers(layout, { A: spot('b1'), C: spot('b3') }, 'C', spot('w1')).mustMove).toEqual(['A']);
    expect(towBlockers(layout, { A: spot('b1'), D: spot('w2') }, 'D', spot('b2')).mustMove).toEqual(['A']);
  });

  it('needs a free elevator of the bay between the hangar and the deck', () => {
    const hangar = { kind: 'hangar' as const, id: 'bay1' };
    const positions = {
      H: hangar,
      E1: { kind: 'elevator' as const, id: 'el1' },
      E2: { kind: 'elevator' as const, id: 'el2' },
    };
    expect(towBlockers(layout, positions, 'H', spot('w1')).mustMove).toEqual(['E1', 'E2']);
    expect(towBlockers(layout, { H: hangar, E1: positions.E1 }, 'H', spot('w1'))).toEqual(free);
    // The aircraft on an elevator goes down on it, whatever the other elevator holds.
    expect(towBlockers(layout, positions, 'E1', hangar)).toEqual(free);
  });
});
