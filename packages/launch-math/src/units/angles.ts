import { degrees, type Degrees } from './units.js';

const FULL_TURN = 360;

/** Degrees to radians, for `Math.sin` and friends. */
export const toRadians = (angle: Degrees): number => (angle * Math.PI) / 180;

/** Radians to degrees. */
export const fromRadians = (radians: number): Degrees => degrees((radians * 180) / Math.PI);

/** A bearing folded into [0, 360) degrees. */
export function normaliseBearing(angle: Degrees): Degrees {
  const folded = angle % FULL_TURN;
  return degrees(folded < 0 ? folded + FULL_TURN : folded + 0);
}

/** An angle folded into (-180, 180] degrees: negative to port (anticlockwise), positive to starboard. */
export function normaliseRelative(angle: Degrees): Degrees {
  const bearing = normaliseBearing(angle);
  return degrees(bearing > FULL_TURN / 2 ? bearing - FULL_TURN : bearing);
}

/** The smallest angle between two bearings, in [0, 180] degrees. */
export const angularDistance = (a: Degrees, b: Degrees): Degrees =>
  degrees(Math.abs(normaliseRelative(degrees(a - b))));
