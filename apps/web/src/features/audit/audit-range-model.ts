import { fromShipLocalInput } from '@catline/contracts';

/** The days an admin picks on the Audit screen, as date fields hold them ("2026-12-02"), or empty. */
export interface AuditDays {
  from: string;
  to: string;
}

/** The instants the API filters on: `since` included, `until` excluded. */
export interface AuditInstants {
  since?: string;
  until?: string;
}

const DAY_MS = 86_400_000;

/** The calendar day after a "YYYY-MM-DD" day (calendar arithmetic, so read in UTC). */
const nextDay = (day: string): string => new Date(Date.parse(`${day}T00:00Z`) + DAY_MS).toISOString().slice(0, 10);

/** The start of a day on the ship's clock, as an instant. */
const dayStart = (day: string, timeZone: string): string => fromShipLocalInput(`${day}T00:00`, timeZone).toISOString();

/**
 * The whole days from `from` to `to` (both included) on the clock of `timeZone`, as the instants the API
 * takes; a range that ends before it starts is refused in words, as the API would refuse it.
 */
export function auditInstants(days: AuditDays, timeZone: string): { instants: AuditInstants } | { problem: string } {
  if (days.from && days.to && days.from > days.to) {
    return { problem: 'The range ends before it starts: pick a last day on or after the first.' };
  }
  return {
    instants: {
      since: days.from ? dayStart(days.from, timeZone) : undefined,
      until: days.to ? dayStart(nextDay(days.to), timeZone) : undefined,
    },
  };
}
