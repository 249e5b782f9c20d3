import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { watchWindAge, windAge, type WindAge } from './wind-age.js';

// A reading taken at 06:00:00 that the ship takes as current for 30 minutes (the demo ship's age).
const wind = { windReadAt: '2026-12-02T06:00:00.000Z', windStaleAt: '2026-12-02T06:30:00.000Z' };
const at = (clock: string) => new Date(`2026-12-02T${clock}.000Z`);

describe('windAge', () => {
  it('is current up to the age the ship allows and stale from it on', () => {
    expect(windAge(wind, at('06:29:59'))).toEqual({ stale: false, minutesOld: 29, maxAgeMin: 30 });
    expect(windAge(wind, at('06:30:00'))).toEqual({ stale: true, minutesOld: 30, maxAgeMin: 30 });
    expect(windAge(wind, at('07:05:30'))).toEqual({ stale: true, minutesOld: 65, maxAgeMin: 30 });
  });

  it('takes a reading stamped ahead of the device clock as new', () => {
    expect(windAge(wind, at('05:59:30')).minutesOld).toBe(0);
  });
});

describe('watchWindAge', () => {
  let reports: WindAge[];
  let stop: () => void;

  beforeEach(() => {
    vi.useFakeTimers();
    vi.setSystemTime(at('06:20:00'));
    reports = [];
    stop = watchWindAge(wind, (age) => reports.push(age));
  });

  afterEach(() => {
    stop();
    vi.useRealTimers();
  });

  const last = () => reports[reports.length - 1];

  it('reports the age at once, then turns stale by the clock alone', () => {
    expect(reports).toEqual([{ stale: false, minutesOld: 20, maxAgeMin: 30 }]);
    vi.advanceTimersByTime(10 * 60_000 - 1);
    expect(last()?.stale).toBe(false);
    vi.advanceTimersByTime(1);
    expect(last()).toEqual({ stale: true, minutesOld: 30, maxAgeMin: 30 });
  });

  it('counts the minutes once stale, one report a minute', () => {
    vi.advanceTimersByTime(10 * 60_000);
    const atStale = reports.length;
    vi.advanceTimersByTime(3 * 60_000);
    expect(reports.length - atStale).toBe(3);
    expect(last()).toEqual({ stale: true, minutesOld: 33, maxAgeMin: 30 });
  });

  it('reports nothing more once stopped', () => {
    stop();
    vi.advanceTimersByTime(60 * 60_000);
    expect(reports).toHaveLength(1);
  });
});
