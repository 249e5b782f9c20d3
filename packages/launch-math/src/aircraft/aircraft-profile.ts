import { LaunchMathInputError, requirePositive } from '../errors.js';
import { pounds, type Degrees, type Knots, type Pounds, type PoundsForce } from '../units/units.js';

/** Take-off trim for gross weights from `fromGrossWeight` up to the next band. */
export interface TrimBand {
  /** Lowest (rounded) gross weight of the band, lb. */
  readonly fromGrossWeight: Pounds;
  /** Take-off trim setting, degrees. */
  readonly trim: Degrees;
}

/** One row of the type's minimum launch airspeed table. */
export interface LaunchAirspeedPoint {
  /** Gross weight, lb. */
  readonly grossWeight: Pounds;
  /** Minimum launch airspeed at that weight, knots equivalent airspeed. */
  readonly airspeed: Knots;
}

/** An aircraft type's launch data and rules, entered by the user: data, not code. */
export interface AircraftProfile {
  /** Highest gross weight the type may launch at, lb. */
  readonly maxGrossWeight: Pounds;
  /** Highest crosswind component the type may launch in, knots. */
  readonly crosswindLimit: Knots;
  /** Engine thrust during the catapult stroke, lbf. */
  readonly thrust: PoundsForce;
  /** Airspeed required above the minimum launch airspeed, knots. */
  readonly requiredExcess: Knots;
  /** Minimum launch airspeed by gross weight, ascending weights; never extrapolated. */
  readonly minimumLaunchAirspeed: readonly LaunchAirspeedPoint[];
  /** Trim bands in ascending order of `fromGrossWeight`. */
  readonly trimBands: readonly TrimBand[];
  /** The gross weight is rounded to the nearest multiple of this (lb) before the trim band is chosen. */
  readonly trimWeightStep: Pounds;
  /** Afterburner is required at or above this gross weight (lb); null when never. */
  readonly afterburnerFromGrossWeight: Pounds | null;
}

/** Gross weight rounded to the nearest `step` lb, halves upward. */
export function roundGrossWeight(grossWeight: Pounds, step: Pounds): Pounds {
  requirePositive(step, 'Weight rounding step (lb)');
  return pounds(Math.floor(grossWeight / step + 0.5) * step);
}

/**
 * Take-off trim (degrees) for a gross weight: the band holding the weight rounded to the profile's
 * step; null when the weight is below the first band.
 */
export function takeOffTrim(profile: AircraftProfile, grossWeight: Pounds): Degrees | null {
  requirePositive(grossWeight, 'Gross weight (lb)');
  const rounded = roundGrossWeight(grossWeight, profile.trimWeightStep);
  let trim: Degrees | null = null;
  let previous = -Infinity;
  for (const band of profile.trimBands) {
    if (!(band.fromGrossWeight > previous)) {
      throw new LaunchMathInputError('Trim bands must be in strictly ascending order of gross weight');
    }
    previous = band.fromGrossWeight;
    if (rounded >= band.fromGrossWeight) trim = band.trim;
  }
  return trim;
}

/** Whether the type needs afterburner for the launch at this gross weight (lb, unrounded). */
export function afterburnerRequired(profile: AircraftProfile, grossWeight: Pounds): boolean {
  requirePositive(grossWeight, 'Gross weight (lb)');
  return profile.afterburnerFromGrossWeight !== null && grossWeight >= profile.afterburnerFromGrossWeight;
}
