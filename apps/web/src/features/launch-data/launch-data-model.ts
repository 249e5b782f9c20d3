import type { LaunchTableRow, TrimBand } from '@catline/contracts';

export interface DraftRow {
  grossWeightLb: string;
  minLaunchAirspeedKt: string;
}

export const toDraftRows = (rows: LaunchTableRow[]): DraftRow[] =>
  rows.map((row) => ({
    grossWeightLb: String(row.grossWeightLb),
    minLaunchAirspeedKt: String(row.minLaunchAirspeedKt),
  }));

/** The rows as numbers, or the first problem in words: weights must rise strictly, speeds be positive. */
export function parseLaunchTable(rows: DraftRow[]): { rows: LaunchTableRow[] } | { problem: string } {
  if (rows.length < 2) return { problem: 'A launch table needs at least two rows to interpolate between.' };
  const parsed: LaunchTableRow[] = [];
  for (const [index, row] of rows.entries()) {
    const grossWeightLb = Number(row.grossWeightLb);
    const minLaunchAirspeedKt = Number(row.minLaunchAirspeedKt);
    if (!Number.isFinite(grossWeightLb) || grossWeightLb <= 0 || row.grossWeightLb.trim() === '')
      return { problem: `Row ${index + 1}: enter a gross weight in pounds.` };
    if (!Number.isFinite(minLaunchAirspeedKt) || minLaunchAirspeedKt <= 0 || row.minLaunchAirspeedKt.trim() === '')
      return { problem: `Row ${index + 1}: enter a minimum launch airspeed in knots.` };
    const before = parsed.at(-1);
    if (before && grossWeightLb <= before.grossWeightLb)
      return { problem: `Row ${index + 1}: each weight must be heavier than the row above.` };
    parsed.push({ grossWeightLb, minLaunchAirspeedKt });
  }
  return { rows: parsed };
}

/** Trim bands typed as `44000:15, 48000:17, *:18` (upper weight : trim°; `*` for the last band). */
export function parseTrimBands(text: string): TrimBand[] | null {
  const parts = text
    .split(',')
    .map((part) => part.trim())
    .filter(Boolean);
  const bands = parts.map((part) => {
    const [upTo, trim] = part.split(':').map((piece) => piece.trim());
    return { upToLb: upTo === '*' ? null : Number(upTo), trimDeg: Number(trim) };
  });
  const valid =
    bands.length > 0 &&
    bands.every(
      (band, index) =>
        Number.isFinite(band.trimDeg) &&
        (band.upToLb === null ? index === bands.length - 1 : Number.isFinite(band.upToLb) && band.upToLb > 0),
    ) &&
    bands.at(-1)?.upToLb === null;
  return valid ? bands : null;
}

export const formatTrimBands = (bands: TrimBand[]) =>
  bands
    .map((band) =>
      band.upToLb === null
        ? `above: ${band.trimDeg}°`
        : `up to ${band.upToLb.toLocaleString('en-GB')} lb: ${band.trimDeg}°`,
    )
    .join(' · ');
