import { shipTime, type WindReadingFields } from '@catline/contracts';
import {
  daylight,
  degrees,
  knots,
  LaunchMathInputError,
  NIGHT_MARGIN_MS,
  resolveWindReading,
  type WindReading,
} from '@catline/launch-math';
import type { Cycle } from '../database/entities/cycle.entity.js';
import { CyclesException } from './cycles.exception.js';

// The cycle's wind reading and its night: what the sky does to a cycle, worked out from what air
// operations enters.

type WindValues = Pick<
  Cycle,
  | 'trueWindFromDeg'
  | 'trueWindSpeedKt'
  | 'windGustFromDeg'
  | 'windGustKt'
  | 'windLullFromDeg'
  | 'windLullKt'
  | 'windReadAt'
>;

type WindRequest = WindReadingFields & { trueWindFromDeg?: number; trueWindSpeedKt?: number };

const given = (value: number | undefined): value is number => value !== undefined;

/** How far ahead of the server's clock a tablet's reading time may run and still be taken as now. */
const CLOCK_SKEW_MS = 60_000;

const invalid = (message: string) => new CyclesException('invalid_wind_reading', message);

/** The reading the request gives, in its own frame; null when the request gives no wind. */
function readingOf(request: WindRequest, current: Pick<Cycle, 'trueWindFromDeg' | 'trueWindSpeedKt'>) {
  const relative = given(request.relativeWindBearingDeg) || given(request.relativeWindSpeedKt);
  const trueWind = given(request.trueWindFromDeg) || given(request.trueWindSpeedKt);
  if (relative && trueWind)
    throw invalid('Give the wind either across the deck (relative) or as the true wind, not both at once.');
  if (!relative && !trueWind) {
    if (given(request.windGustKt) || given(request.windLullKt) || request.windReadAt !== undefined)
      throw invalid(
        'A gust, a lull or a reading time comes with the wind reading it belongs to: give the wind as well.',
      );
    return null;
  }
  if (relative) {
    if (!given(request.relativeWindBearingDeg) || !given(request.relativeWindSpeedKt))
      throw invalid('A wind across the deck needs both its bearing off the bow and its speed.');
    return { frame: 'relative' as const, bearing: request.relativeWindBearingDeg, speed: request.relativeWindSpeedKt };
  }
  return {
    frame: 'true' as const,
    from: request.trueWindFromDeg ?? current.trueWindFromDeg,
    speed: request.trueWindSpeedKt ?? current.trueWindSpeedKt,
  };
}

/**
 * A new wind reading from the request, as the cycle stores it (true wind, gust and lull), taken when it
 * says or else `now`;
 * null when the request gives no wind. A relative reading is turned into true wind with the ship's
 * course and speed as they stand after the request.
 */
export function windReading(
  request: WindRequest,
  cycle: Pick<Cycle, 'shipCourseDeg' | 'shipSpeedKt' | 'trueWindFromDeg' | 'trueWindSpeedKt'>,
  now: Date,
): WindValues | null {
  const steady = readingOf(request, cycle);
  if (!steady) return null;
  const readAt = request.windReadAt === undefined ? now : new Date(request.windReadAt);
  if (readAt.getTime() > now.getTime() + CLOCK_SKEW_MS)
    throw invalid('The wind reading cannot have been taken later than now.');
  const gust = request.windGustKt ?? steady.speed;
  const lull = request.windLullKt ?? steady.speed;
  if (lull > steady.speed) throw invalid(`The lull (${lull} kt) cannot be above the steady wind (${steady.speed} kt).`);
  if (gust < steady.speed) throw invalid(`The gust (${gust} kt) cannot be below the steady wind (${steady.speed} kt).`);
  const reading: WindReading =
    steady.frame === 'relative'
      ? {
          ...steady,
          bearing: degrees(steady.bearing),
          speed: knots(steady.speed),
          gust: knots(gust),
          lull: knots(lull),
        }
      : { ...steady, from: degrees(steady.from), speed: knots(steady.speed), gust: knots(gust), lull: knots(lull) };
  try {
    const wind = resolveWindReading({ course: degrees(cycle.shipCourseDeg), speed: knots(cycle.shipSpeedKt) }, reading);
    return {
      trueWindFromDeg: wind.true.from,
      trueWindSpeedKt: wind.true.speed,
      windGustFromDeg: wind.gust.from,
      windGustKt: wind.gust.speed,
      windLullFromDeg: wind.lull.from,
      windLullKt: wind.lull.speed,
      windReadAt: readAt,
    };
  } catch (error) {
    if (error instanceof LaunchMathInputError) throw invalid(`The wind reading does not add up: ${error.message}.`);
    throw error;
  }
}

type SkyCycle = Pick<Cycle, 'number' | 'plannedLaunchAt' | 'weatherCase' | 'night'> & {
  latitudeDeg: number | null;
  longitudeDeg: number | null;
};

const position = (cycle: SkyCycle) => `${cycle.latitudeDeg}°, ${cycle.longitudeDeg}°`;

/**
 * Whether the cycle is a night cycle: with a position, from the sun at the planned launch (night from half
 * an hour after sunset to half an hour before sunrise); without one, as entered. A night entered by hand
 * that the sun contradicts is refused, and so is a night cycle in case I or II.
 */
export function nightOf(cycle: SkyCycle, enteredNight: boolean | undefined, timeZone: string): boolean {
  const { latitudeDeg, longitudeDeg } = cycle;
  if ((latitudeDeg === null) !== (longitudeDeg === null))
    throw new CyclesException('night_by_position', 'Give the ship’s position as both latitude and longitude.');
  let night = enteredNight ?? cycle.night;
  let why = 'entered as night';
  if (latitudeDeg !== null && longitudeDeg !== null) {
    const { night: dark, sun } = daylight({ latitude: latitudeDeg, longitude: longitudeDeg }, cycle.plannedLaunchAt);
    const edges = [
      sun.sunset && `night from ${shipTime(new Date(sun.sunset.getTime() + NIGHT_MARGIN_MS), timeZone)}`,
      sun.sunrise && `to ${shipTime(new Date(sun.sunrise.getTime() - NIGHT_MARGIN_MS), timeZone)}`,
    ].filter(Boolean);
    why = `at ${position(cycle)} it is ${dark ? 'night' : 'day'} at ${shipTime(cycle.plannedLaunchAt, timeZone)}${edges.length ? ` (${edges.join(' ')})` : ''}`;
    if (enteredNight !== undefined && enteredNight !== dark)
      throw new CyclesException(
        'night_by_position',
        `Cycle ${cycle.number} cannot be set to ${enteredNight ? 'night' : 'day'}: ${why}.`,
      );
    night = dark;
  }
  if (night && cycle.weatherCase !== 'III')
    throw new CyclesException(
      'night_needs_case_iii',
      `Cycle ${cycle.number} launches at night (${why}); a night cycle flies Case III, not Case ${cycle.weatherCase}.`,
    );
  return night;
}
