import fc from 'fast-check';
import { evaluate } from 'mathjs';
import { LaunchMathInputError } from '../errors.js';
import { angularDistance } from '../units/angles.js';
import { degrees, knots } from '../units/units.js';
import { catapultWind, relativeWind, trueWindFromRelative, windComponents } from './wind-over-deck.js';

const bearing = fc.double({ min: 0, max: 359.999, noNaN: true }).map(degrees);
const speed = fc.double({ min: 0, max: 60, noNaN: true }).map(knots);
const catapultAngle = fc.double({ min: -15, max: 15, noNaN: true }).map(degrees);

describe('wind components', () => {
  it('match the FAA crosswind chart example: runway 18, wind 220 at 30 kt', () => {
    const components = windComponents(degrees(180), degrees(220), knots(30));
    expect(components.headwind).toBeCloseTo(23, 0); // FAA-CT-8080-2, Figure 36: about 23 kt headwind
    expect(components.crosswind).toBeCloseTo(19, 0); // FAA-CT-8080-2, Figure 36: about 19 kt crosswind
    expect(components.side).toBe('starboard'); // wind from 220 on heading 180 comes from the right
  });

  it('give the same figures along a catapult on a ship lying still', () => {
    const relative = relativeWind({ course: degrees(180), speed: knots(0) }, { from: degrees(220), speed: knots(30) });
    const components = catapultWind(relative, degrees(0));
    expect(components.headwind).toBeCloseTo(23, 0); // FAA-CT-8080-2, Figure 36
    expect(components.crosswind).toBeCloseTo(19, 0); // FAA-CT-8080-2, Figure 36
  });

  it('put a wind down the bow on the starboard side of a catapult angled to port', () => {
    const components = catapultWind({ from: degrees(90), bearing: degrees(0), speed: knots(30) }, degrees(-9));
    expect(components.side).toBe('starboard');
    expect(components.crosswind).toBeCloseTo(evaluate('30 * sin(9 deg)'), 10); // mathjs: 4.693 kt (crosswind = V sin a)
    expect(components.crosswind).toBeCloseTo(4.693, 3); // by hand: 30 x 0.15643 = 4.693 kt (sin 9 deg from a four-figure table)
    expect(components.headwind).toBeCloseTo(evaluate('30 * cos(9 deg)'), 10); // mathjs: 29.631 kt (headwind = V cos a)
    expect(components.headwind).toBeCloseTo(29.631, 3); // by hand: 30 x 0.98769 = 29.631 kt (cos 9 deg from a four-figure table)
  });

  it('report a tailwind as a negative headwind and a wind from the left as port', () => {
    const components = windComponents(degrees(0), degrees(225), knots(10));
    expect(components.headwind).toBeCloseTo(evaluate('10 * cos(225 deg)'), 10); // mathjs: -7.071 kt
    expect(components.headwind).toBeCloseTo(-7.071, 3); // by hand: 10 x cos 225 deg = -10 / sqrt 2 = -7.071 kt
    expect(components.side).toBe('port');
  });

  it('have no crosswind for a wind from dead ahead of the catapult', () => {
    fc.assert(
      fc.property(bearing, speed, speed, catapultAngle, (course, shipSpeed, windSpeed, angle) => {
        const ship = { course, speed: shipSpeed };
        const wind = trueWindFromRelative(ship, { bearing: angle, speed: windSpeed });
        const components = catapultWind(relativeWind(ship, wind), angle);
        expect(components.crosswind).toBeLessThan(1e-6);
        expect(components.headwind).toBeCloseTo(windSpeed, 6);
      }),
    );
  });

  it('recombine into the relative wind', () => {
    fc.assert(
      fc.property(bearing, speed, bearing, speed, catapultAngle, (course, shipSpeed, from, windSpeed, angle) => {
        const relative = relativeWind({ course, speed: shipSpeed }, { from, speed: windSpeed });
        const { headwind, crosswind, side } = catapultWind(relative, angle);
        expect(Math.hypot(headwind, crosswind)).toBeCloseTo(relative.speed, 9);
        const signedCrosswind = side === 'port' ? -crosswind : crosswind;
        const offAxis = (Math.atan2(signedCrosswind, headwind) * 180) / Math.PI;
        // A wind of a thousandth of a knot has no bearing worth a millionth of a degree.
        if (relative.speed > 1e-3)
          expect(angularDistance(degrees(angle + offAxis), relative.bearing)).toBeLessThan(1e-6);
      }),
    );
  });
});

describe('relative and true wind', () => {
  it('match Smith, Bourassa and Sharp (1999): ship 090 at 5 kt, relative 5 kt from 90 degrees relative', () => {
    const wind = trueWindFromRelative(
      { course: degrees(90), speed: knots(5) },
      { bearing: degrees(90), speed: knots(5) },
    );
    expect(wind.from).toBeCloseTo(225, 9); // Smith, Bourassa & Sharp (1999), J. Atmos. Oceanic Technol. 16: from 225
    expect(wind.speed).toBeCloseTo(7.07, 2); // Smith, Bourassa & Sharp (1999): 7.07 kt
  });

  it('match Smith, Bourassa and Sharp (1999): ship 180 at 5 kt, relative 5 kt from dead astern', () => {
    const wind = trueWindFromRelative(
      { course: degrees(180), speed: knots(5) },
      { bearing: degrees(180), speed: knots(5) },
    );
    expect(wind.from).toBeCloseTo(360, 9); // Smith, Bourassa & Sharp (1999): from 360 (north is 360, not 0)
    expect(wind.speed).toBeCloseTo(10, 9); // Smith, Bourassa & Sharp (1999): 10 kt
  });

  it('turn the Smith, Bourassa and Sharp true winds back into their relative winds', () => {
    const beam = relativeWind(
      { course: degrees(90), speed: knots(5) },
      { from: degrees(225), speed: knots(5 * Math.SQRT2) },
    );
    expect(beam.bearing).toBeCloseTo(90, 9); // Smith, Bourassa & Sharp (1999): 90 degrees relative
    expect(beam.speed).toBeCloseTo(5, 9); // Smith, Bourassa & Sharp (1999): 5 kt
    const astern = relativeWind({ course: degrees(180), speed: knots(5) }, { from: degrees(360), speed: knots(10) });
    expect(astern.bearing).toBeCloseTo(180, 9); // Smith, Bourassa & Sharp (1999): dead astern
    expect(astern.speed).toBeCloseTo(5, 9); // Smith, Bourassa & Sharp (1999): 5 kt
  });

  it('make a wind from dead ahead at ship speed in still air', () => {
    const wind = relativeWind({ course: degrees(300), speed: knots(25) }, { from: degrees(0), speed: knots(0) });
    expect(wind.from).toBeCloseTo(300, 9);
    expect(wind.bearing).toBeCloseTo(0, 9);
    expect(wind.speed).toBeCloseTo(25, 9);
  });

  it('call it calm when the ship runs with the wind at its speed', () => {
    const wind = relativeWind({ course: degrees(90), speed: knots(20) }, { from: degrees(270), speed: knots(20) });
    expect(wind.speed).toBe(0);
    expect(wind.from).toBe(0);
  });

  it('round-trip true to relative and back', () => {
    fc.assert(
      fc.property(
        bearing,
        speed,
        bearing,
        fc.double({ min: 0.5, max: 60, noNaN: true }),
        (course, shipSpeed, from, windSpeed) => {
          const ship = { course, speed: shipSpeed };
          const back = trueWindFromRelative(ship, relativeWind(ship, { from, speed: knots(windSpeed) }));
          expect(back.speed).toBeCloseTo(windSpeed, 9);
          expect(angularDistance(back.from, from)).toBeLessThan(1e-7);
        },
      ),
    );
  });

  it('refuses a negative speed', () => {
    expect(() => relativeWind({ course: degrees(0), speed: knots(-1) }, { from: degrees(0), speed: knots(0) })).toThrow(
      LaunchMathInputError,
    );
  });
});
