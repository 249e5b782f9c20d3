import { requirePositive } from '../errors.js';
import type { Knots, Pounds } from '../units/units.js';

/** One row of the ship's approved setting table: every gross weight up to `upToWeight` takes `setting`. */
export interface ApprovedSettingRow {
  /** Upper gross-weight bound of the row, lb (inclusive). */
  readonly upToWeight: Pounds;
  /** Whole-number catapult setting. */
  readonly setting: number;
}

/** The approved settings of one catapult for one type in one configuration, rows by rising weight. */
export interface ApprovedSettingTable {
  readonly rows: readonly ApprovedSettingRow[];
  /** The excess wind over deck the launch data recommends, knots. */
  readonly recommendedExcess: Knots;
}

export type ApprovedSettingLookup =
  | { readonly kind: 'setting'; readonly setting: number; readonly upToWeight: Pounds }
  /** Heavier than the table's last row: the data approves no setting for this weight. */
  | { readonly kind: 'above_table'; readonly highest: Pounds };

/**
 * The approved setting for a gross weight (lb): the row of the next weight at or above it. Never
 * interpolated: a heavier row's setting is the conservative one, and the crew reads the row as printed.
 */
export function approvedSetting(table: ApprovedSettingTable, grossWeight: Pounds): ApprovedSettingLookup {
  requirePositive(grossWeight, 'Gross weight (lb)');
  const row = table.rows.find((candidate) => grossWeight <= candidate.upToWeight);
  if (row) return { kind: 'setting', setting: row.setting, upToWeight: row.upToWeight };
  return { kind: 'above_table', highest: table.rows[table.rows.length - 1]?.upToWeight ?? (0 as Pounds) };
}
