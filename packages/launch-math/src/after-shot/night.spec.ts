import { daylight } from './night.js';

// US Naval Observatory, Astronomical Applications Department, complete sun data for Atlanta, Georgia
// (33.8 N, 84.4 W) on Sunday 6 September 2009, Eastern Daylight Time: sunrise 7:15 a.m., sunset 7:56 p.m.
// (as printed on the PyEphem "rise-set" page, which quotes the USNO table). In UTC: 11:15 and 23:56.
const atlanta = { latitude: 33.8, longitude: -84.4 };
const utc = (iso: string) => new Date(iso);
const minutesBetween = (a: Date | null, b: Date) => Math.abs((a?.getTime() ?? Infinity) - b.getTime()) / 60_000;

describe('night at sea', () => {
  it('rests on sunrise and sunset within a minute of the Naval Observatory’s table', () => {
    const times = daylight(atlanta, utc('2009-09-06T17:00:00Z')).sun;
    expect(minutesBetween(times.sunrise, utc('2009-09-06T11:15:00Z'))).toBeLessThan(1.5); // USNO: 7:15 a.m. EDT
    expect(minutesBetween(times.sunset, utc('2009-09-06T23:56:00Z'))).toBeLessThan(1.5); // USNO: 7:56 p.m. EDT
  });

  it.each([
    ['2009-09-06T17:00:00Z', false], // midday
    ['2009-09-07T00:24:00Z', false], // USNO sunset 23:56Z + 28 min: still day
    ['2009-09-07T00:28:00Z', true], // sunset + 32 min: night
    ['2009-09-07T06:00:00Z', true], // middle of the night
    ['2009-09-06T10:43:00Z', true], // USNO sunrise 11:15Z - 32 min: still night
    ['2009-09-06T10:47:00Z', false], // sunrise - 28 min: day
  ])('at Atlanta’s position on %s is night: %s', (at, night) => {
    expect(daylight(atlanta, utc(at)).night).toBe(night);
  });

  it('is night all day in the polar night and day all night under the midnight sun', () => {
    expect(daylight({ latitude: 80, longitude: 0 }, utc('2026-12-21T12:00:00Z')).night).toBe(true);
    expect(daylight({ latitude: 80, longitude: 0 }, utc('2026-06-21T00:00:00Z')).night).toBe(false);
  });
});
