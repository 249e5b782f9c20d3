import { ReportsException } from './reports.exception.js';

const DAY_MS = 86_400_000;

/** A range of whole UTC days, both ends included. */
export interface DayRange {
  from: string;
  to: string;
  /** The first instant of `from`, and the first instant after `to`. */
  start: Date;
  end: Date;
}

/** The first instant of a YYYY-MM-DD UTC day, or null when no such calendar day exists (2027-02-30). */
function dayStart(day: string): Date | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!match) return null;
  const [year, month, date] = match.slice(1).map(Number);
  const start = new Date(Date.UTC(year, month - 1, date));
  return start.getUTCFullYear() === year && start.getUTCMonth() === month - 1 && start.getUTCDate() === date
    ? start
    : null;
}

/** Reads `from` and `to` as UTC days; refuses a date that does not exist and a range that ends before it starts. */
export function dayRange(from: string, to: string): DayRange {
  const start = dayStart(from);
  const last = dayStart(to);
  if (!start)
    throw new ReportsException(
      'invalid_date_range',
      `from: ${from} is not a calendar day; write it as YYYY-MM-DD, e.g. 2027-01-31.`,
    );
  if (!last)
    throw new ReportsException(
      'invalid_date_range',
      `to: ${to} is not a calendar day; write it as YYYY-MM-DD, e.g. 2027-01-31.`,
    );
  if (last < start)
    throw new ReportsException(
      'invalid_date_range',
      `The range ends before it starts: to (${to}) is earlier than from (${from}).`,
    );
  return { from, to, start, end: new Date(last.getTime() + DAY_MS) };
}
