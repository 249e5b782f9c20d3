import {
  LAUNCH_GATE_CODES,
  LINEUP_REFUSAL_CODES,
  NO_GO_CODES,
  REVERIFY_CAUSES as REVERIFY_CAUSE_CODES,
  SOFT_LAUNCH_GATE_CODES,
} from '@catline/contracts';
import {
  knots,
  LAUNCH_GATES,
  LAUNCH_NO_GO_CODES,
  REVERIFY_CAUSES,
  SOFT_LAUNCH_GATES,
  type WindComponents,
} from '@catline/launch-math';
import type { AircraftType } from '../database/entities/aircraft-type.entity.js';
import type { Catapult } from '../database/entities/catapult.entity.js';
import { launchFiguresView, type FiguresInput } from './launch-figures.js';

// The worked example of launch-math's launch-figures spec in stored units: Halliday, Resnick & Walker,
// Fundamentals of Physics, ch. 5 (2.36e4 kg = 52,029 lb, 107 kN = 24,054.56 lbf, a 90 m stroke, 7.56e7 J at
// the highest setting: 85 m/s = 165.2 kt); launch table, limits and excess invented for the tests.
const type = {
  designation: 'KX-1',
  maxGrossWeightLb: 66000,
  crosswindLimitKt: 15,
  thrustLbf: 107e3 / 4.4482216152605,
  requiredExcessKt: 5,
  afterburnerFromLb: 55000,
  trimBands: [{ upToLb: null, trimDeg: 12 }],
  launchTable: [
    { grossWeightLb: 30000, minLaunchAirspeedKt: 140 },
    { grossWeightLb: 66000, minLaunchAirspeedKt: 140 },
  ],
  // The approved data (invented): setting 1 up to 60,000 lb off cat 3 clean, 5 kt recommended excess.
  settingTables: [
    { catapultNumber: 3, configuration: 'clean', recommendedExcessKt: 5, rows: [{ upToLb: 60000, setting: 1 }] },
  ],
} as unknown as AircraftType;
const catapult = {
  number: 3,
  strokeM: 90,
  energyMinMj: 0,
  energyMaxMj: 75.6,
  settingCount: 3,
  status: 'up',
} as Catapult;

const wind = (headwind: number, crosswind = 0, side: WindComponents['side'] = 'none'): WindComponents => ({
  headwind: knots(headwind),
  crosswind: knots(crosswind),
  side,
});
const input = (overrides: Partial<FiguresInput> = {}): FiguresInput => ({
  type,
  grossWeightLb: 52029,
  catapult,
  wind: wind(25),
  closedReason: null,
  densityRatio: 1,
  clearingTurnDeg: 10,
  configuration: 'clean',
  crossCheckTolerance: undefined,
  ...overrides,
});

describe('launch figures as the deck crew reads them', () => {
  it('carries launch-math figures and verdict unchanged when go, the approved setting cross-checked', () => {
    const view = launchFiguresView(input());
    expect(view).toMatchObject({
      go: true,
      reasons: [],
      catapultSetting: 1,
      // 145 kt from the catapult alone: setting 1 gives 123.24 kt, 2 gives 165.2 kt (launch-math's spec, by
      // hand); one step off, inside the default tolerance of 2.
      crossCheckSetting: 2,
      crossCheckFlagged: false,
      requiredAirspeedKt: 145,
      recommendedExcessKt: 5,
      clearingTurnDeg: 10,
    });
    expect(view.marginKt).toBeGreaterThan(0);
  });

  it("flags the cross-check beyond the ship's tolerance", () => {
    // Approved setting 1 against the model's 2: one step, over a tolerance of 0.
    expect(launchFiguresView(input({ crossCheckTolerance: 0 }))).toMatchObject({
      catapultSetting: 1,
      crossCheckSetting: 2,
      crossCheckFlagged: true,
    });
  });

  it('words a negative margin on the approved setting', () => {
    // Hot day (sigma 0.81) with 10 kt of tailwind: 140 / 0.9 + 5 = 160.56 kt required; setting 1 gives
    // 123.24 kt, so 160.56 - 123.24 = 37.3 kt wind over deck required, margin -10 - 37.32 = -47.3 kt
    // (worked by hand).
    const view = launchFiguresView(input({ wind: wind(-10), densityRatio: 0.81 }));
    expect(view).toMatchObject({ go: false, catapultSetting: 1 });
    expect(view.reasons).toEqual([
      {
        code: 'margin_negative',
        message: 'Launch margin -47.3 kt: headwind -10.0 kt is below the 37.3 kt wind over deck required.',
      },
    ]);
  });

  it('words a missing approved table for the configuration', () => {
    const view = launchFiguresView(input({ configuration: 'stores' }));
    expect(view).toMatchObject({ go: false, catapultSetting: null, crossCheckSetting: null, crossCheckFlagged: null });
    expect(view.reasons).toEqual([
      {
        code: 'approved_setting_missing',
        message:
          'The approved launch data hold no stores setting table for the KX-1 on cat 3; the admin enters it on the Launch data screen.',
      },
    ]);
  });

  it('words every hard limit', () => {
    const view = launchFiguresView(
      input({ grossWeightLb: 70000, wind: wind(25, 18, 'starboard'), closedReason: 'catapult_down' }),
    );
    expect(view.reasons).toEqual([
      { code: 'catapult_down', message: 'Cat 3 is down.' },
      { code: 'over_max_gross_weight', message: 'Gross weight 70,000 lb is over the KX-1 maximum of 66,000 lb.' },
      { code: 'crosswind_over_limit', message: 'Crosswind 18.0 kt from starboard is over the KX-1 limit of 15.0 kt.' },
      {
        code: 'outside_launch_table',
        message: 'Gross weight 70,000 lb is outside the KX-1 launch data (30,000 lb to 66,000 lb).',
      },
      {
        code: 'approved_setting_missing',
        message: 'Gross weight 70,000 lb is above the approved clean settings of the KX-1 on cat 3 (up to 60,000 lb).',
      },
    ]);
    expect(view).toMatchObject({ requiredAirspeedKt: null, requiredWindOverDeckKt: null, marginKt: null });
  });

  it('words a waist catapult closed while the landing area is in use', () => {
    expect(launchFiguresView(input({ closedReason: 'waist_closed' })).reasons).toEqual([
      { code: 'catapult_closed', message: 'Cat 3 is closed while the landing area is in use.' },
    ]);
  });

  it('keeps the contracts no-go codes in step with launch-math', () => {
    expect([...NO_GO_CODES].sort()).toEqual([...LAUNCH_NO_GO_CODES].sort());
  });

  it('keeps the contracts launch gates, soft gates and re-verify causes in step with launch-math', () => {
    expect(LAUNCH_GATE_CODES).toEqual(LAUNCH_GATES);
    expect(SOFT_LAUNCH_GATE_CODES).toEqual(SOFT_LAUNCH_GATES);
    expect(REVERIFY_CAUSE_CODES).toEqual(REVERIFY_CAUSES);
  });

  it('gives every launch gate a refusal code of its own', () => {
    expect(LAUNCH_GATES.filter((gate) => !(LINEUP_REFUSAL_CODES as readonly string[]).includes(gate))).toEqual([]);
  });
});
