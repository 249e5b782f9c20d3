import type { AircraftProfile } from '../aircraft/aircraft-profile.js';
import {
  catapultEnergyAtSetting,
  endSpeed,
  lowestSettingForEndSpeed,
  type CatapultEnergyProfile,
} from '../catapult/end-speed.js';
import {
  knotsToMetresPerSecond,
  metresPerSecondToKnots,
  poundsForceToNewtons,
  poundsToKilograms,
  type Knots,
  type Pounds,
} from '../units/units.js';

/** The lowest catapult setting for a wanted end speed in knots, or the best the catapult can do. */
export type LaunchSettingSearch =
  | { readonly kind: 'setting'; readonly setting: number; readonly endSpeed: Knots }
  | { readonly kind: 'out_of_range'; readonly maxEndSpeed: Knots };

/** End speed (knots) of this type at a gross weight (lb) off this catapult at `setting`, with the type's thrust. */
export function launchEndSpeed(input: {
  readonly aircraft: AircraftProfile;
  readonly catapult: CatapultEnergyProfile;
  readonly setting: number;
  readonly grossWeight: Pounds;
}): Knots {
  return metresPerSecondToKnots(
    endSpeed({
      catapultEnergy: catapultEnergyAtSetting(input.catapult, input.setting),
      thrust: poundsForceToNewtons(input.aircraft.thrust),
      stroke: input.catapult.strokeLength,
      mass: poundsToKilograms(input.grossWeight),
    }),
  );
}

/** The lowest setting of this catapult giving this type at a gross weight (lb) at least `wanted` knots end speed. */
export function lowestLaunchSetting(input: {
  readonly aircraft: AircraftProfile;
  readonly catapult: CatapultEnergyProfile;
  readonly grossWeight: Pounds;
  readonly wanted: Knots;
}): LaunchSettingSearch {
  const found = lowestSettingForEndSpeed({
    catapult: input.catapult,
    thrust: poundsForceToNewtons(input.aircraft.thrust),
    mass: poundsToKilograms(input.grossWeight),
    wanted: knotsToMetresPerSecond(input.wanted),
  });
  return found.kind === 'setting'
    ? { kind: 'setting', setting: found.setting, endSpeed: metresPerSecondToKnots(found.endSpeed) }
    : { kind: 'out_of_range', maxEndSpeed: metresPerSecondToKnots(found.maxEndSpeed) };
}
