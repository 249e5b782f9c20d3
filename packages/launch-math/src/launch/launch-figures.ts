import { afterburnerRequired, takeOffTrim, type AircraftProfile } from '../aircraft/aircraft-profile.js';
import type { CatapultEnergyProfile } from '../catapult/end-speed.js';
import { requirePositive } from '../errors.js';
import type { UnschedulableReason } from '../schedule/launch-projection.js';
import { knots, type Degrees, type Knots, type Pounds } from '../units/units.js';
import type { CrosswindSide, WindComponents } from '../wind/wind-over-deck.js';
import { approvedSetting, type ApprovedSettingTable } from './approved-setting.js';
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
  /**
   * The ship's approved data gives no setting: no table for this catapult, type and configuration
   * (`highest` null), or the weight is above its last row.
   */
  | { readonly code: 'approved_setting_missing'; readonly grossWeight: Pounds; readonly highest: Pounds | null }
  /** Even the highest setting falls short of the end speed wanted (judged on the energy model's setting only). */
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
  approved_setting_missing: true,
  setting_out_of_range: true,
  margin_negative: true,
} as const satisfies Record<LaunchNoGoCode, true>;

/** Every code `launchFigures` can give, in the order it lists them. */
export const LAUNCH_NO_GO_CODES = Object.keys(NO_GO_CODES_IN_ORDER) as readonly LaunchNoGoCode[];

/** Where the catapult setting came from: the ship's approved data, or the energy model where none is given. */
export type LaunchSettingSource = 'approved_data' | 'energy_model';

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

/** The ship's approved launch data for this catapult, type and configuration. */
export interface ApprovedLaunchData {
  /** Null when the ship's data holds no table for the combination: no shot has an approved setting. */
  readonly table: ApprovedSettingTable | null;
  /** Settings the energy model's estimate may differ from the approved setting before it is flagged. */
  readonly crossCheckTolerance: number;
}

/** Catline's own estimate held against the approved setting. */
export interface SettingCrossCheck {
  /**
   * The energy model's lowest setting reaching the required airspeed with no wind over the deck (the
   * approved setting is by weight alone); null when none reaches it.
   */
  readonly setting: number | null;
  /** True when the estimate is off by more than the tolerance, or reaches no setting at all. */
  readonly flagged: boolean;
}

export interface LaunchFiguresInput {
  /** The type's profile and launch data: launch table, limits, thrust, required excess, trim bands, afterburner threshold. */
  readonly aircraft: AircraftProfile;
  /** The catapult's stroke and energy range. */
  readonly catapult: CatapultEnergyProfile;
  /** Agreed gross weight, lb. */
  readonly grossWeight: Pounds;
  readonly conditions: LaunchConditionsNow;
  /**
   * Given, its setting is the setting and the energy model only cross-checks it; left out, the
   * energy model's setting is used alone.
   */
  readonly approved?: ApprovedLaunchData;
}

/**
 * Every figure of one aircraft on one catapult, in knots unless said otherwise. Figures that rest on
 * the launch table are null when the gross weight is outside it.
 */
export interface LaunchFigures {
  readonly go: boolean;
  readonly reasons: readonly LaunchNoGoReason[];
  /**
   * The approved setting when approved data is given (null when it has none for the weight); otherwise
   * the energy model's, null when no setting reaches the end speed wanted or the weight is outside the launch table.
   */
  readonly setting: LaunchSetting | null;
  /** The energy model against the approved setting; null without approved data or when it has no setting. */
  readonly crossCheck: SettingCrossCheck | null;
  /** Required airspeed less the headwind, never below zero. */
  readonly wantedEndSpeed: Knots | null;
  /** At the setting given, or at the catapult's highest setting when there is none (the energy model's figure). */
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
  /** The approved table's recommended excess, or the type's (its `requiredExcess`) without one. */
  readonly recommendedExcess: Knots;
  readonly wind: WindComponents;
  /** Take-off trim, degrees; null when the weight is below the first trim band. */
  readonly trim: Degrees | null;
  readonly afterburner: boolean;
}

/**
 * One aircraft's launch figures on one catapult and whether it may launch. The wanted end speed is the
 * required airspeed less the headwind. With approved data, its setting's end speed is what the wind over
 * deck and the margin are judged on, and the lowest setting reaching the required airspeed with no
 * wind is the cross-check; without, the lowest setting reaching the wanted end speed is the setting (the highest setting's end speed when none
 * reaches it).
 */
export function launchFigures(input: LaunchFiguresInput): LaunchFigures {
  const { aircraft, catapult, grossWeight, conditions, approved } = input;
  const { wind, densityRatio = 1, closedReason } = conditions;
  requirePositive(grossWeight, 'Gross weight (lb)');

  const recommendedExcess = approved?.table?.recommendedExcess ?? aircraft.requiredExcess;
  const minimum = minimumLaunchAirspeed(aircraft, grossWeight, densityRatio);
  const minimumAirspeed = minimum.kind === 'airspeed' ? minimum.airspeed : null;
  const requiredAirspeed = minimumAirspeed === null ? null : knots(minimumAirspeed + recommendedExcess);
  const wantedEndSpeed = requiredAirspeed === null ? null : knots(Math.max(0, requiredAirspeed - wind.headwind));
  const search =
    wantedEndSpeed === null ? null : lowestLaunchSetting({ aircraft, catapult, grossWeight, wanted: wantedEndSpeed });
  // An approved table gives a setting by weight alone, wind aside; its cross-check is the model's setting
  // for the required airspeed from the catapult alone, so the two compare like with like.
  const check =
    approved && requiredAirspeed !== null
      ? lowestLaunchSetting({ aircraft, catapult, grossWeight, wanted: requiredAirspeed })
      : null;
  const estimate = check?.kind === 'setting' ? check.setting : null;
  const lookup = approved?.table ? approvedSetting(approved.table, grossWeight) : null;
  const setting: LaunchSetting | null = approved
    ? lookup?.kind === 'setting'
      ? { setting: lookup.setting, source: 'approved_data' }
      : null
    : search?.kind === 'setting'
      ? { setting: search.setting, source: 'energy_model' }
      : null;
  const endSpeed =
    setting?.source === 'energy_model' && search?.kind === 'setting'
      ? search.endSpeed
      : launchEndSpeed({ aircraft, catapult, setting: setting?.setting ?? catapult.maxSetting, grossWeight });

  const required =
    minimumAirspeed === null
      ? null
      : requiredWindOverDeck({ minimumLaunchAirspeed: minimumAirspeed, requiredExcess: recommendedExcess, endSpeed });
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
  if (approved && setting === null) {
    reasons.push({
      code: 'approved_setting_missing',
      grossWeight,
      highest: lookup?.kind === 'above_table' ? lookup.highest : null,
    });
  }
  // With an approved setting the end speed it gives is judged by the margin below, not by the model's search.
  if (!approved && search?.kind === 'out_of_range' && wantedEndSpeed !== null) {
    reasons.push({ code: 'setting_out_of_range', wantedEndSpeed, maxEndSpeed: search.maxEndSpeed });
  }
  if (margin !== null && required !== null && margin < 0) {
    reasons.push({ code: 'margin_negative', margin, headwind: wind.headwind, requiredWindOverDeck: required });
  }

  return {
    go: reasons.length === 0,
    reasons,
    setting,
    crossCheck:
      approved && setting
        ? {
            setting: estimate,
            flagged: estimate === null || Math.abs(estimate - setting.setting) > approved.crossCheckTolerance,
          }
        : null,
    wantedEndSpeed,
    endSpeed,
    minimumLaunchAirspeed: minimumAirspeed,
    requiredAirspeed,
    requiredWindOverDeck: required,
    margin,
    excessWindOverDeck: minimumAirspeed === null ? null : knots(wind.headwind - (minimumAirspeed - endSpeed)),
    recommendedExcess,
    wind,
    trim: takeOffTrim(aircraft, grossWeight),
    afterburner: afterburnerRequired(aircraft, grossWeight),
  };
}
