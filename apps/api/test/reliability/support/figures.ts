/** The p-th percentile (0..100) by nearest rank. */
export function percentile(values: readonly number[], p: number): number {
  if (values.length === 0) return Number.NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}

/** Prints one figure line for the README's reliability section (collected from the run's output). */
export function reportFigure(name: string, figures: Record<string, string | number>): void {
  console.log(
    `[reliability] ${name}: ${Object.entries(figures)
      .map(([key, value]) => `${key}=${value}`)
      .join(', ')}`,
  );
}
