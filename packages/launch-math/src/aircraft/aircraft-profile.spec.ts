import { LaunchMathInputError } from '../errors.js';
import { strikeFighter } from '../testing/profiles.fixture.js';
import { degrees, pounds } from '../units/units.js';
import { afterburnerRequired, roundGrossWeight, takeOffTrim } from './aircraft-profile.js';

describe('take-off trim', () => {
  it.each([
    [38000, 16],
    [44000, 16],
    [44499, 16],
    [44500, 17],
    [45000, 17],
    [48000, 17],
    [48499, 17],
    [48500, 19],
    [49000, 19],
    [56000, 19],
  ])('is the strike fighter band for %i lb: %i degrees', (weight, trim) => {
    // Common practice, no source: 16 deg at or below 44,000 lb, 17 deg 45,000-48,000 lb, 19 deg at 49,000 lb
    // and above, weights rounded to the nearest 1,000 lb.
    expect(takeOffTrim(strikeFighter, pounds(weight))).toBe(trim);
  });

  it('is null below the first band', () => {
    const heavyOnly = { ...strikeFighter, trimBands: [{ fromGrossWeight: pounds(40000), trim: degrees(12) }] };
    expect(takeOffTrim(heavyOnly, pounds(30000))).toBeNull();
  });

  it('refuses bands out of order', () => {
    const shuffled = { ...strikeFighter, trimBands: [...strikeFighter.trimBands].reverse() };
    expect(() => takeOffTrim(shuffled, pounds(45000))).toThrow(LaunchMathInputError);
  });

  it('rounds halves of the step upward', () => {
    expect(roundGrossWeight(pounds(44500), pounds(1000))).toBe(45000);
    expect(roundGrossWeight(pounds(44499.9), pounds(1000))).toBe(44000);
  });
});

describe('afterburner', () => {
  it('is required at 45,000 lb and above', () => {
    expect(afterburnerRequired(strikeFighter, pounds(44999))).toBe(false); // common practice, no source: from 45,000 lb
    expect(afterburnerRequired(strikeFighter, pounds(45000))).toBe(true); // common practice, no source
    expect(afterburnerRequired({ ...strikeFighter, afterburnerFromGrossWeight: null }, pounds(60000))).toBe(false);
  });
});
