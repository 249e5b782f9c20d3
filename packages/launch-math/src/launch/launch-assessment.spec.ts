import { strikeFighter } from '../testing/profiles.fixture.js';
import { knots, pounds } from '../units/units.js';
import type { WindComponents } from '../wind/wind-over-deck.js';
import { assessLaunch, minimumLaunchAirspeed, type LaunchConditions } from './launch-assessment.js';

const headwindOf = (headwind: number, crosswind = 0): WindComponents => ({
  headwind: knots(headwind),
  crosswind: knots(crosswind),
  side: crosswind === 0 ? 'none' : 'port',
});

const conditions = (overrides: Partial<LaunchConditions> = {}): LaunchConditions => ({
  aircraft: strikeFighter,
  grossWeight: pounds(42000),
  endSpeed: knots(100),
  wind: headwindOf(20),
  catapultUp: true,
  ...overrides,
});

describe('launch margin', () => {
  it('is go with a zero margin when end speed and headwind make the 120 kt needed at the end of the deck', () => {
    const result = assessLaunch(conditions());
    expect(result.minimumLaunchAirspeed).toBe(120); // common practice, no source: at least 120 kt at the end of the deck
    expect(result.requiredWindOverDeck).toBe(20); // 120 kt - 100 kt end speed
    expect(result.margin).toBe(0);
    expect(result).toMatchObject({ go: true, reasons: [] });
  });

  it('is no-go one knot short', () => {
    const result = assessLaunch(conditions({ wind: headwindOf(19) }));
    expect(result.go).toBe(false);
    expect(result.reasons).toEqual([{ code: 'margin_negative', margin: -1, headwind: 19, requiredWindOverDeck: 20 }]);
  });

  it('adds the required excess to the wind needed', () => {
    const result = assessLaunch(conditions({ aircraft: { ...strikeFighter, requiredExcess: knots(5) } }));
    expect(result.requiredWindOverDeck).toBe(25);
    expect(result.margin).toBe(-5);
  });

  it('interpolates the minimum launch airspeed between table rows', () => {
    const airspeed = minimumLaunchAirspeed(strikeFighter, pounds(55000));
    expect(airspeed).toEqual({ kind: 'airspeed', airspeed: 135 }); // halfway from 120 kt at 44,000 lb to 150 kt at 66,000 lb
  });

  it('needs more wind on a hot day', () => {
    const result = assessLaunch(conditions({ densityRatio: 0.9 }));
    expect(result.minimumLaunchAirspeed).toBeCloseTo(120 / Math.sqrt(0.9), 9); // TAS = EAS / sqrt(sigma) (product brief)
    expect(result.go).toBe(false);
  });

  it('lists every reason against the launch at once', () => {
    const result = assessLaunch(
      conditions({ catapultUp: false, grossWeight: pounds(66000), wind: headwindOf(5, 16), endSpeed: knots(120) }),
    );
    expect(result.go).toBe(false);
    expect(result.reasons.map((reason) => reason.code).sort()).toEqual([
      'catapult_down',
      'crosswind_over_limit',
      'margin_negative',
    ]);
    expect(result.reasons).toContainEqual({ code: 'crosswind_over_limit', crosswind: 16, side: 'port', limit: 15 });
  });

  it('is no-go over the maximum gross weight and outside the launch table without a margin', () => {
    const result = assessLaunch(conditions({ grossWeight: pounds(70000) }));
    expect(result.reasons).toEqual([
      { code: 'over_max_gross_weight', grossWeight: 70000, maxGrossWeight: 66000 },
      { code: 'outside_launch_table', grossWeight: 70000, lowest: 30000, highest: 66000 },
    ]);
    expect(result.margin).toBeNull();
  });

  it('allows a crosswind exactly at the limit', () => {
    expect(assessLaunch(conditions({ wind: headwindOf(20, 15) })).go).toBe(true);
  });
});
