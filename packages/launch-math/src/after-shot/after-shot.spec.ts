import { testShip } from '../testing/profiles.fixture.js';
import { feet, nauticalMiles } from '../units/units.js';
import { afterTheShot, clearingTurn, departureFor } from './after-shot.js';
import { weatherCase } from './weather-case.js';

describe('weather case', () => {
  it.each([
    [3000, 5, 'I'], // NAVEDTRA 14342A, table 11-4: case I, ceiling at least 3,000 ft and visibility 5 nm
    [null, 10, 'I'], // NAVEDTRA 14342A, table 11-4: no ceiling counts as above 3,000 ft
    [2999, 5, 'II'], // NAVEDTRA 14342A, table 11-4: case II, at least 1,000 ft and 5 nm
    [1000, 5, 'II'], // NAVEDTRA 14342A, table 11-4
    [3000, 4.9, 'III'], // NAVEDTRA 14342A, table 11-4: below case II minimums is case III
    [999, 5, 'III'], // NAVEDTRA 14342A, table 11-4
  ] as const)('is case %s ft / %s nm by day: %s', (ceiling, visibility, expected) => {
    expect(
      weatherCase({
        ceiling: ceiling === null ? null : feet(ceiling),
        visibility: nauticalMiles(visibility),
        night: false,
      }),
    ).toBe(expected);
  });

  it('is always case III at night', () => {
    expect(weatherCase({ ceiling: null, visibility: nauticalMiles(20), night: true })).toBe('III'); // NAVEDTRA 14342A, table 11-4: night is case III
  });
});

describe('after the shot', () => {
  it('turns right off a bow catapult and left off a waist catapult in cases I and II, not in case III', () => {
    // Common practice, no source: about 10 degrees right off the bow, left off the waist; case III none.
    for (const weather of ['I', 'II'] as const) {
      expect(clearingTurn(testShip, 'bow', weather)).toEqual({ direction: 'right', degrees: 10 });
      expect(clearingTurn(testShip, 'waist', weather)).toEqual({ direction: 'left', degrees: 10 });
    }
    expect(clearingTurn(testShip, 'bow', 'III').direction).toBe('none');
    expect(clearingTurn(testShip, 'waist', 'III').direction).toBe('none');
  });

  // Departures are the ship's own data, not a rule of the package: the check is that each case and class
  // gets its own entry of the profile, whatever the ship wrote there.
  it.each(['I', 'II', 'III'] as const)(
    "gives each aircraft class the ship profile's own departure in case %s",
    (weather) => {
      for (const aircraftClass of ['jet', 'turboprop', 'helicopter'] as const)
        expect(departureFor(testShip, weather, aircraftClass)).toBe(testShip.departures[weather][aircraftClass]);
      expect(departureFor(testShip, weather, 'helicopter')).not.toEqual(departureFor(testShip, weather, 'jet'));
    },
  );

  it('gives one class a different departure in another case', () => {
    expect(departureFor(testShip, 'I', 'jet')).not.toEqual(departureFor(testShip, 'III', 'jet'));
  });

  it('puts clearing turn and departure on one card', () => {
    const card = afterTheShot(testShip, { position: 'waist', weatherCase: 'III', aircraftClass: 'helicopter' });
    expect(card.clearingTurn.direction).toBe('none');
    expect(card.departure.summary).toBe('Case III helicopter test departure.');
  });
});
