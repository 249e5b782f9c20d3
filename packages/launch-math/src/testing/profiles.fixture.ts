import type { DepartureInstruction, ShipProfile } from '../after-shot/after-shot.js';
import type { AircraftProfile } from '../aircraft/aircraft-profile.js';
import { degrees, feet, knots, nauticalMiles, pounds, poundsForce } from '../units/units.js';

/**
 * A strike fighter's rules for tests only (the demo's types are invented). Trim bands, afterburner
 * threshold and the 120 kt end-of-deck airspeed: common practice, no source. Table shape, limits and
 * thrust: invented for the tests.
 */
export const strikeFighter: AircraftProfile = {
  maxGrossWeight: pounds(66000),
  crosswindLimit: knots(15),
  thrust: poundsForce(44000),
  requiredExcess: knots(0),
  minimumLaunchAirspeed: [
    { grossWeight: pounds(30000), airspeed: knots(120) },
    { grossWeight: pounds(44000), airspeed: knots(120) },
    { grossWeight: pounds(66000), airspeed: knots(150) },
  ],
  trimBands: [
    { fromGrossWeight: pounds(0), trim: degrees(16) },
    { fromGrossWeight: pounds(45000), trim: degrees(17) },
    { fromGrossWeight: pounds(49000), trim: degrees(19) },
  ],
  trimWeightStep: pounds(1000),
  afterburnerFromGrossWeight: pounds(45000),
};

/** A departure for tests whose wording is all there is to it. */
const worded = (summary: string): DepartureInstruction => ({ summary, altitude: null, untilRange: null, speed: null });

/**
 * A ship's after-the-shot rules for tests. Clearing turns about 10 degrees right off the bow, left off
 * the waist in cases I and II, none in case III: common practice, no source. Case I jet departure: NAVEDTRA 14342A
 * table 11-10 (500 ft until 7 nm, then climb unrestricted in visual conditions); 300 kt: common practice, no source.
 * Every other departure: wording invented for the tests.
 */
export const testShip: ShipProfile = {
  clearingTurns: {
    bow: { direction: 'right', degrees: degrees(10) },
    waist: { direction: 'left', degrees: degrees(10) },
  },
  departures: {
    I: {
      jet: {
        summary:
          'After the clearing turn, parallel the base recovery course at 500 ft until 7 nm, then climb unrestricted in visual conditions.',
        altitude: feet(500),
        untilRange: nauticalMiles(7),
        speed: knots(300),
      },
      turboprop: worded('Case I turboprop test departure.'),
      helicopter: worded('Case I helicopter test departure.'),
    },
    II: {
      jet: {
        summary: 'Case II jet test departure.',
        altitude: feet(500),
        untilRange: nauticalMiles(7),
        speed: knots(300),
      },
      turboprop: worded('Case II turboprop test departure.'),
      helicopter: worded('Case II helicopter test departure.'),
    },
    III: {
      jet: { summary: 'Case III jet test departure.', altitude: null, untilRange: null, speed: knots(250) },
      turboprop: worded('Case III turboprop test departure.'),
      helicopter: worded('Case III helicopter test departure.'),
    },
  },
};
