import { LaunchMathInputError } from '../errors.js';
import { strikeFighter } from '../testing/profiles.fixture.js';
import { knots, pounds } from '../units/units.js';
import { launchMargin, minimumLaunchAirspeed, requiredWindOverDeck } from './launch-airspeed.js';

describe('minimum launch airspeed', () => {
  it('interpolates between table rows', () => {
    // halfway from 120 kt at 44,000 lb to 150 kt at 66,000 lb (test profile, common practice, no source)
    expect(minimumLaunchAirspeed(strikeFighter, pounds(55000))).toEqual({ kind: 'airspeed', airspeed: 135 });
    expect(minimumLaunchAirspeed(strikeFighter, pounds(42000))).toEqual({ kind: 'airspeed', airspeed: 120 });
  });

  it('needs more airspeed in thinner air', () => {
    const hot = minimumLaunchAirspeed(strikeFighter, pounds(42000), 0.81);
    expect(hot.kind === 'airspeed' && hot.airspeed).toBeCloseTo(133.33, 2); // 120 / sqrt(0.81) = 120 / 0.9 (TAS = EAS / sqrt(sigma), product brief)
  });

  it('gives the table range, not an extrapolation, outside it', () => {
    expect(minimumLaunchAirspeed(strikeFighter, pounds(70000))).toEqual({
      kind: 'outside_launch_table',
      lowest: 30000,
      highest: 66000,
    });
    expect(() => minimumLaunchAirspeed(strikeFighter, pounds(0))).toThrow(LaunchMathInputError);
  });
});

describe('required wind over deck and margin', () => {
  it('is airspeed plus excess less end speed; the margin is what the headwind leaves over it', () => {
    // common practice, no source: at least 120 kt at the end of the deck; 100 kt end speed leaves 20 kt to the wind
    const required = requiredWindOverDeck({
      minimumLaunchAirspeed: knots(120),
      requiredExcess: knots(0),
      endSpeed: knots(100),
    });
    expect(required).toBe(20);
    expect(launchMargin(knots(20), required)).toBe(0);
    expect(launchMargin(knots(19), required)).toBe(-1);
    expect(
      requiredWindOverDeck({ minimumLaunchAirspeed: knots(120), requiredExcess: knots(5), endSpeed: knots(100) }),
    ).toBe(25);
  });

  it('refuses an end speed that is not a number', () => {
    expect(() =>
      requiredWindOverDeck({
        minimumLaunchAirspeed: knots(120),
        requiredExcess: knots(0),
        endSpeed: knots(Number.NaN),
      }),
    ).toThrow(LaunchMathInputError);
  });
});
