import { describe, expect, it } from 'vitest';
import { auditInstants } from './audit-range-model.js';

describe('auditInstants', () => {
  it('turns whole days on the ship clock into the instants they start and end at', () => {
    // Guam keeps UTC+10 all year, no daylight saving (IANA tz database, Pacific/Guam).
    expect(auditInstants({ from: '2026-12-01', to: '2026-12-02' }, 'Pacific/Guam')).toEqual({
      instants: { since: '2026-11-30T14:00:00.000Z', until: '2026-12-02T14:00:00.000Z' },
    });
  });

  it('crosses a month and a year end', () => {
    expect(auditInstants({ from: '', to: '2026-12-31' }, 'UTC')).toEqual({
      instants: { since: undefined, until: '2027-01-01T00:00:00.000Z' },
    });
  });

  it('keeps a day that a clock change makes 25 hours long whole', () => {
    // New York's clocks go back one hour on 1 November 2026 (US Energy Policy Act of 2005: first Sunday of November).
    expect(auditInstants({ from: '2026-11-01', to: '2026-11-01' }, 'America/New_York')).toEqual({
      instants: { since: '2026-11-01T04:00:00.000Z', until: '2026-11-02T05:00:00.000Z' },
    });
  });

  it('refuses a range that ends before it starts, and asks for nothing without days', () => {
    expect(auditInstants({ from: '2026-12-03', to: '2026-12-02' }, 'UTC')).toEqual({
      problem: expect.stringMatching(/ends before it starts/),
    });
    expect(auditInstants({ from: '', to: '' }, 'UTC')).toEqual({ instants: { since: undefined, until: undefined } });
  });
});
