import type { ReadinessStep } from '@catline/contracts';
import { DEFAULT_READINESS_STEPS } from '@catline/launch-math';
import type { LineupState } from './lineup-state.js';

/** The ship's readiness steps in order: its profile's, or every step when the profile names none. */
export const shipReadinessSteps = (state: Pick<LineupState, 'ship'>): ReadinessStep[] => [
  ...(state.ship.profile.readinessSteps ?? DEFAULT_READINESS_STEPS),
];
