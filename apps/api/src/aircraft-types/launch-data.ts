import {
  LAUNCH_CONFIGURATIONS,
  type LaunchTableRow,
  type SettingTable,
  type StoresItem,
  type TrimBand,
} from '@catline/contracts';

/** A launch table is read by interpolation, so its weights must rise strictly from row to row. */
export function launchTableProblems(rows: LaunchTableRow[]): string[] {
  return rows.flatMap((row, i) =>
    i > 0 && row.grossWeightLb <= rows[i - 1].grossWeightLb
      ? [
          `Launch table row ${i + 1} (${row.grossWeightLb} lb) must be heavier than row ${i} (${rows[i - 1].grossWeightLb} lb).`,
        ]
      : [],
  );
}

/** Trim bands cover every weight: rising upper bounds, and only the last band open-ended (null). */
export function trimBandProblems(bands: TrimBand[]): string[] {
  const problems: string[] = [];
  bands.forEach((band, i) => {
    const last = i === bands.length - 1;
    if (last && band.upToLb !== null)
      problems.push('The last trim band must have no upper weight (upToLb null) so every weight has a trim.');
    if (!last && band.upToLb === null)
      problems.push(`Only the last trim band may be open-ended; band ${i + 1} has no upper weight.`);
    const previous = bands[i - 1]?.upToLb;
    if (band.upToLb !== null && previous != null && band.upToLb <= previous) {
      problems.push(`Trim band ${i + 1} (up to ${band.upToLb} lb) must end above band ${i} (up to ${previous} lb).`);
    }
  });
  return problems;
}

/** A slot names a stores item by its name, so two items of one catalogue may not share it, whatever the case. */
export function storesCatalogueProblems(items: StoresItem[]): string[] {
  const seen = new Set<string>();
  return items.flatMap((item) => {
    const key = item.name.toLocaleLowerCase('en');
    if (seen.has(key)) return [`The stores catalogue names ${item.name} twice.`];
    seen.add(key);
    return [];
  });
}

/** The catalogue as kept: ordered by name, so every reader lists it alike. */
export function orderedStoresCatalogue(items: StoresItem[]): StoresItem[] {
  return [...items]
    .map(({ name, weightEachLb }) => ({ name, weightEachLb }))
    .sort((a, b) => a.name.localeCompare(b.name, 'en'));
}

/** A catapult of the type's ship, as a setting table refers to it. */
export interface SettingTableCatapult {
  number: number;
  /** Settings run from 0 to settingCount - 1. */
  settingCount: number;
}

/**
 * Setting tables are read row by row for the next weight at or above the agreed one, so weights rise
 * strictly; each names a catapult of the ship, a setting that catapult has, and is the only one of
 * its catapult and configuration.
 */
export function settingTableProblems(tables: SettingTable[], catapults: SettingTableCatapult[]): string[] {
  const seen = new Set<string>();
  return tables.flatMap((table) => {
    const name = `The ${table.configuration} table of cat ${table.catapultNumber}`;
    const catapult = catapults.find((candidate) => candidate.number === table.catapultNumber);
    const key = `${table.catapultNumber}/${table.configuration}`;
    const problems: string[] = [];
    if (seen.has(key)) problems.push(`${name} is given twice.`);
    seen.add(key);
    if (!catapult) return [...problems, `The ship has no cat ${table.catapultNumber}.`];
    table.rows.forEach((row, i) => {
      const previous = table.rows[i - 1];
      if (previous && row.upToLb <= previous.upToLb) {
        problems.push(
          `${name}: row ${i + 1} (up to ${row.upToLb} lb) must end above row ${i} (up to ${previous.upToLb} lb).`,
        );
      }
      if (row.setting > catapult.settingCount - 1) {
        problems.push(
          `${name}: row ${i + 1} asks for setting ${row.setting}; cat ${catapult.number} goes up to ${catapult.settingCount - 1}.`,
        );
      }
    });
    return problems;
  });
}

/** The tables as kept: by catapult number, then configuration, so every reader lists them alike. */
export function orderedSettingTables(tables: SettingTable[]): SettingTable[] {
  return tables
    .map(({ catapultNumber, configuration, recommendedExcessKt, rows }) => ({
      catapultNumber,
      configuration,
      recommendedExcessKt,
      rows: rows.map(({ upToLb, setting }) => ({ upToLb, setting })),
    }))
    .sort(
      (a, b) =>
        a.catapultNumber - b.catapultNumber ||
        LAUNCH_CONFIGURATIONS.indexOf(a.configuration) - LAUNCH_CONFIGURATIONS.indexOf(b.configuration),
    );
}
