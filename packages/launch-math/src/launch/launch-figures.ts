import { afterburnerRequired, takeOffTrim, type AircraftProfile } from '../aircraft/aircraft-profile.js';
import type { CatapultEnergyProfile } from '../catapult/end-speed.js';
import { requirePositive } from '../errors.js';
import type { UnschedulableReason } from '../schedule/launch-projection.js';
import { knots, type Degrees, type Knots, type Pounds } from '../units/units.js';
import type { CrosswindSide, WindComponents } from '../wind/wind-over-deck.js';
import { launchMargin, minimumLaunchAirspeed, requiredWindOverDeck } from './launch-airspeed.js';
import { launchEndSpeed, lowestLaunchSetting } from './launch-settings.js';

/**
 * Why a launch is no-go, with the figures that make it so; every reason that applies is listed, in
 * this order. Codes only: the consumer words them. A new hard limit (say a type's maximum end speed)
 * is one more member here and in `LAUNCH_NO_GO_CODES`.
 */
export type LaunchNoGoReason =
  | { readonly code: 'catapult_down' }
  /** A waist catapult while the landing area is in use. */
  | { readonly code: 'catapult_closed' }
  | { readonly code: 'over_max_gross_weight'; readonly grossWeight: Pounds; readonly maxGrossWeight: Pounds }
  | {
      readonly code: 'crosswind_over_limit';
      readonly crosswind: Knots;
      readonly side: CrosswindSide;
      readonly limit: Knots;
    }
  | {
      readonly code: 'outside_launch_table';
      readonly grossWeight: Pounds;
      readonly lowest: Pounds;
      readonly highest: Pounds;
    }
  /** Even the highest setting falls short of the end speed wanted. */
  | { readonly code: 'setting_out_of_range'; readonly wantedEndSpeed: Knots; readonly maxEndSpeed: Knots }
  | {
      readonly code: 'margin_negative';
      readonly margin: Knots;
      readonly headwind: Knots;
      readonly requiredWindOverDeck: Knots;
    };

export type LaunchNoGoCode = LaunchNoGoReason['code'];

// A record, so the compiler refuses a code missing from the list or one the union does not have.
const NO_GO_CODES_IN_ORDER = {
  catapult_down: true,
  catapult_closed: true,
  over_max_gross_weight: true,
  crosswind_over_limit: true,
  outside_launch_table: true,
  setting_out_of_range: true,
  margin_negative: true,
} as const satisfies Record<LaunchNoGoCode, true>;

/** Every code `launchFigures` can give, in the order it lists them. */
export const LAUNCH_NO_GO_CODES = Object.keys(NO_GO_CODES_IN_ORDER) as readonly LaunchNoGoCode[];

/**
 * Where the catapult setting came from. Today the energy model chooses it; when the ship's approved
 * launch data gives the setting, it becomes another source and the energy model only cross-checks it.
 */
export type LaunchSettingSource = 'energy_model';

export interface LaunchSetting {
  /** Whole-number setting from 0 to the catapult's highest. */
  readonly setting: number;
  readonly source: LaunchSettingSource;
}

/** The conditions of the moment on this catapult. */
export interface LaunchConditionsNow {
  /** Wind along and across this catapult, knots. */
  readonly wind: WindComponents;
  /** Density ratio sigma for the hot-day correction; 1 (the default) is standard sea-level air. */
  readonly densityRatio?: number;
  /** Why the catapult cannot launch now; null when it is up and open. */
  readonly closedReason: UnschedulableReason | null;
}

export interface LaunchFiguresInput {
  /** The type's profile and launch data: launch table, limits, thrust, required excess, trim bands, afterburner threshold. */
  readonly aircraft: AircraftProfile;
  /** The catapult's stroke and energy range. */
  readonly catapult: CatapultEnergyProfile;
  /** Agreed gross weight, lb. */
  readonly grossWeight: Pounds;
  readonly conditions: LaunchConditionsNow;
}

/**
 * Every figure of one aircraft on one catapult, in knots unless said otherwise. Figures that rest on
 * the launch table are null when the gross weight is outside it.
 */
export interface LaunchFigures {
  readonly go: boolean;
  readonly reasons: readonly LaunchNoGoReason[];
  /** Null when no setting reaches the end speed wanted, or the weight is outside the launch table. */
  readonly setting: LaunchSetting | null;
  /** Required airspeed less the headwind, never below zero. */
  readonly wantedEndSpeed: Knots | null;
  /** At the setting given, or at the catapult's highest setting when there is none. */
  readonly endSpeed: Knots;
  /** From the launch table at the gross weight, hot-day corrected. */
  readonly minimumLaunchAirspeed: Knots | null;
  /** Minimum launch airspeed plus the recommended excess. */
  readonly requiredAirspeed: Knots | null;
  /** Required airspeed less the end speed: the headwind needed along the catapult. */
  readonly requiredWindOverDeck: Knots | null;
  /** Headwind less the required wind over deck; below zero is no-go. */
  readonly margin: Knots | null;
  /** Headwind less (minimum launch airspeed - end speed), to show beside `recommendedExcess`. */
  readonly excessWindOverDeck: Knots | null;
  /** The type's recommended excess (its `requiredExcess`). */
  readonly recommendedExcess: Knots;
  readonly wind: WindComponents;
  /** Take-off trim, degrees; null when the weight is below the first trim band. */
  readonly trim: Degrees | null;
  readonly afterburner: boolean;
}

/**
 * One aircraft's launch figures on one catapult and whether it may launch. The wanted end speed is the
 * required airspeed less the headwind; the lowest setting reaching it gives the end speed that the
 * wind over deck and the margin are judged on (the highest setting's when none reaches it).
 */
export function launchFigures(input: LaunchFiguresInput): LaunchFigures {
  const { aircraft, catapult, grossWeight, conditions } = input;
  const { wind, densityRatio = 1, closedReason } = conditions;
  requirePositive(grossWeight, 'Gross weight (lb)');

  const minimum = minimumLaunchAirspeed(aircraft, grossWeight, densityRatio);
  const minimumAirspeed = minimum.kind === 'airspeed' ? minimum.airspeed : null;
  const requiredAirspeed = minimumAirspeed === null ? null : knots(minimumAirspeed + aircraft.requiredExcess);
  const wantedEndSpeed = requiredAirspeed === null ? null : knots(Math.max(0, requiredAirspeed - wind.headwind));
  const search =
    wantedEndSpeed === null ? null : lowestLaunchSetting({ aircraft, catapult, grossWeight, wanted: wantedEndSpeed });
  const endSpeed =
    search?.kind === 'setting'
      ? search.endSpeed
      : launchEndSpeed({ aircraft, catapult, setting: catapult.maxSetting, grossWeight });

  const required =
    minimumAirspeed === null
      ? null
      : requiredWindOverDeck({
          minimumLaunchAirspeed: minimumAirspeed,
          requiredExcess: aircraft.requiredExcess,
          endSpeed,
        });
  const margin = required === null ? null : launchMargin(wind.headwind, required);

  const reasons: LaunchNoGoReason[] = [];
  if (closedReason === 'catapult_down') reasons.push({ code: 'catapult_down' });
  if (closedReason === 'waist_closed') reasons.push({ code: 'catapult_closed' });
  if (grossWeight > aircraft.maxGrossWeight) {
    reasons.push({ code: 'over_max_gross_weight', grossWeight, maxGrossWeight: aircraft.maxGrossWeight });
  }
  if (wind.crosswind > aircraft.crosswindLimit) {
    reasons.push({
      code: 'crosswind_over_limit',
      crosswind: wind.crosswind,
      side: wind.side,
      limit: aircraft.crosswindLimit,
    });
  }
  if (minimum.kind === 'outside_launch_table') {
    reasons.push({ code: 'outside_launch_table', grossWeight, lowest: minimum.lowest, highest: minimum.highest });
  }
  if (search?.kind === 'out_of_range' && wantedEndSpeed !== null) {
    reasons.push({ code: 'setting_out_of_range', wantedEndSpeed, maxEndSpeed: search.maxEndSpeed });
  }
  if (margin !== null && required !== null && margin < 0) {
    reasons.push({ code: 'margin_negative', margin, headwind: wind.headwind, requiredWindOverDeck: required });
  }

  return {
    go: reasons.length === 0,
    reasons,
    setting: search?.kind === 'setting' ? { setting: search.setting, source: 'energy_model' } : null,
    wantedEndSpeed,
    endSpeed,
    minimumLaunchAirspeed: minimumAirspeed,
    requiredAirspeed,
    requiredWindOverDeck: required,
    margin,
    excessWindOverDeck: minimumAirspeed === null ? null : knots(wind.headwind - (minimumAirspeed - endSpeed)),
    recommendedExcess: aircraft.requiredExcess,
    wind,
    trim: takeOffTrim(aircraft, grossWeight),
    afterburner: afterburnerRequired(aircraft, grossWeight),
  };
}
