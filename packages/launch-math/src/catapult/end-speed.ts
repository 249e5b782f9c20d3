import { LaunchMathInputError, requireNonNegative, requirePositive } from '../errors.js';
import {
  joules,
  metresPerSecond,
  metresPerSecondSquared,
  type Joules,
  type Kilograms,
  type Metres,
  type MetresPerSecond,
  type MetresPerSecondSquared,
  type Newtons,
  type Seconds,
} from '../units/units.js';

/** Where a catapult sits on the deck. */
export type CatapultPosition = 'bow' | 'waist';

/**
 * A catapult's stroke and energy range. Settings are the whole numbers 0..`maxSetting`; the energy
 * delivered to the aircraft grows linearly with the setting, from `energyAtMinSetting` at 0 to
 * `energyAtMaxSetting` at `maxSetting` (both in joules). A linear map keeps the inverse exact and
 * needs only two figures from the ship's launch data.
 */
export interface CatapultEnergyProfile {
  /** Length of the power stroke, metres. */
  readonly strokeLength: Metres;
  /** Energy delivered at setting 0, joules. */
  readonly energyAtMinSetting: Joules;
  /** Energy delivered at `maxSetting`, joules. */
  readonly energyAtMaxSetting: Joules;
  /** Highest setting, a whole number of at least 1. */
  readonly maxSetting: number;
}

/** Forces and masses of one shot, SI units. */
export interface StrokeInput {
  /** Engine thrust during the stroke, newtons. */
  readonly thrust: Newtons;
  /** Power stroke length, metres. */
  readonly stroke: Metres;
  /** Aircraft mass (gross weight), kilograms. */
  readonly mass: Kilograms;
}

/** The lowest setting reaching a wanted end speed, or why there is none. */
export type SettingSearch =
  | { readonly kind: 'setting'; readonly setting: number; readonly endSpeed: MetresPerSecond }
  | { readonly kind: 'out_of_range'; readonly maxEndSpeed: MetresPerSecond };

function requireEnergyProfile(catapult: CatapultEnergyProfile): void {
  requirePositive(catapult.strokeLength, 'Catapult stroke length (m)');
  requireNonNegative(catapult.energyAtMinSetting, 'Catapult energy at setting 0 (J)');
  if (!(catapult.energyAtMaxSetting > catapult.energyAtMinSetting)) {
    throw new LaunchMathInputError('Catapult energy at the highest setting must be above its energy at setting 0');
  }
  if (!Number.isInteger(catapult.maxSetting) || catapult.maxSetting < 1) {
    throw new LaunchMathInputError(
      `Catapult highest setting must be a whole number of at least 1, got ${catapult.maxSetting}`,
    );
  }
}

function requireStroke({ thrust, stroke, mass }: StrokeInput): void {
  requireNonNegative(thrust, 'Thrust (N)');
  requirePositive(stroke, 'Stroke (m)');
  requirePositive(mass, 'Mass (kg)');
}

/** Energy (J) a catapult delivers at a whole-number `setting` from 0 to its `maxSetting`. */
export function catapultEnergyAtSetting(catapult: CatapultEnergyProfile, setting: number): Joules {
  requireEnergyProfile(catapult);
  if (!Number.isInteger(setting) || setting < 0 || setting > catapult.maxSetting) {
    throw new LaunchMathInputError(
      `Catapult setting must be a whole number from 0 to ${catapult.maxSetting}, got ${setting}`,
    );
  }
  const span = catapult.energyAtMaxSetting - catapult.energyAtMinSetting;
  return joules(catapult.energyAtMinSetting + (span * setting) / catapult.maxSetting);
}

/**
 * End speed (m/s) by work and energy over the stroke: the catapult's energy plus thrust times
 * stroke becomes kinetic energy, v = sqrt(2 (E + T s) / m).
 */
export function endSpeed(input: StrokeInput & { readonly catapultEnergy: Joules }): MetresPerSecond {
  requireStroke(input);
  requireNonNegative(input.catapultEnergy, 'Catapult energy (J)');
  const work = input.catapultEnergy + input.thrust * input.stroke;
  return metresPerSecond(Math.sqrt((2 * work) / input.mass));
}

/**
 * Catapult energy (J) needed for an end speed: E = m v^2 / 2 - T s. Zero or below means thrust alone
 * would do it.
 */
export function catapultEnergyForEndSpeed(input: StrokeInput & { readonly endSpeed: MetresPerSecond }): Joules {
  requireStroke(input);
  requireNonNegative(input.endSpeed, 'End speed (m/s)');
  return joules((input.mass * input.endSpeed ** 2) / 2 - input.thrust * input.stroke);
}

/** Mean acceleration (m/s2) over a stroke from rest to `speed`: a = v^2 / (2 s). */
export function meanStrokeAcceleration(speed: MetresPerSecond, stroke: Metres): MetresPerSecondSquared {
  requirePositive(stroke, 'Stroke (m)');
  return metresPerSecondSquared(speed ** 2 / (2 * stroke));
}

/**
 * Mean acceleration (m/s2) over a stroke (m) run from rest in a measured stroke time (s): from
 * s = a t^2 / 2, a = 2 s / t^2. With the stroke time from a shot record this checks the energy model.
 */
export function meanStrokeAccelerationFromTime(stroke: Metres, time: Seconds): MetresPerSecondSquared {
  requirePositive(stroke, 'Stroke (m)');
  requirePositive(time, 'Stroke time (s)');
  return metresPerSecondSquared((2 * stroke) / time ** 2);
}

/** End speed (m/s) that a stroke (m) run from rest in `time` (s) at constant acceleration implies: v = a t = 2 s / t. */
export function endSpeedFromStrokeTime(stroke: Metres, time: Seconds): MetresPerSecond {
  return metresPerSecond(meanStrokeAccelerationFromTime(stroke, time) * time);
}

/**
 * The lowest setting whose end speed reaches `wanted` (m/s) for this thrust and mass, over the
 * catapult's own stroke; `out_of_range` with the best end speed when even the highest setting falls short.
 */
export function lowestSettingForEndSpeed(input: {
  readonly catapult: CatapultEnergyProfile;
  readonly thrust: Newtons;
  readonly mass: Kilograms;
  readonly wanted: MetresPerSecond;
}): SettingSearch {
  const { catapult, thrust, mass, wanted } = input;
  requireEnergyProfile(catapult);
  const speedAt = (setting: number): MetresPerSecond =>
    endSpeed({
      catapultEnergy: catapultEnergyAtSetting(catapult, setting),
      thrust,
      stroke: catapult.strokeLength,
      mass,
    });
  const maxEndSpeed = speedAt(catapult.maxSetting);
  if (maxEndSpeed < wanted) return { kind: 'out_of_range', maxEndSpeed };

  const needed = catapultEnergyForEndSpeed({ endSpeed: wanted, thrust, stroke: catapult.strokeLength, mass });
  const span = catapult.energyAtMaxSetting - catapult.energyAtMinSetting;
  const estimate = Math.ceil(((needed - catapult.energyAtMinSetting) / span) * catapult.maxSetting);
  let setting = Math.min(catapult.maxSetting, Math.max(0, estimate));
  // The closed form can land one step off through rounding; settle it against the forward formula.
  while (setting > 0 && speedAt(setting - 1) >= wanted) setting -= 1;
  while (speedAt(setting) < wanted) setting += 1;
  return { kind: 'setting', setting, endSpeed: speedAt(setting) };
}
