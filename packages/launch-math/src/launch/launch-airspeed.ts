import { hotDayMinimumLaunchAirspeed } from '../atmosphere/isa.js';
import type { AircraftProfile } from '../aircraft/aircraft-profile.js';
import { requireFinite, requirePositive } from '../errors.js';
import { knots, pounds, type Knots, type Pounds } from '../units/units.js';
import { interpolateInTable } from './interpolation.js';

/** The type's minimum launch airspeed at a gross weight, or the table's range when the weight is outside it. */
export type MinimumLaunchAirspeed =
  | { readonly kind: 'airspeed'; readonly airspeed: Knots }
  | { readonly kind: 'outside_launch_table'; readonly lowest: Pounds; readonly highest: Pounds };

/**
 * The type's minimum launch airspeed (knots) at a gross weight (lb) by linear interpolation in its
 * table, corrected to true airspeed for the density ratio; never extrapolated.
 */
export function minimumLaunchAirspeed(
  aircraft: AircraftProfile,
  grossWeight: Pounds,
  densityRatio = 1,
): MinimumLaunchAirspeed {
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
