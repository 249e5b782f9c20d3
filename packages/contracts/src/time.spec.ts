import {
  fromShipLocalInput,
  shipClock,
  shipDateTime,
  shipIsoTime,
  shipLocalInput,
  shipTime,
  shipTimeRange,
  shipTimeZone,
} from './time.js';

// Check values from the IANA tz database (tzdata, files "asia" and "northamerica"), worked by hand:
// - Asia/Dubai keeps +04:00 all year since 1920 ("Zone Asia/Dubai ... 4:00 - +04").
// - America/New_York follows "Rule US 2007 max - Mar Sun>=8 2:00 1:00 D": in 2026 clocks go from
//   02:00 EST (-05:00) to 03:00 EDT (-04:00) on Sunday 8 March, i.e. at 07:00 UTC.
describe('ship time', () => {
  it('shows a UTC instant on a zone that keeps +04:00, with the zone named', () => {
    const instant = '2026-12-02T10:05:30.000Z';
    expect(shipTime(instant, 'Asia/Dubai')).toMatch(/^14:05 \S+$/);
    expect(shipClock(instant, 'Asia/Dubai')).toMatch(/^14:05:30 \S+$/);
    expect(shipDateTime(instant, 'Asia/Dubai')).toMatch(/^2026-12-02 14:05 \S+$/);
    expect(shipIsoTime(instant, 'Asia/Dubai')).toBe('2026-12-02T14:05:30+04:00');
    expect(shipTimeRange(instant, '2026-12-02T10:50:00.000Z', 'Asia/Dubai')).toMatch(/^14:05–14:50 \S+$/);
  });

  it('crosses a date line in the zone: 22:30 UTC is the next day at +04:00', () => {
    expect(shipDateTime('2026-12-31T22:30:00.000Z', 'Asia/Dubai')).toMatch(/^2027-01-01 02:30 /);
  });

  it('follows daylight saving across the 2026 spring change in New York', () => {
    const before = new Date('2026-03-08T06:59:59.000Z');
    const after = new Date('2026-03-08T07:00:00.000Z');
    expect(shipIsoTime(before, 'America/New_York')).toBe('2026-03-08T01:59:59-05:00');
    expect(shipIsoTime(after, 'America/New_York')).toBe('2026-03-08T03:00:00-04:00');
    const zoneOf = (instant: Date) => shipClock(instant, 'America/New_York').split(' ')[1];
    expect(zoneOf(before)).not.toBe(zoneOf(after));
  });

  it('names UTC and writes its offset as +00:00', () => {
    expect(shipClock('2026-12-02T10:05:30.000Z', 'UTC')).toBe('10:05:30 UTC');
    expect(shipIsoTime('2026-12-02T10:05:30.000Z', 'UTC')).toBe('2026-12-02T10:05:30+00:00');
  });

  it("reads a time typed on the ship's clock back to the instant, either side of a clock change", () => {
    expect(shipLocalInput('2026-12-02T10:05:30.000Z', 'Asia/Dubai')).toBe('2026-12-02T14:05');
    expect(fromShipLocalInput('2026-12-02T14:05', 'Asia/Dubai').toISOString()).toBe('2026-12-02T10:05:00.000Z');
    // New York, 2026: EST (-05:00) until 02:00 on 8 March, EDT (-04:00) from then.
    expect(fromShipLocalInput('2026-03-08T01:30', 'America/New_York').toISOString()).toBe('2026-03-08T06:30:00.000Z');
    expect(fromShipLocalInput('2026-03-08T03:30', 'America/New_York').toISOString()).toBe('2026-03-08T07:30:00.000Z');
    expect(fromShipLocalInput('2026-07-01T12:00', 'America/New_York').toISOString()).toBe('2026-07-01T16:00:00.000Z');
  });

  it("takes the profile's zone, else UTC", () => {
    expect(shipTimeZone({ timeZone: 'Pacific/Guam' })).toBe('Pacific/Guam');
    expect(shipTimeZone({})).toBe('UTC');
  });
});
