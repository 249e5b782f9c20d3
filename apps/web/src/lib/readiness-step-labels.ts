import type { ReadinessStep } from '@catline/contracts';

// Read by the Cat station (the steps it offers) and Fleet (the admin's lists of steps).
/** Each readiness step in the deck crew's words. */
export const STEP_LABELS: Record<ReadinessStep, string> = {
  taxiing: 'Taxi up behind the deflector',
  on_catapult: 'Hooked up: launch bar, holdback',
  weight_agreed: 'Weight agreed',
  setting_set: 'Setting set and read back',
  deflector_up: 'Deflector raised',
  tensioned: 'Tension',
  run_up: 'Full power, engine checks',
  checks_clear: 'Final checks clear',
  pilot_ready: 'Pilot ready',
};
