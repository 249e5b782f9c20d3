// Times as the ship keeps them: every screen, mail and export shows an instant in the ship's zone and
// says which zone it is (Intl, so no zone table of our own).

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string, withDate: boolean): Intl.DateTimeFormat {
  const key = `${timeZone}|${withDate}`;
  let format = formatters.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', {
      timeZone,
      hour: '2-digit',
      minute: '2-digit',
      hourCycle: 'h23',
      timeZoneName: 'short',
      ...(withDate ? { year: 'numeric', month: '2-digit', day: '2-digit' } : {}),
    });
    formatters.set(key, format);
  }
  return format;
}

const parts = (instant: Date | string, timeZone: string, withDate: boolean) => {
  const found = Object.fromEntries(
    formatter(timeZone, withDate)
      .formatToParts(typeof instant === 'string' ? new Date(instant) : instant)
      .map((part) => [part.type, part.value]),
  );
  return found as Record<Intl.DateTimeFormatPartTypes, string>;
};

/** "14:05 GMT+10": the ship's clock time with its zone. */
export function shipTime(instant: Date | string, timeZone: string): string {
  const { hour, minute, timeZoneName } = parts(instant, timeZone, false);
  return `${hour}:${minute} ${timeZoneName}`;
}

/** "2026-12-02 14:05 GMT+10": date and time in the ship's zone, with the zone. */
export function shipDateTime(instant: Date | string, timeZone: string): string {
  const { year, month, day, hour, minute, timeZoneName } = parts(instant, timeZone, true);
  return `${year}-${month}-${day} ${hour}:${minute} ${timeZoneName}`;
}

/** The zone's name as shown beside times, e.g. "GMT+10" (or "UTC"), at a given instant. */
export const zoneName = (timeZone: string, at: Date | string = new Date()): string =>
  parts(at, timeZone, false).timeZoneName;

/** True for a zone name Intl knows ("Pacific/Guam", "UTC"). */
export function isKnownTimeZone(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone });
    return true;
  } catch {
    return false;
  }
}
