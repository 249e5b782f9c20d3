import { requireFinite, requireNonNegative } from '../errors.js';
import { fromRadians, normaliseBearing, normaliseRelative, toRadians } from '../units/angles.js';
import { degrees, knots, type Degrees, type Knots } from '../units/units.js';

/** The ship's motion over the ground. Its heading is taken to be its course (no leeway or set). */
export interface ShipMotion {
  /** Course, degrees true. */
  readonly course: Degrees;
  /** Speed, knots. */
  readonly speed: Knots;
}

/** Wind over the ground, meteorological convention. */
export interface TrueWind {
  /** Direction the wind blows from, degrees true in (0, 360]; 0 only when calm. */
  readonly from: Degrees;
  /** Speed, knots. */
  readonly speed: Knots;
}

/** Wind felt across the moving deck. */
export interface RelativeWind {
  /** Direction it blows from, degrees true in (0, 360]; 0 only when calm. */
  readonly from: Degrees;
  /** Direction it blows from relative to the bow, degrees in (-180, 180]: negative to port. */
  readonly bearing: Degrees;
  /** Speed, knots. */
  readonly speed: Knots;
}

/** Side of the deck the crosswind comes from. */
export type CrosswindSide = 'port' | 'starboard' | 'none';

/** Wind resolved along and across an axis (a catapult or a runway). */
export interface WindComponents {
  /** Along the axis, knots: positive from ahead, negative is a tailwind. */
  readonly headwind: Knots;
  /** Across the axis, knots, never negative; its side is in `side`. */
  readonly crosswind: Knots;
  readonly side: CrosswindSide;
}

// Below this a speed or component is rounding noise from the trigonometry, not wind.
const CALM_KNOTS = 1e-9;

interface Vector {
  readonly east: number;
  readonly north: number;
}

const vectorFrom = (bearing: Degrees, length: number): Vector => ({
  east: length * Math.sin(toRadians(bearing)),
  north: length * Math.cos(toRadians(bearing)),
});

/** The (0, 360] "from" direction of a vector pointing at where the wind comes from; 0 when calm. */
function meteorologicalDirection(vector: Vector): Degrees {
  if (Math.hypot(vector.east, vector.north) < CALM_KNOTS) return degrees(0);
  const bearing = normaliseBearing(fromRadians(Math.atan2(vector.east, vector.north)));
  return degrees(bearing === 0 ? 360 : bearing);
}

function requireMotion(ship: ShipMotion): void {
  requireFinite(ship.course, 'Ship course');
  requireNonNegative(ship.speed, 'Ship speed');
}

/**
 * Relative wind across the deck from the ship's course and speed and the true wind. The ship's own
 * motion makes a wind from dead ahead at its speed; the felt wind is that plus the true wind.
 */
export function relativeWind(ship: ShipMotion, wind: TrueWind): RelativeWind {
  requireMotion(ship);
  requireFinite(wind.from, 'True wind direction');
  requireNonNegative(wind.speed, 'True wind speed');
  const motion = vectorFrom(ship.course, ship.speed);
  const trueFrom = vectorFrom(wind.from, wind.speed);
  const felt = { east: motion.east + trueFrom.east, north: motion.north + trueFrom.north };
  const speed = Math.hypot(felt.east, felt.north);
  if (speed < CALM_KNOTS) return { from: degrees(0), bearing: degrees(0), speed: knots(0) };
  const from = meteorologicalDirection(felt);
  return { from, bearing: normaliseRelative(degrees(from - ship.course)), speed: knots(speed) };
}

/** True wind from the relative wind measured on deck: the inverse of {@link relativeWind}. */
export function trueWindFromRelative(
  ship: ShipMotion,
  relative: { readonly bearing: Degrees; readonly speed: Knots },
): TrueWind {
  requireMotion(ship);
  requireFinite(relative.bearing, 'Relative wind bearing');
  requireNonNegative(relative.speed, 'Relative wind speed');
  const felt = vectorFrom(degrees(ship.course + relative.bearing), relative.speed);
  const motion = vectorFrom(ship.course, ship.speed);
  const trueFrom = { east: felt.east - motion.east, north: felt.north - motion.north };
  const speed = Math.hypot(trueFrom.east, trueFrom.north);
  return speed < CALM_KNOTS
    ? { from: degrees(0), speed: knots(0) }
    : { from: meteorologicalDirection(trueFrom), speed: knots(speed) };
}

/** Components of a wind `speed` coming from `offAxis` degrees off the axis (positive from the right). */
function componentsOffAxis(offAxis: Degrees, speed: Knots): WindComponents {
  const along = speed * Math.cos(toRadians(offAxis));
  const across = speed * Math.sin(toRadians(offAxis));
  if (Math.abs(across) < CALM_KNOTS) return { headwind: knots(along), crosswind: knots(0), side: 'none' };
  return { headwind: knots(along), crosswind: knots(Math.abs(across)), side: across > 0 ? 'starboard' : 'port' };
}

/**
 * Headwind and crosswind along an axis pointing at `axisHeading` (degrees true) for a wind from
 * `windFrom` (degrees true) at `speed` knots: headwind = V cos a, crosswind = V sin a. A crosswind
 * from the right of the axis is reported as `starboard`.
 */
export function windComponents(axisHeading: Degrees, windFrom: Degrees, speed: Knots): WindComponents {
  requireFinite(axisHeading, 'Axis heading');
  requireFinite(windFrom, 'Wind direction');
  requireNonNegative(speed, 'Wind speed');
  return componentsOffAxis(degrees(windFrom - axisHeading), speed);
}

/**
 * Headwind and crosswind along a catapult whose axis is set `catapultAngle` degrees from the ship's
 * heading (negative = angled to port), for the relative wind across the deck.
 */
export function catapultWind(relative: RelativeWind, catapultAngle: Degrees): WindComponents {
  requireFinite(catapultAngle, 'Catapult angle');
  return componentsOffAxis(degrees(relative.bearing - catapultAngle), relative.speed);
}
