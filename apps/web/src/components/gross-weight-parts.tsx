import { Text } from '@chakra-ui/react';
import type { GrossWeightPartsView } from '@catline/contracts';
import { formatWhole } from '../lib/format.js';

/** "operating weight + fuel + stores" in pounds, so the crew sees what the planned weight is made of. */
export const weightSum = (operatingLb: number, fuelLb: number, storesLb: number) =>
  `${formatWhole(operatingLb)} operating + ${formatWhole(fuelLb)} fuel + ${formatWhole(storesLb)} stores`;

export const grossWeightSum = (parts: GrossWeightPartsView) =>
  weightSum(parts.operatingWeightLb, parts.fuelLb, parts.storesWeightLb);

/** The stores lines with their weights, e.g. "2 × Rocket pod 1,040 lb"; "Clean" for none. */
export const storesLines = (parts: GrossWeightPartsView) =>
  parts.stores.length === 0
    ? 'Clean'
    : parts.stores.map((line) => `${line.count} × ${line.name} ${formatWhole(line.weightLb)} lb`).join(' · ');

/** The parts of a planned gross weight on one line; nothing while the weight was typed in. */
export function GrossWeightParts({
  parts,
  fontSize = 'xs',
}: {
  parts: GrossWeightPartsView | null;
  fontSize?: string;
}) {
  if (!parts) return null;
  return (
    <Text fontSize={fontSize} color="fg.muted" textStyle="figure" data-testid="gross-weight-parts">
      = {grossWeightSum(parts)} lb
    </Text>
  );
}
