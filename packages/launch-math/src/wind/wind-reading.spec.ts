import { LaunchMathInputError } from '../errors.js';
import { degrees, knots } from '../units/units.js';
import { relativeWind } from './wind-over-deck.js';
import { resolveWindReading } from './wind-reading.js';

// Smith, Bourassa & Sharp (1999), "Establishing more truth in true winds", J. Atmos. Oceanic Technol. 16,
// 939-952: the worked test data of the true-wind program published with the paper (course, ship speed,
// wind relative to the bow, relative speed -> true direction and speed). Heading is taken equal to course.
const relative = (bearing: number, speed: number, spread: { gust?: number; lull?: number } = {}) => ({
  frame: 'relative' as const,
  bearing: degrees(bearing),
  speed: knots(speed),
  gust: knots(spread.gust ?? speed),
  lull: knots(spread.lull ?? speed),
});

describe('a wind reading', () => {
  it.each([
    // course, ship kt, bearing off the bow, relative kt, true from, true kt — each row Smith, Bourassa & Sharp (1999)
    [0, 0, 90, 5, 90, 5], // SBS (1999) test 1: ship stopped, the relative wind is the true wind
    [180, 5, 180, 5, 360, 10], // SBS (1999) test 5: from 360 at 10
    [90, 5, 90, 5, 225, 7.0711], // SBS (1999) test 6: from 225 at 7.0711
    [225, 5, -90, 5, 90, 7.0711], // SBS (1999) test 8: relative 270, from 90 at 7.0711
    [270, 3, 90, 4, 36.8699, 5], // SBS (1999) test 9: from 36.8699 at 5
  ])(
    'taken across the deck (course %d, %d kt, %d° off the bow at %d kt) is true %d° at %d kt',
    (course, shipKt, bearing, speed, from, trueKt) => {
      const ship = { course: degrees(course), speed: knots(shipKt) };
      const wind = resolveWindReading(ship, relative(bearing, speed));
      expect(wind.true.from).toBeCloseTo(from, 3);
      expect(wind.true.speed).toBeCloseTo(trueKt, 3);
      // and back: the true wind felt across the moving deck is the reading
      expect(wind.relative.bearing).toBeCloseTo(bearing, 6);
      expect(wind.relative.speed).toBeCloseTo(speed, 6);
    },
  );

  it('is calm over the ground when the relative wind is the ship’s own motion', () => {
    // SBS (1999) test 3: course 0 at 5 kt, relative 5 kt from dead ahead -> true speed 0 (6e-16 in the program)
    const wind = resolveWindReading({ course: degrees(0), speed: knots(5) }, relative(0, 5));
    expect(wind.true.speed).toBe(0);
  });

  it('given as true wind is felt across the deck as the SBS relative wind', () => {
    const wind = resolveWindReading(
      { course: degrees(270), speed: knots(3) },
      { frame: 'true', from: degrees(36.8699), speed: knots(5), gust: knots(8), lull: knots(3) },
    );
    expect(wind.relative.bearing).toBeCloseTo(90, 3); // SBS (1999) test 9 read backwards: 90 off the bow
    expect(wind.relative.speed).toBeCloseTo(4, 3); // SBS (1999) test 9: 4 kt
    expect(wind.lull).toEqual({ from: degrees(36.8699), speed: knots(3) });
    expect(wind.gust).toEqual({ from: degrees(36.8699), speed: knots(8) });
  });

  it('keeps its lull at the steady bearing across the deck', () => {
    const ship = { course: degrees(90), speed: knots(5) };
    const wind = resolveWindReading(ship, relative(90, 5, { gust: 9, lull: 2 }));
    const lullAcrossDeck = relativeWind(ship, wind.lull);
    expect(lullAcrossDeck.bearing).toBeCloseTo(90, 9);
    expect(lullAcrossDeck.speed).toBeCloseTo(2, 9);
    expect(relativeWind(ship, wind.gust).speed).toBeCloseTo(9, 9);
  });

  it('refuses a lull above the steady speed or a gust below it', () => {
    const ship = { course: degrees(0), speed: knots(20) };
    expect(() => resolveWindReading(ship, relative(0, 10, { lull: 12 }))).toThrow(LaunchMathInputError);
    expect(() => resolveWindReading(ship, relative(0, 10, { gust: 8 }))).toThrow(LaunchMathInputError);
  });
});
