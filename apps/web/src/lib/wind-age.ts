import { useEffect, useState } from 'react';
import { isWindReadingStale, type CycleView } from '@catline/contracts';

const MINUTE_MS = 60_000;

type WindTimes = Pick<CycleView, 'windReadAt' | 'windStaleAt'>;

/** How old the wind reading in force is, in whole minutes, and whether the ship still takes it as current. */
export interface WindAge {
  stale: boolean;
  minutesOld: number;
  /** The age the ship allows a reading, in whole minutes. */
  maxAgeMin: number;
}

export function windAge(wind: WindTimes, now: Date): WindAge {
  const readAt = Date.parse(wind.windReadAt);
  return {
    stale: isWindReadingStale(wind, now),
    // A reading stamped a moment ahead of this device's clock is new, not negative minutes old.
    minutesOld: Math.max(0, Math.floor((now.getTime() - readAt) / MINUTE_MS)),
    maxAgeMin: Math.round((Date.parse(wind.windStaleAt) - readAt) / MINUTE_MS),
  };
}

/** The next moment the age as shown changes: the turn to stale, then each further whole minute. */
function nextChangeAt(wind: WindTimes, now: Date): number {
  if (!isWindReadingStale(wind, now)) return Date.parse(wind.windStaleAt);
  const readAt = Date.parse(wind.windReadAt);
  return readAt + (windAge(wind, now).minutesOld + 1) * MINUTE_MS;
}

/**
 * Reports the reading's age now and again at each change, without any message from the server: a reading
 * goes stale by the clock alone. Returns the function that stops the watch.
 */
export function watchWindAge(wind: WindTimes, report: (age: WindAge) => void): () => void {
  let timer: ReturnType<typeof setTimeout>;
  const tick = () => {
    const now = new Date();
    report(windAge(wind, now));
    // Re-read the clock on every tick: a timer of a tablet put to sleep fires late.
    timer = setTimeout(tick, Math.max(0, nextChangeAt(wind, now) - now.getTime()));
  };
  tick();
  return () => clearTimeout(timer);
}

/** The wind reading's age, kept current by the clock from the turn to stale on (before it, only `stale` matters). */
export function useWindAge(windReadAt: string, windStaleAt: string): WindAge {
  const [age, setAge] = useState(() => windAge({ windReadAt, windStaleAt }, new Date()));
  useEffect(() => watchWindAge({ windReadAt, windStaleAt }, setAge), [windReadAt, windStaleAt]);
  return age;
}
