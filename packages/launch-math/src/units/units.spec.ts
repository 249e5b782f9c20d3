import fc from 'fast-check';
import { gravity, unit } from 'mathjs';
import {
  feet,
  feetToMetres,
  kilograms,
  kilogramsToPounds,
  knots,
  knotsToMetresPerSecond,
  metres,
  metresPerSecond,
  metresPerSecondToKnots,
  metresToFeet,
  nauticalMiles,
  nauticalMilesToMetres,
  newtons,
  newtonsToPoundsForce,
  pounds,
  poundsForce,
  poundsForceToNewtons,
  poundsToKilograms,
  STANDARD_GRAVITY,
} from './units.js';
import { angularDistance, normaliseBearing, normaliseRelative } from './angles.js';
import { degrees } from './units.js';

describe('unit conversions', () => {
  it('match the factors of NIST SP 811 (2008), Appendix B.8', () => {
    expect(knotsToMetresPerSecond(knots(1))).toBeCloseTo(5.144444e-1, 7); // NIST SP 811 B.8: knot = 5.144 444 E-01 m/s
    expect(poundsToKilograms(pounds(1))).toBe(0.45359237); // NIST SP 811 B.8: pound (avoirdupois) = 4.535 924 E-01 kg, exact 0.453 592 37
    expect(poundsForceToNewtons(poundsForce(1))).toBeCloseTo(4.448222, 6); // NIST SP 811 B.8: pound-force = 4.448 222 E+00 N
    expect(feetToMetres(feet(1))).toBe(0.3048); // NIST SP 811 B.8: foot = 3.048 E-01 m, exact
    expect(nauticalMilesToMetres(nauticalMiles(1))).toBe(1852); // NIST SP 811 B.8: nautical mile = 1.852 E+03 m, exact
  });

  it('turn kilograms back into pounds by the same NIST SP 811 (2008), Appendix B.8 factor', () => {
    // B.8 gives pound (avoirdupois) = 4.535 924 E-01 kg, rounded to 7 figures, so that mass is 1 lb to 6 places.
    expect(kilogramsToPounds(kilograms(4.535924e-1))).toBeCloseTo(1, 6); // NIST SP 811 B.8: pound (avoirdupois)
    // 1 kg = 1 / 0.453 592 37 lb = 2.204 622 621 848 8 lb, worked out by hand from the exact pound
    // (0.453 592 37 kg by the international yard and pound definition of 1959).
    expect(kilogramsToPounds(kilograms(1))).toBeCloseTo(2.2046226218488, 12);
  });

  it('use the standard gravity of the 3rd CGPM (1901)', () => {
    expect(STANDARD_GRAVITY).toBe(9.80665); // 3rd CGPM (1901): gn = 980.665 cm/s2
  });

  it('agree with the mathjs unit definitions', () => {
    expect(poundsToKilograms(pounds(1))).toBe(unit(1, 'lbm').toNumber('kg')); // mathjs units: lbm
    expect(poundsForceToNewtons(poundsForce(1))).toBe(unit(1, 'lbf').toNumber('N')); // mathjs units: lbf
    expect(feetToMetres(feet(1))).toBe(unit(1, 'ft').toNumber('m')); // mathjs units: ft
    expect(knotsToMetresPerSecond(knots(30))).toBeCloseTo(unit(30 * 1852, 'm/h').toNumber('m/s'), 12); // mathjs units: m/h
    expect(STANDARD_GRAVITY).toBe(gravity.toNumber('m/s^2')); // mathjs constant: gravity
    // lbf = lb x g0 = 0.453 592 37 kg x 9.806 65 m/s2 = 4.448 221 615 260 5 N exactly, worked out by hand from the
    // exact pound (international yard and pound, 1959) and NIST SP 811 B.8: kilogram-force = 9.806 65 E+00 N (exact).
    expect(poundsForceToNewtons(poundsForce(1))).toBeCloseTo(4.4482216152605, 12);
  });

  it('scale as mathjs does for arbitrary values', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (value) => {
        expect(poundsToKilograms(pounds(value))).toBeCloseTo(unit(value, 'lbm').toNumber('kg'), 6);
        expect(feetToMetres(feet(value))).toBeCloseTo(unit(value, 'ft').toNumber('m'), 6);
      }),
    );
  });

  it('round-trip every pair of units', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (value) => {
        expect(metresPerSecondToKnots(knotsToMetresPerSecond(knots(value)))).toBeCloseTo(value, 8);
        expect(knotsToMetresPerSecond(metresPerSecondToKnots(metresPerSecond(value)))).toBeCloseTo(value, 8);
        expect(kilogramsToPounds(poundsToKilograms(pounds(value)))).toBeCloseTo(value, 8);
        expect(poundsToKilograms(kilogramsToPounds(kilograms(value)))).toBeCloseTo(value, 8);
        expect(newtonsToPoundsForce(poundsForceToNewtons(poundsForce(value)))).toBeCloseTo(value, 8);
        expect(poundsForceToNewtons(newtonsToPoundsForce(newtons(value)))).toBeCloseTo(value, 8);
        expect(metresToFeet(feetToMetres(feet(value)))).toBeCloseTo(value, 8);
        expect(feetToMetres(metresToFeet(metres(value)))).toBeCloseTo(value, 8);
      }),
    );
  });
});

describe('angles', () => {
  it('fold bearings into [0, 360) and relative angles into (-180, 180]', () => {
    expect(normaliseBearing(degrees(-90))).toBe(270);
    expect(normaliseBearing(degrees(720))).toBe(0);
    expect(normaliseRelative(degrees(270))).toBe(-90);
    expect(normaliseRelative(degrees(180))).toBe(180);
    expect(normaliseRelative(degrees(-180))).toBe(180);
    expect(angularDistance(degrees(350), degrees(10))).toBe(20);
  });
});
