import { hotDayMinimumLaunchAirspeed } from '../atmosphere/isa.js';
import type { AircraftProfile } from '../aircraft/aircraft-profile.js';
import { requireFinite, requirePositive } from '../errors.js';
import { knots, pounds, type Knots, type Pounds } from '../units/units.js';
import type { CrosswindSide, WindComponents } from '../wind/wind-over-deck.js';
import { interpolateInTable } from './interpolation.js';

/** The type's minimum launch airspeed at a gross weight, or the table's range when the weight is outside it. */
export type MinimumLaunchAirspeed =
  | { readonly kind: 'airspeed'; readonly airspeed: Knots }
  | { readonly kind: 'outside_launch_table'; readonly lowest: Pounds; readonly highest: Pounds };

/** Why a launch is no-go. Every reason that applies is listed, never only the first. */
export type NoGoReason =
  | { readonly code: 'margin_negative'; readonly margin: Knots; readonly headwind: Knots; readonly requiredWindOverDeck: Knots }
  | { readonly code: 'crosswind_over_limit'; readonly crosswind: Knots; readonly side: CrosswindSide; readonly limit: Knots }
  | { readonly code: 'over_max_gross_weight'; readonly grossWeight: Pounds; readonly maxGrossWeight: Pounds }
  | { readonly code: 'catapult_down' }
  | { readonly code: 'outside_launch_table'; readonly grossWeight: Pounds; readonly lowest: Pounds; readonly highest: Pounds };

export type NoGoCode = NoGoReason['code'];

/** Everything the launch decision rests on. */
export interface LaunchConditions {
  readonly aircraft: AircraftProfile;
  /** Agreed gross weight, lb. */
  readonly grossWeight: Pounds;
  /** Catapult end speed at the chosen setting, knots. */
  readonly endSpeed: Knots;
  /** Wind along and across this catapult. */
  readonly wind: WindComponents;
  readonly catapultUp: boolean;
  /** Density ratio sigma for the hot-day correction; 1 (the default) means standard sea-level air. */
  readonly densityRatio?: number;
}

/** Figures and verdict of one launch; figures are null where the launch table does not cover the weight. */
export interface LaunchAssessment {
  readonly go: boolean;
  readonly reasons: readonly NoGoReason[];
  /** Minimum launch airspeed after any hot-day correction, knots. */
  readonly minimumLaunchAirspeed: Knots | null;
  /** Wind over deck needed along the catapult, knots. */
  readonly requiredWindOverDeck: Knots | null;
  /** Headwind minus required wind over deck, knots: negative is no-go. */
  readonly margin: Knots | null;
}

/**
 * The type's minimum launch airspeed (knots) at a gross weight (lb) by linear interpolation in its
 * table, corrected to true airspeed for the density ratio; never extrapolated.
 */
export function minimumLaunchAirspeed(aircraft: AircraftProfile, grossWeight: Pounds, densityRatio = 1): MinimumLaunchAirspeed {
  requirePositive(grossWeight, 'Gross weight (lb)');
  const table = aircraft.minimumLaunchAirspeed.map((point) => [point.grossWeight, point.airspeed] as const);
  const found = interpolateInTable(table, grossWeight);
  if (found.kind === 'outside') {
    return { kind: 'outside_launch_table', lowest: pounds(found.lowest), highest: pounds(found.highest) };
  }
  return { kind: 'airspeed', airspeed: hotDayMinimumLaunchAirspeed(knots(found.value), densityRatio) };
}

/** Required wind over deck (knots) = minimum launch airspeed + required excess - end speed. */
export function requiredWindOverDeck(input: {
  readonly minimumLaunchAirspeed: Knots;
  readonly requiredExcess: Knots;
  readonly endSpeed: Knots;
}): Knots {
  requireFinite(input.endSpeed, 'End speed (kt)');
  return knots(input.minimumLaunchAirspeed + input.requiredExcess - input.endSpeed);
}

/** Launch margin (knots) = headwind - required wind over deck. */
export const launchMargin = (headwind: Knots, required: Knots): Knots => knots(headwind - required);

/** Go/no-go for one launch with every reason against it, and the figures behind the margin. */
export function assessLaunch(conditions: LaunchConditions): LaunchAssessment {
  const { aircraft, grossWeight, endSpeed, wind, catapultUp } = conditions;
  const reasons: NoGoReason[] = [];
  if (!catapultUp) reasons.push({ code: 'catapult_down' });
  if (grossWeight > aircraft.maxGrossWeight) {
    reasons.push({ code: 'over_max_gross_weight', grossWeight, maxGrossWeight: aircraft.maxGrossWeight });
  }
  if (wind.crosswind > aircraft.crosswindLimit) {
    reasons.push({ code: 'crosswind_over_limit', crosswind: wind.crosswind, side: wind.side, limit: aircraft.crosswindLimit });
  }

  const airspeed = minimumLaunchAirspeed(aircraft, grossWeight, conditions.densityRatio);
  if (airspeed.kind === 'outside_launch_table') {
    reasons.push({ code: 'outside_launch_table', grossWeight, lowest: airspeed.lowest, highest: airspeed.highest });
    return { go: false, reasons, minimumLaunchAirspeed: null, requiredWindOverDeck: null, margin: null };
  }
  const required = requiredWindOverDeck({
    minimumLaunchAirspeed: airspeed.airspeed,
    requiredExcess: aircraft.requiredExcess,
    endSpeed,
  });
  const margin = launchMargin(wind.headwind, required);
  if (margin < 0) reasons.push({ code: 'margin_negative', margin, headwind: wind.headwind, requiredWindOverDeck: required });
  return { go: reasons.length === 0, reasons, minimumLaunchAirspeed: airspeed.airspeed, requiredWindOverDeck: required, margin };
}
