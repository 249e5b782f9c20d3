import { requireNonNegative } from '../errors.js';
import { feet, nauticalMiles, type Feet, type NauticalMiles } from '../units/units.js';

/** Weather case of the launch: I (clear), II (in between), III (instrument conditions or night). */
export type WeatherCase = 'I' | 'II' | 'III';

/** Lowest ceiling and visibility for each of cases I and II; below case II it is case III. */
export const WEATHER_CASE_MINIMUMS = {
  I: { ceiling: feet(3000), visibility: nauticalMiles(5) },
  II: { ceiling: feet(1000), visibility: nauticalMiles(5) },
} as const;

/** What the weather case is decided from. */
export interface WeatherObservation {
  /** Ceiling, feet; null when there is no ceiling. */
  readonly ceiling: Feet | null;
  /** Visibility, nautical miles. */
  readonly visibility: NauticalMiles;
  readonly night: boolean;
}

/** The weather case from ceiling, visibility and time of day; night is always case III. */
export function weatherCase(observation: WeatherObservation): WeatherCase {
  const { ceiling, visibility, night } = observation;
  requireNonNegative(visibility, 'Visibility (nmi)');
  if (ceiling !== null) requireNonNegative(ceiling, 'Ceiling (ft)');
  if (night) return 'III';
  const meets = (minimums: { readonly ceiling: Feet; readonly visibility: NauticalMiles }): boolean =>
    (ceiling === null || ceiling >= minimums.ceiling) && visibility >= minimums.visibility;
  if (meets(WEATHER_CASE_MINIMUMS.I)) return 'I';
  if (meets(WEATHER_CASE_MINIMUMS.II)) return 'II';
  return 'III';
}
