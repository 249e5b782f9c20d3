import { LAUNCH_CAUTION } from '@catline/contracts';
import { stringify } from 'csv-stringify/sync';

// Every CSV the API writes (report downloads, import templates) comes from here.

export type CsvCell = string | number | boolean | null;

/**
 * Text that a spreadsheet would run as a formula gets a leading apostrophe (OWASP, "CSV Injection").
 * Only text cells are guarded: a negative number stays a number.
 */
export function guardText(text: string): string {
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}

/** The first line of every CSV Catline writes; Catline's imports skip lines that start with #. */
export const CAUTION_LINE = `# ${LAUNCH_CAUTION}`;

/**
 * RFC 4180 CSV (comma, CRLF, quotes where needed) with a byte-order mark so spreadsheets read it as
 * UTF-8, opening with the launch caution; booleans as true/false, null as an empty cell.
 */
export function toCsv(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  const table = stringify(
    [header, ...rows.map((row) => row.map((cell) => (typeof cell === 'string' ? guardText(cell) : cell)))],
    {
      record_delimiter: 'windows',
      // Only the record delimiter itself is quoted by default: a bare line break would split the row elsewhere.
      quoted_match: /[\r\n]/,
      cast: { boolean: (value) => (value ? 'true' : 'false') },
    },
  );
  return `\uFEFF${CAUTION_LINE}\r\n${table}`;
}
