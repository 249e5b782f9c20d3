/** What changed under an aircraft's agreed figures. */
export const REVERIFY_CAUSES = ['wind', 'ship_speed', 'weight', 'launch_data'] as const;
export type ReverifyCause = (typeof REVERIFY_CAUSES)[number];

/** Where an aircraft goes back to when its figures change, and whether its weight must be agreed again. */
export interface ReverifyDropBack {
  readonly to: string;
  readonly weightAgreementVoid: boolean;
}

/**
 * The re-verify drop-back. Once the weight is agreed the setting rests on it, so a change of wind,
 * ship speed or launch data takes the aircraft back to "weight agreed" (the step before the setting
 * read-back) and the crew reads the new setting back; a change of weight takes it back before the
 * weight was agreed, since the agreed figure itself is no longer the aircraft's. Before the weight is
 * agreed nothing has been verified, and nothing drops back (null).
 *
 * @param steps the ship's readiness steps in order, `weight_agreed` among them
 * @param status the aircraft's status now
 */
export function reverifyDropBack(
  steps: readonly string[],
  status: string,
  cause: ReverifyCause,
): ReverifyDropBack | null {
  const agreed = steps.indexOf('weight_agreed');
  const at = steps.indexOf(status);
  if (agreed < 0 || at < agreed) return null;
  if (cause === 'weight') return { to: steps[agreed - 1] ?? steps[0], weightAgreementVoid: true };
  return { to: 'weight_agreed', weightAgreementVoid: false };
}
