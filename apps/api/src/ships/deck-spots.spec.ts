import { deckSpotProblems } from './deck-spots.js';

describe('deckSpotProblems', () => {
  const catapults = [1, 2, 3, 4];

  it('accepts spots with a taxi time to every catapult', () => {
    expect(deckSpotProblems([{ name: 'bow-1', taxiS: { 1: 70, 2: 60, 3: 150, 4: 170 } }], catapults)).toEqual([]);
  });

  it('names a spot listed twice', () => {
    const spot = { name: 'mid-2', taxiS: { 1: 110, 2: 100, 3: 90, 4: 100 } };
    expect(deckSpotProblems([spot, spot], catapults)).toEqual(['Deck spot mid-2 is listed twice.']);
  });

  it('names the catapults a spot has no taxi time to', () => {
    expect(deckSpotProblems([{ name: 'aft-1', taxiS: { 1: 180, 2: 170 } }], catapults)).toEqual([
      'Deck spot aft-1 needs a taxi time to catapult 3, 4.',
    ]);
  });

  it('names a catapult the ship does not have', () => {
    expect(deckSpotProblems([{ name: 'aft-1', taxiS: { 1: 1, 2: 2, 3: 3, 4: 4, 5: 5 } }], catapults)).toEqual([
      'Deck spot aft-1 names catapult 5, which this ship does not have.',
    ]);
  });
});
