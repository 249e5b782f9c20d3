import { DEFAULT_SHIP_TIME_ZONE, type ShipProfile } from './fleet.js';

// Times as the ship keeps them: every screen, mail and export shows an instant in the ship's zone and
// says which zone it is (Intl, so no zone table of our own).

type Shape = 'time' | 'seconds' | 'date' | 'iso';

const SHAPES: Record<Shape, Intl.DateTimeFormatOptions> = {
  time: { hour: '2-digit', minute: '2-digit', timeZoneName: 'short' },
  seconds: { hour: '2-digit', minute: '2-digit', second: '2-digit', timeZoneName: 'short' },
  date: {
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    timeZoneName: 'short',
  },
  // "GMT+04:00" (or "GMT" at zero), the offset an ISO 8601 time carries.
  iso: {
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    second: '2-digit',
    timeZoneName: 'longOffset',
  },
};

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string, shape: Shape): Intl.DateTimeFormat {
  const key = `${timeZone}|${shape}`;
  let format = formatters.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', { timeZone, hourCycle: 'h23', ...SHAPES[shape] });
    formatters.set(key, format);
  }
  return format;
}

const parts = (instant: Date | string, timeZone: string, shape: Shape) => {
  const found = Object.fromEntries(
    formatter(timeZone, shape)
      .formatToParts(typeof instant === 'string' ? new Date(instant) : instant)
      .map((part) => [part.type, part.value]),
  );
  return found as Record<Intl.DateTimeFormatPartTypes, string>;
};

/** The zone the ship keeps: its profile's, else the default. */
export const shipTimeZone = (profile: Pick<ShipProfile, 'timeZone'>): string =>
  profile.timeZone ?? DEFAULT_SHIP_TIME_ZONE;

/** "14:05 GMT+10": the ship's clock time with its zone. */
export function shipTime(instant: Date | string, timeZone: string): string {
  const { hour, minute, timeZoneName } = parts(instant, timeZone, 'time');
  return `${hour}:${minute} ${timeZoneName}`;
}

/** "14:05–14:50 GMT+10": two times of the ship's clock, the zone named once (the later time's). */
export function shipTimeRange(from: Date | string, to: Date | string, timeZone: string): string {
  const start = parts(from, timeZone, 'time');
  return `${start.hour}:${start.minute}–${shipTime(to, timeZone)}`;
}

/** "14:05:30 GMT+10": the ship's clock time to the second, with its zone. */
export function shipClock(instant: Date | string, timeZone: string): string {
  const { hour, minute, second, timeZoneName } = parts(instant, timeZone, 'seconds');
  return `${hour}:${minute}:${second} ${timeZoneName}`;
}

/** "2026-12-02 14:05 GMT+10": date and time in the ship's zone, with the zone. */
export function shipDateTime(instant: Date | string, timeZone: string): string {
  const { year, month, day, hour, minute, timeZoneName } = parts(instant, timeZone, 'date');
  return `${year}-${month}-${day} ${hour}:${minute} ${timeZoneName}`;
}

/**
 * "2026-12-02T14:05:30+10:00": ISO 8601 in the ship's zone for exports, which a spreadsheet reads back
 * to the same instant and a person reads as the ship's clock.
 */
export function shipIsoTime(instant: Date | string, timeZone: string): string {
  const { year, month, day, hour, minute, second, timeZoneName } = parts(instant, timeZone, 'iso');
  const offset = timeZoneName === 'GMT' ? '+00:00' : timeZoneName.slice(3);
  return `${year}-${month}-${day}T${hour}:${minute}:${second}${offset}`;
}

/** "2026-12-02T14:05": the ship's clock as a date-and-time field (`datetime-local`) holds it. */
export const shipLocalInput = (instant: Date | string, timeZone: string): string =>
  shipIsoTime(instant, timeZone).slice(0, 16);

/** The zone's offset from UTC at an instant, ms (east positive). */
const offsetMs = (instant: number, timeZone: string): number =>
  Date.parse(`${shipIsoTime(new Date(instant), timeZone).slice(0, 19)}Z`) - Math.floor(instant / 1000) * 1000;

/**
 * The instant a date and time typed on the ship's clock ("2026-12-02T14:05") stands for. The offset is
 * read at a first guess and again at the result, so a time just after a clock change lands right; a time
 * the change skips reads as the same minutes after it.
 */
export function fromShipLocalInput(local: string, timeZone: string): Date {
  const asUtc = Date.parse(`${local}Z`);
  const guess = asUtc - offsetMs(asUtc, timeZone);
  return new Date(asUtc - offsetMs(guess, timeZone));
}

/** The zone's name as shown beside times, e.g. "GMT+10" (or "UTC"), at a given instant. */
export const zoneName = (timeZone: string, at: Date | string = new Date()): string =>
  parts(at, timeZone, 'time').timeZoneName;

/** True for a zone name Intl knows ("Pacific/Guam", "UTC"). */
export function isKnownTimeZone(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone });
    return true;
  } catch {
    return false;
  }
}
