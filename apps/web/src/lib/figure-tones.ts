/** The colour a launch figure shows in, by what it means for the shot. */
export type FigureTone = 'go' | 'nogo' | 'caution';

/**
 * The margin's colour by its own sign: a positive margin never shows in the danger colour, even while
 * another limit (crosswind, weight) holds the shot; those are named among the reasons below the figures.
 * The margin counts the recommended excess, so below zero it is a caution (the air boss may waive it)
 * until the excess wind over deck itself is below zero.
 */
export function marginTone(marginKt: number | null, excessKt: number | null): FigureTone | undefined {
  if (marginKt === null) return undefined;
  if (marginKt >= 0) return 'go';
  return excessKt !== null && excessKt < 0 ? 'nogo' : 'caution';
}

/**
 * The excess wind over deck's colour beside the recommended excess: below zero is a hard no-go, short
 * of the recommended value a caution (the air boss may waive it), at or above it go.
 */
export function excessTone(excessKt: number | null, recommendedKt: number | null): FigureTone | undefined {
  if (excessKt === null) return undefined;
  if (excessKt < 0) return 'nogo';
  return recommendedKt !== null && excessKt < recommendedKt ? 'caution' : 'go';
}
