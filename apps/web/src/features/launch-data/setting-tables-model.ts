import {
  AIRCRAFT_TYPE_RANGES,
  GROSS_WEIGHT_LB,
  LAUNCH_CONFIGURATIONS,
  type LaunchConfiguration,
  type SettingTable,
} from '@catline/contracts';

/** One row of an approved setting table as typed: the table it belongs to is named on every row. */
export interface DraftSettingRow {
  catapultNumber: string;
  configuration: string;
  recommendedExcessKt: string;
  upToLb: string;
  setting: string;
}

export const toDraftSettingRows = (tables: SettingTable[]): DraftSettingRow[] =>
  tables.flatMap((table) =>
    table.rows.map((row) => ({
      catapultNumber: String(table.catapultNumber),
      configuration: table.configuration,
      recommendedExcessKt: String(table.recommendedExcessKt),
      upToLb: String(row.upToLb),
      setting: String(row.setting),
    })),
  );

const isConfiguration = (value: string): value is LaunchConfiguration =>
  (LAUNCH_CONFIGURATIONS as readonly string[]).includes(value);

const whole = (text: string, min: number, max: number) => {
  const value = Number(text);
  return text.trim() !== '' && Number.isInteger(value) && value >= min && value <= max ? value : null;
};

/**
 * The rows as the request, gathered into one table per catapult and configuration, or the first problem
 * in words. Within a table the weights must rise and the recommended excess be the same on every row;
 * whether the ship has the catapult and the setting is the server's to say.
 */
export function parseSettingTables(drafts: DraftSettingRow[]): { tables: SettingTable[] } | { problem: string } {
  const tables = new Map<string, SettingTable>();
  for (const [index, draft] of drafts.entries()) {
    const at = `Row ${index + 1}`;
    const catapultNumber = whole(draft.catapultNumber, 1, 99);
    if (catapultNumber === null) return { problem: `${at}: enter the catapult's number.` };
    const configuration = draft.configuration.trim().toLowerCase();
    if (!isConfiguration(configuration))
      return { problem: `${at}: the configuration is one of ${LAUNCH_CONFIGURATIONS.join(', ')}.` };
    const excess = Number(draft.recommendedExcessKt);
    const { min, max } = AIRCRAFT_TYPE_RANGES.requiredExcessKt;
    if (draft.recommendedExcessKt.trim() === '' || !Number.isFinite(excess) || excess < min || excess > max)
      return { problem: `${at}: enter the recommended excess in knots, ${min} to ${max}.` };
    const upToLb = whole(draft.upToLb, GROSS_WEIGHT_LB.min, GROSS_WEIGHT_LB.max);
    if (upToLb === null) return { problem: `${at}: enter the row's top weight in whole pounds.` };
    const setting = whole(draft.setting, 0, 999);
    if (setting === null) return { problem: `${at}: enter the setting as a whole number.` };

    const key = `${catapultNumber}/${configuration}`;
    const table = tables.get(key) ?? { catapultNumber, configuration, recommendedExcessKt: excess, rows: [] };
    if (table.recommendedExcessKt !== excess)
      return {
        problem: `${at}: cat ${catapultNumber} ${configuration} already recommends ${table.recommendedExcessKt} kt.`,
      };
    const last = table.rows.at(-1);
    if (last && upToLb <= last.upToLb)
      return {
        problem: `${at}: the weight must rise above ${last.upToLb} lb within cat ${catapultNumber} ${configuration}.`,
      };
    table.rows.push({ upToLb, setting });
    tables.set(key, table);
  }
  return { tables: [...tables.values()] };
}
