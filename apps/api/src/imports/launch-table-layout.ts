import type { ImportProblem, LaunchTableImportRow } from '@catline/contracts';
import { toCsv } from '../common/csv.js';
import { isProblem, positiveDecimal } from './cell-parsers.js';
import { type CsvLayout, readCsvTable } from './csv-table.js';

// A type's minimum launch airspeed by gross weight, one line per table row. README.md documents it.

export const LAUNCH_TABLE_COLUMNS = ['gross_weight_lb', 'min_launch_airspeed_kt'] as const;
export type LaunchTableColumn = (typeof LAUNCH_TABLE_COLUMNS)[number];

export const LAUNCH_TABLE_LAYOUT: CsvLayout<LaunchTableColumn> = {
  columns: LAUNCH_TABLE_COLUMNS,
  maxRows: 100,
  rowNoun: 'table row',
};

/** Header and two invented example lines. */
export const LAUNCH_TABLE_TEMPLATE = toCsv(LAUNCH_TABLE_COLUMNS, [
  [34_000, 124],
  [40_000, 133],
]);

const LIMITS: Record<LaunchTableColumn, { max: number; unit: string }> = {
  gross_weight_lb: { max: 1_000_000, unit: 'lb' },
  min_launch_airspeed_kt: { max: 1_000, unit: 'kt' },
};

/**
 * The rows of a launch table file and the problems found. The table is read by interpolation, so
 * each weight must be heavier than the one on the line before, and there must be two rows at least.
 */
export function readLaunchTable(text: string): { rows: LaunchTableImportRow[]; problems: ImportProblem[] } {
  const table = readCsvTable(text, LAUNCH_TABLE_LAYOUT);
  if (!table.ok) return { rows: [], problems: table.problems };
  const problems = [...table.problems];
  const rows: LaunchTableImportRow[] = [];
  for (const record of table.records) {
    const cells = LAUNCH_TABLE_COLUMNS.map((column) => ({
      column,
      raw: record.cells[column],
      cell: positiveDecimal(record.cells[column], LIMITS[column]),
    }));
    const wrong = cells.flatMap(({ column, raw, cell }) =>
      isProblem(cell) ? [{ row: record.line, column, value: raw, reason: cell.reason }] : [],
    );
    if (wrong.length > 0) {
      problems.push(...wrong);
      continue;
    }
    const [weight, airspeed] = cells.map(({ cell }) => (cell as { value: number }).value);
    const previous = rows[rows.length - 1];
    if (previous && weight <= previous.grossWeightLb) {
      problems.push({
        row: record.line,
        column: 'gross_weight_lb',
        value: record.cells.gross_weight_lb,
        reason: `Must be heavier than line ${previous.row} (${previous.grossWeightLb} lb): the weights must rise from line to line.`,
      });
      continue;
    }
    rows.push({ row: record.line, grossWeightLb: weight, minLaunchAirspeedKt: airspeed });
  }
  if (problems.length === 0 && rows.length < 2) {
    problems.push({
      row: 1,
      column: null,
      value: null,
      reason: 'A launch table needs at least two rows to interpolate between.',
    });
  }
  return { rows, problems };
}
