import { dayRange } from './day-range.js';
import { ReportsException } from './reports.exception.js';

describe('dayRange', () => {
  it('runs from the first instant of the first day to the first instant after the last day (UTC)', () => {
    const range = dayRange('2027-01-30', '2027-02-01');
    expect(range.start.toISOString()).toBe('2027-01-30T00:00:00.000Z');
    expect(range.end.toISOString()).toBe('2027-02-02T00:00:00.000Z');
  });

  it('accepts a single day', () => {
    const range = dayRange('2028-02-29', '2028-02-29');
    // 2028 is a leap year (Gregorian rule: divisible by 4, not by 100 unless by 400; from memory).
    expect(range.end.getTime() - range.start.getTime()).toBe(86_400_000);
  });

  it('refuses a day the calendar does not have, with a readable 400', () => {
    for (const bad of ['2027-02-29', '2027-02-30', '2027-13-01', '2027-00-10', '2027-04-31']) {
      let refusal: unknown;
      try {
        dayRange(bad, '2027-12-31');
      } catch (error) {
        refusal = error;
      }
      expect(refusal).toBeInstanceOf(ReportsException);
      expect((refusal as ReportsException).getStatus()).toBe(400);
      expect((refusal as ReportsException).message).toBe(
        `from: ${bad} is not a calendar day; write it as YYYY-MM-DD, e.g. 2027-01-31.`,
      );
    }
  });

  it('refuses a range that ends before it starts', () => {
    expect(() => dayRange('2027-03-02', '2027-03-01')).toThrow(
      'The range ends before it starts: to (2027-03-01) is earlier than from (2027-03-02).',
    );
  });

  it('refuses text that is not YYYY-MM-DD', () => {
    expect(() => dayRange('2027-01-01', '2027-1-5')).toThrow('to: 2027-1-5 is not a calendar day');
  });
});
