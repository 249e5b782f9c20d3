import type { ReadinessStep } from '@catline/contracts';
import { DEFAULT_READINESS_STEPS } from '@catline/launch-math';
import type { LineupState } from './lineup-state.js';

/** The ship's readiness steps in order: its profile's, or every step when the profile names none. */
export const shipReadinessSteps = (state: Pick<LineupState, 'ship'>): ReadinessStep[] => [
  ...(state.ship.profile.readinessSteps ?? DEFAULT_READINESS_STEPS),
];

/**
 * The readiness steps a catapult runs: its own list, or the ship's when it has none. An aircraft in
 * the deck pool (`catapultId` null) is before every step, so the ship's list answers for it.
 */
export const catapultReadinessSteps = (
  state: Pick<LineupState, 'ship' | 'catapults'>,
  catapultId: number | null,
): ReadinessStep[] => {
  const own = state.catapults.find((catapult) => catapult.id === catapultId)?.readinessSteps;
  return own ? [...own] : shipReadinessSteps(state);
};
