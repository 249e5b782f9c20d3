import { getPosition, getTimes } from 'suncalc';
import { requireFinite } from '../errors.js';

/** Where the ship is, degrees: north and east positive. */
export interface SeaPosition {
  readonly latitude: number;
  readonly longitude: number;
}

/** Night starts this long after sunset and ends this long before sunrise. */
export const NIGHT_MARGIN_MS = 30 * 60_000;

const DAY_MS = 86_400_000;

/** The sun's rise and set on the day around an instant; null where it does not rise or set that day. */
export interface SunDay {
  readonly sunrise: Date | null;
  readonly sunset: Date | null;
}

export interface Daylight {
  readonly night: boolean;
  /** The sunrise and sunset nearest the instant, for the sentence that explains the verdict. */
  readonly sun: SunDay;
}

function sunDay(at: Date, position: SeaPosition): SunDay {
  const times = getTimes(at, position.latitude, position.longitude);
  return { sunrise: times.sunrise, sunset: times.sunset };
}

/**
 * Night or day at a position and instant: night runs from half an hour after sunset to half an hour
 * before sunrise. The days either side are looked at too, since the one suncalc gives for an instant
 * can end before it. Where the sun neither rises nor sets, it is night when the sun is below the horizon.
 */
export function daylight(position: SeaPosition, at: Date): Daylight {
  requireFinite(position.latitude, 'Latitude');
  requireFinite(position.longitude, 'Longitude');
  requireFinite(at.getTime(), 'Instant');
  const days = [-1, 0, 1].map((offset) => sunDay(new Date(at.getTime() + offset * DAY_MS), position));
  const today = days[1];
  if (days.every((day) => day.sunrise === null || day.sunset === null)) {
    const { altitude } = getPosition(at, position.latitude, position.longitude);
    return { night: altitude < 0, sun: today };
  }
  const time = at.getTime();
  const light = days.some(
    ({ sunrise, sunset }) =>
      sunrise !== null &&
      sunset !== null &&
      time >= sunrise.getTime() - NIGHT_MARGIN_MS &&
      time <= sunset.getTime() + NIGHT_MARGIN_MS,
  );
  return { night: !light, sun: today };
}
