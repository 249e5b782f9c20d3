import { LaunchMathInputError, requireFinite, requireNonNegative } from '../errors.js';
import type { Degrees, Knots } from '../units/units.js';
import {
  relativeWind,
  trueWindFromRelative,
  type RelativeWind,
  type ShipMotion,
  type TrueWind,
} from './wind-over-deck.js';

/** The spread of a wind about its steady speed, knots; both of the frame the reading was taken in. */
export interface WindSpread {
  readonly gust: Knots;
  readonly lull: Knots;
}

/** The anemometer's reading across the deck: direction off the bow (negative to port), steady speed, spread. */
export interface RelativeWindReading extends WindSpread {
  readonly frame: 'relative';
  readonly bearing: Degrees;
  readonly speed: Knots;
}

/** A true wind given by the ship's meteorology office (or worked out by hand), with its spread. */
export interface TrueWindReading extends WindSpread {
  readonly frame: 'true';
  readonly from: Degrees;
  readonly speed: Knots;
}

export type WindReading = RelativeWindReading | TrueWindReading;

/**
 * A reading in both frames. The gust and the lull are true winds of their own: across the deck a lull is
 * less wind from the same bearing, which over the ground can be a different direction.
 */
export interface ResolvedWind {
  readonly true: TrueWind;
  readonly relative: RelativeWind;
  readonly gust: TrueWind;
  readonly lull: TrueWind;
}

function requireSpread(reading: WindReading): void {
  requireNonNegative(reading.speed, 'Wind speed');
  requireNonNegative(reading.lull, 'Wind lull');
  requireFinite(reading.gust, 'Wind gust');
  if (reading.lull > reading.speed || reading.speed > reading.gust)
    throw new LaunchMathInputError(
      `A wind reading runs lull ≤ steady ≤ gust, got ${reading.lull}, ${reading.speed}, ${reading.gust} kt`,
    );
}

/**
 * The reading in both frames with the ship's course and speed. A true reading's gust and lull blow from
 * its steady direction; a relative reading's are read at its steady bearing off the bow.
 */
export function resolveWindReading(ship: ShipMotion, reading: WindReading): ResolvedWind {
  requireSpread(reading);
  const atSpeed = (speed: Knots): TrueWind =>
    reading.frame === 'true'
      ? { from: reading.from, speed }
      : trueWindFromRelative(ship, { bearing: reading.bearing, speed });
  const wind = atSpeed(reading.speed);
  return { true: wind, relative: relativeWind(ship, wind), gust: atSpeed(reading.gust), lull: atSpeed(reading.lull) };
}
