import { LaunchMathInputError } from '../errors.js';

/** Within the table, the interpolated value; outside it, the table's range so the caller can say why. */
export type Interpolation =
  | { readonly kind: 'value'; readonly value: number }
  | { readonly kind: 'outside'; readonly lowest: number; readonly highest: number };

/**
 * Linear interpolation in a table of (x, y) points with strictly ascending x. Refuses to
 * extrapolate: launch data beyond its last row is not launch data.
 */
export function interpolateInTable(points: readonly (readonly [number, number])[], x: number): Interpolation {
  if (points.length === 0) throw new LaunchMathInputError('The table has no rows');
  for (let i = 0; i < points.length; i += 1) {
    const [px, py] = points[i];
    if (!Number.isFinite(px) || !Number.isFinite(py))
      throw new LaunchMathInputError('The table holds a value that is not a number');
    if (i > 0 && !(px > points[i - 1][0]))
      throw new LaunchMathInputError('Table rows must be in strictly ascending order');
  }
  const lowest = points[0][0];
  const highest = points[points.length - 1][0];
  if (!(x >= lowest && x <= highest)) return { kind: 'outside', lowest, highest };
  const upper = points.findIndex(([px]) => px >= x);
  const [x1, y1] = points[upper];
  if (x1 === x || upper === 0) return { kind: 'value', value: y1 };
  const [x0, y0] = points[upper - 1];
  return { kind: 'value', value: y0 + ((y1 - y0) * (x - x0)) / (x1 - x0) };
}
