import type { AircraftProfile } from '../aircraft/aircraft-profile.js';
import type { CatapultEnergyProfile } from '../catapult/end-speed.js';
import { LaunchMathInputError } from '../errors.js';
import { degrees, joules, knots, metres, pounds, poundsForce } from '../units/units.js';
import type { WindComponents } from '../wind/wind-over-deck.js';
import type { ApprovedSettingTable } from './approved-setting.js';
import { LAUNCH_NO_GO_CODES, launchFigures, type LaunchConditionsNow } from './launch-figures.js';

// The worked example behind every expected value below, worked by hand (not with this package):
// Halliday, Resnick & Walker, Fundamentals of Physics, ch. 5: a 2.36e4 kg jet with 107 kN of thrust is
// catapulted over 90 m to 85 m/s by a catapult force of about 8.4e5 N. In trade units (exact factors,
// product brief): 2.36e4 kg / 0.45359237 = 52,029.09 lb; 107e3 N / 4.4482216152605 = 24,054.56 lbf.
const grossWeight = pounds(23600 / 0.45359237);
const thrust = poundsForce(107e3 / 4.4482216152605);

// Invented for the tests: a flat launch table (140 kt from 30,000 to 66,000 lb), 5 kt recommended excess,
// 15 kt crosswind limit, trim 12 degrees below 50,000 lb and 14 from there (1,000 lb step), afterburner
// from 55,000 lb. Flat so the minimum is 140 kt by inspection; interpolation has its own spec.
const textbookJet: AircraftProfile = {
  maxGrossWeight: pounds(66000),
  crosswindLimit: knots(15),
  thrust,
  requiredExcess: knots(5),
  minimumLaunchAirspeed: [
    { grossWeight: pounds(30000), airspeed: knots(140) },
    { grossWeight: pounds(66000), airspeed: knots(140) },
  ],
  trimBands: [
    { fromGrossWeight: pounds(0), trim: degrees(12) },
    { fromGrossWeight: pounds(50000), trim: degrees(14) },
  ],
  trimWeightStep: pounds(1000),
  afterburnerFromGrossWeight: pounds(55000),
};

// Settings 0..4 in steps of 3.78e7 J over the textbook's 90 m stroke: setting 2 is the textbook's
// 8.4e5 N x 90 m = 7.56e7 J. End speeds by hand, v = sqrt(2 (E + T s) / m), T s = 107e3 x 90 = 9.63e6 J,
// m = 2.36e4 kg, 1 kt = 1852/3600 m/s:
//   setting 0: sqrt(2 x 9.63e6 / 2.36e4)            = sqrt(816.10)   = 28.57 m/s = 55.53 kt
//   setting 1: sqrt(2 x (3.78e7 + 9.63e6) / 2.36e4) = sqrt(4019.49)  = 63.40 m/s = 123.24 kt
//   setting 2: sqrt(2 x (7.56e7 + 9.63e6) / 2.36e4) = sqrt(7222.88)  = 84.99 m/s = 165.20 kt (textbook: 85 m/s)
const fourStepCatapult: CatapultEnergyProfile = {
  strokeLength: metres(90),
  energyAtMinSetting: joules(0),
  energyAtMaxSetting: joules(4 * 3.78e7),
  maxSetting: 4,
};
// The same catapult stopping at the textbook's setting: its best is 165.20 kt for this jet.
const textbookCatapult: CatapultEnergyProfile = {
  ...fourStepCatapult,
  energyAtMaxSetting: joules(7.56e7),
  maxSetting: 2,
};

const wind = (headwind: number, crosswind = 0, side: WindComponents['side'] = 'none'): WindComponents => ({
  headwind: knots(headwind),
  crosswind: knots(crosswind),
  side,
});
const open = (overrides: Partial<LaunchConditionsNow> = {}): LaunchConditionsNow => ({
  wind: wind(25, 15, 'port'),
  closedReason: null,
  ...overrides,
});

describe('launch figures', () => {
  it('is go on the lowest setting that reaches the end speed wanted, with every figure', () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: fourStepCatapult,
      grossWeight,
      conditions: open(),
    });
    expect(figures.go).toBe(true);
    expect(figures.reasons).toEqual([]);
    expect(figures.minimumLaunchAirspeed).toBe(140); // flat table (invented)
    expect(figures.requiredAirspeed).toBe(145); // 140 kt + 5 kt recommended excess (product brief)
    expect(figures.wantedEndSpeed).toBe(120); // 145 kt - 25 kt headwind
    expect(figures.setting).toEqual({ setting: 1, source: 'energy_model' }); // setting 0 gives 55.53 kt, setting 1 gives 123.24 kt (by hand above)
    expect(figures.endSpeed).toBeCloseTo(123.24, 2); // by hand above, Halliday, Resnick & Walker ch. 5 inputs
    expect(figures.requiredWindOverDeck).toBeCloseTo(21.76, 2); // 145 - 123.24 (product brief: airspeed + excess - end speed)
    expect(figures.margin).toBeCloseTo(3.24, 2); // 25 - 21.76
    expect(figures.excessWindOverDeck).toBeCloseTo(8.24, 2); // 25 - (140 - 123.24) (product brief: headwind - required wind over deck)
    expect(figures.recommendedExcess).toBe(5);
    expect(figures.wind).toEqual(wind(25, 15, 'port')); // a crosswind exactly at the limit is go: common practice, no source
    expect(figures.trim).toBe(14); // 52,029 lb rounds to 52,000 lb: the 50,000 lb band (invented bands)
    expect(figures.afterburner).toBe(false); // 52,029 lb is under the invented 55,000 lb threshold
  });

  it('takes setting 0 when the headwind alone nearly makes the airspeed', () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: fourStepCatapult,
      grossWeight,
      conditions: open({ wind: wind(100) }),
    });
    expect(figures.wantedEndSpeed).toBe(45); // 145 - 100
    expect(figures.setting).toEqual({ setting: 0, source: 'energy_model' }); // 55.53 kt from thrust alone (by hand above)
    expect(figures.margin).toBeCloseTo(10.53, 2); // 100 - (145 - 55.53)
    expect(figures.go).toBe(true);
  });

  it('is no-go with the best end speed and a negative margin when even the highest setting falls short on a hot day with a tailwind', () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: textbookCatapult,
      grossWeight,
      conditions: open({ wind: wind(-10), densityRatio: 0.81 }),
    });
    expect(figures.minimumLaunchAirspeed).toBeCloseTo(155.56, 2); // 140 / sqrt(0.81) = 140 / 0.9 (TAS = EAS / sqrt(sigma), product brief)
    expect(figures.requiredAirspeed).toBeCloseTo(160.56, 2); // 155.56 + 5
    expect(figures.wantedEndSpeed).toBeCloseTo(170.56, 2); // 160.56 + 10 kt of tailwind
    expect(figures.setting).toBeNull();
    expect(figures.endSpeed).toBeCloseTo(165.2, 1); // the highest setting: Halliday, Resnick & Walker ch. 5, 85 m/s
    expect(figures.requiredWindOverDeck).toBeCloseTo(-4.65, 2); // 160.56 - 165.20
    expect(figures.margin).toBeCloseTo(-5.35, 2); // -10 - (-4.65)
    expect(figures.go).toBe(false);
    expect(figures.reasons.map((reason) => reason.code)).toEqual(['setting_out_of_range', 'margin_negative']);
    const [outOfRange, margin] = figures.reasons;
    expect(outOfRange.code === 'setting_out_of_range' && [outOfRange.wantedEndSpeed, outOfRange.maxEndSpeed]).toEqual([
      expect.closeTo(170.56, 2),
      expect.closeTo(165.2, 1),
    ]);
    expect(margin.code === 'margin_negative' && [margin.margin, margin.headwind, margin.requiredWindOverDeck]).toEqual([
      expect.closeTo(-5.35, 2),
      -10,
      expect.closeTo(-4.65, 2),
    ]);
  });

  it('lists every hard limit at once, with no margin outside the launch table', () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: fourStepCatapult,
      grossWeight: pounds(70000),
      conditions: open({ wind: wind(25, 18, 'starboard'), closedReason: 'catapult_down' }),
    });
    expect(figures.go).toBe(false);
    expect(figures.reasons).toEqual([
      { code: 'catapult_down' },
      { code: 'over_max_gross_weight', grossWeight: 70000, maxGrossWeight: 66000 },
      { code: 'crosswind_over_limit', crosswind: 18, side: 'starboard', limit: 15 },
      { code: 'outside_launch_table', grossWeight: 70000, lowest: 30000, highest: 66000 },
    ]);
    expect(figures).toMatchObject({
      setting: null,
      wantedEndSpeed: null,
      minimumLaunchAirspeed: null,
      requiredAirspeed: null,
      requiredWindOverDeck: null,
      margin: null,
      excessWindOverDeck: null,
      trim: 14, // 70,000 lb: the 50,000 lb band (invented bands)
      afterburner: true, // over the invented 55,000 lb threshold
    });
    // The highest setting at 70,000 lb = 31,751.47 kg: sqrt(2 (1.512e8 + 9.63e6) / 31,751.47) = 100.65 m/s = 195.65 kt (by hand)
    expect(figures.endSpeed).toBeCloseTo(195.65, 2);
  });

  it('is no-go on a waist catapult closed while the landing area is in use, figures unchanged', () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: fourStepCatapult,
      grossWeight,
      conditions: open({ closedReason: 'waist_closed' }),
    });
    expect(figures.reasons).toEqual([{ code: 'catapult_closed' }]);
    expect(figures.go).toBe(false);
    expect(figures.setting).toEqual({ setting: 1, source: 'energy_model' });
    expect(figures.margin).toBeCloseTo(3.24, 2); // as in the go case
  });

  it('is no-go one knot over the crosswind limit', () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: fourStepCatapult,
      grossWeight,
      conditions: open({ wind: wind(25, 16, 'port') }),
    });
    expect(figures.reasons).toEqual([{ code: 'crosswind_over_limit', crosswind: 16, side: 'port', limit: 15 }]);
  });

  // An invented approved table: the jet's 52,029 lb falls in the 55,000 lb row, setting 1, 8 kt recommended excess.
  const approvedTable: ApprovedSettingTable = {
    recommendedExcess: knots(8),
    rows: [
      { upToWeight: pounds(45000), setting: 0 },
      { upToWeight: pounds(55000), setting: 1 },
    ],
  };

  it("shows the approved setting, judges the launch on its end speed, and cross-checks it with the energy model's", () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: fourStepCatapult,
      grossWeight,
      conditions: open(),
      approved: { table: approvedTable, crossCheckTolerance: 1 },
    });
    expect(figures.setting).toEqual({ setting: 1, source: 'approved_data' });
    expect(figures.recommendedExcess).toBe(8); // the table's, not the type's 5 kt
    expect(figures.requiredAirspeed).toBe(148); // 140 + 8
    expect(figures.wantedEndSpeed).toBe(123); // 148 - 25 kt headwind
    expect(figures.endSpeed).toBeCloseTo(123.24, 2); // setting 1, by hand above
    expect(figures.requiredWindOverDeck).toBeCloseTo(24.76, 2); // 148 - 123.24
    expect(figures.margin).toBeCloseTo(0.24, 2); // 25 - 24.76
    expect(figures.excessWindOverDeck).toBeCloseTo(8.24, 2); // 25 - (140 - 123.24)
    // With no wind the model needs 148 kt from the catapult: setting 2 (165.20 kt by hand above), one step
    // off the approved setting, inside a tolerance of 1.
    expect(figures.crossCheck).toEqual({ setting: 2, flagged: false });
    expect(figures.go).toBe(true);
  });

  it('flags the cross-check when the estimate is further off than the tolerance', () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: fourStepCatapult,
      grossWeight,
      conditions: open(),
      approved: { table: approvedTable, crossCheckTolerance: 0 },
    });
    expect(figures.crossCheck).toEqual({ setting: 2, flagged: true }); // 2 - 1 = 1 step, over a tolerance of 0
    expect(figures.go).toBe(true); // a warning only: the approved data governs the shot
  });

  it('flags the cross-check, and reports no out-of-range setting, when the model reaches no setting at all', () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: textbookCatapult,
      grossWeight,
      conditions: open({ wind: wind(-10), densityRatio: 0.81 }),
      approved: { table: { ...approvedTable, recommendedExcess: knots(10) }, crossCheckTolerance: 2 },
    });
    expect(figures.setting).toEqual({ setting: 1, source: 'approved_data' });
    // 140 / 0.9 + 10 = 165.56 kt required, past the highest setting's 165.20 kt (by hand above).
    expect(figures.crossCheck).toEqual({ setting: null, flagged: true });
    // At setting 1's 123.24 kt with 10 kt of tailwind the margin is below zero; no out-of-range reason.
    expect(figures.reasons.map((reason) => reason.code)).toEqual(['margin_negative']);
  });

  it('is no-go with no setting above the last row of the approved table', () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: fourStepCatapult,
      grossWeight,
      conditions: open(),
      approved: { table: { ...approvedTable, rows: approvedTable.rows.slice(0, 1) }, crossCheckTolerance: 2 },
    });
    expect(figures.setting).toBeNull();
    expect(figures.crossCheck).toBeNull();
    expect(figures.go).toBe(false);
    expect(figures.reasons).toEqual([{ code: 'approved_setting_missing', grossWeight, highest: 45000 }]);
  });

  it('is no-go with no setting when the ship holds no approved table for the combination', () => {
    const figures = launchFigures({
      aircraft: textbookJet,
      catapult: fourStepCatapult,
      grossWeight,
      conditions: open(),
      approved: { table: null, crossCheckTolerance: 2 },
    });
    expect(figures.setting).toBeNull();
    expect(figures.recommendedExcess).toBe(5); // the type's, with no table to give one
    expect(figures.reasons).toEqual([{ code: 'approved_setting_missing', grossWeight, highest: null }]);
  });

  it('names every code it can give, in the order it lists them', () => {
    expect(LAUNCH_NO_GO_CODES).toEqual([
      'catapult_down',
      'catapult_closed',
      'over_max_gross_weight',
      'crosswind_over_limit',
      'outside_launch_table',
      'approved_setting_missing',
      'setting_out_of_range',
      'margin_negative',
    ]);
  });

  it('refuses a gross weight that is not a weight', () => {
    expect(() =>
      launchFigures({ aircraft: textbookJet, catapult: fourStepCatapult, grossWeight: pounds(0), conditions: open() }),
    ).toThrow(LaunchMathInputError);
  });
});
