import type { ShipView } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import { applyAreaTaxi, moved, problemsByPart, toDeckDraft, toDeckLayoutRequest } from './deck-layout-model.js';

// An invented two-catapult ship: a bow row f1 ← f2, a spot standing alone, one elevator and a bay.
const ship = {
  catapults: [{ number: 2 }, { number: 1 }],
  deckSpots: [
    { name: 'f1', area: 'Fore', taxiS: { 1: 60, 2: 70 } },
    { name: 'lone', taxiS: { 1: 200, 2: 210 } },
    { name: 'f2', area: 'Fore', clearBefore: ['f1'], taxiS: { 1: 65 } },
  ],
  deckLayout: {
    elevators: [{ name: 'lift', cycleS: 40, taxiS: { 1: 90, 2: 95 } }],
    hangarBays: [{ name: 'bay', elevators: ['lift'] }],
    landingAreaCatapults: [2],
  },
} as unknown as ShipView;

describe('the deck layout editor model', () => {
  it('groups the spots in their areas, a spot without one in an area of its own name, blanks for missing times', () => {
    const draft = toDeckDraft(ship);
    expect(draft.areas.map((area) => [area.name, area.spots.map((spot) => spot.name)])).toEqual([
      ['Fore', ['f1', 'f2']],
      ['lone', ['lone']],
    ]);
    expect(draft.areas[0].spots[1]).toEqual({ name: 'f2', clearBefore: 'f1', taxi: { 1: '65', 2: '' } });
    expect(draft.elevators).toEqual([{ name: 'lift', cycleS: '40', taxi: { 1: '90', 2: '95' } }]);
  });

  it('turns the draft back into the request, keeping hangar bays and the landing area as the ship has them', () => {
    const result = toDeckLayoutRequest(toDeckDraft(ship), ship);
    expect(result).toEqual({
      request: {
        deckSpots: [
          { name: 'f1', area: 'Fore', taxiS: { 1: 60, 2: 70 } },
          { name: 'f2', area: 'Fore', clearBefore: ['f1'], taxiS: { 1: 65 } },
          { name: 'lone', area: 'lone', taxiS: { 1: 200, 2: 210 } },
        ],
        elevators: [{ name: 'lift', cycleS: 40, taxiS: { 1: 90, 2: 95 } }],
        hangarBays: [{ name: 'bay', elevators: ['lift'] }],
        landingAreaCatapults: [2],
      },
    });
  });

  it('passes a negative time on for the server to judge, but refuses text that is no number', () => {
    const draft = toDeckDraft(ship);
    draft.areas[0].spots[0].taxi[1] = '-5';
    const sent = toDeckLayoutRequest(draft, ship);
    expect('request' in sent && sent.request.deckSpots[0].taxiS).toEqual({ 1: -5, 2: 70 });
    draft.areas[0].spots[0].taxi[1] = '6o';
    expect(toDeckLayoutRequest(draft, ship)).toEqual({
      problem: 'The taxi time from spot f1 to catapult 1 must be a number of seconds.',
    });
  });

  it('copies the area times given into every spot of the area, leaving the blank ones', () => {
    const area = { ...toDeckDraft(ship).areas[0], taxi: { 1: '', 2: '80' } };
    expect(applyAreaTaxi(area).spots.map((spot) => spot.taxi)).toEqual([
      { 1: '60', 2: '80' },
      { 1: '65', 2: '80' },
    ]);
  });

  it('moves a spot one place, and not past either end', () => {
    expect(moved(['a', 'b', 'c'], 2, -1)).toEqual(['a', 'c', 'b']);
    expect(moved(['a', 'b', 'c'], 0, -1)).toEqual(['a', 'b', 'c']);
  });

  it("sorts the server's refusal sentences by the part they name", () => {
    const byPart = problemsByPart([
      'spot f1: Spot f1 waits for spot x, which the deck does not have.',
      'spot f1: The spot f1 needs a taxi time to catapult 2.',
      'elevator lift: Elevator lift takes 2 s per trip; a trip must take 5 to 600 s.',
    ]);
    expect(byPart.get('spot f1')).toHaveLength(2);
    expect(byPart.get('elevator lift')).toEqual(['Elevator lift takes 2 s per trip; a trip must take 5 to 600 s.']);
  });
});
