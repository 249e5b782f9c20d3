import { requireFinite, requireNonNegative } from '../errors.js';
import { READINESS_STEP_CATALOGUE, type ReadinessStepKey } from '../readiness/readiness-steps.js';
import { epochMs, seconds, secondsToMilliseconds, type EpochMs, type Seconds } from '../units/units.js';

/**
 * Seconds the catapult crew takes to reach each readiness step from the one before it (common practice,
 * no source). Taxiing and reaching the catapult take the aircraft's own taxi time, counted apart. What
 * follows tension (run-up, final checks, the pilot's ready signal) happens within the shot's own seconds
 * and is taken as no wait: a tensioned aircraft can go at once.
 */
export const STEP_SECONDS: Readonly<Record<ReadinessStepKey, number>> = {
  taxiing: 0,
  on_catapult: 0,
  weight_agreed: 15,
  setting_set: 10,
  deflector_up: 10,
  tensioned: 10,
  run_up: 0,
  checks_clear: 0,
  pilot_ready: 0,
};

/** Where an aircraft stands: not yet taxiing (`planned`), at a readiness step, or suspended on its catapult. */
export type ReadinessPosition = 'planned' | 'suspended' | ReadinessStepKey;

export interface ReadinessInput {
  readonly position: ReadinessPosition;
  /** When it reached that step, epoch ms; a planned or suspended aircraft counts from `now`. */
  readonly since: EpochMs;
  /** Its taxi time from where it is parked to its catapult. */
  readonly taxi: Seconds;
  /** The ship's readiness steps, in the trade's order. */
  readonly steps: readonly ReadinessStepKey[];
  readonly now: EpochMs;
}

const ON_CATAPULT = READINESS_STEP_CATALOGUE.indexOf('on_catapult');

/** Catalogue place of a position: planned before every step; suspended waits to be on its catapult again. */
const placeOf = (position: ReadinessPosition): number =>
  position === 'planned' ? -1 : position === 'suspended' ? ON_CATAPULT : READINESS_STEP_CATALOGUE.indexOf(position);

/**
 * The earliest an aircraft can launch from where it stands in its readiness: the moment it reached its
 * step plus what is left (its taxi while it has not reached the catapult, then each of the ship's steps
 * still to do at {@link STEP_SECONDS}), never before now.
 */
export function readyToLaunchAt(input: ReadinessInput): EpochMs {
  requireFinite(input.now, 'Now');
  requireFinite(input.since, 'Time the step was reached');
  requireNonNegative(input.taxi, 'Taxi time (s)');
  const place = placeOf(input.position);
  const from = input.position === 'planned' || input.position === 'suspended' ? input.now : input.since;
  const taxi = place < ON_CATAPULT ? input.taxi : 0;
  const steps = input.steps
    .filter((step) => READINESS_STEP_CATALOGUE.indexOf(step) > place)
    .reduce((total, step) => total + STEP_SECONDS[step], 0);
  return epochMs(Math.max(input.now, from + secondsToMilliseconds(seconds(taxi + steps))));
}
