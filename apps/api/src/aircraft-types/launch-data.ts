import type { LaunchTableRow, StoresItem, TrimBand } from '@catline/contracts';

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
