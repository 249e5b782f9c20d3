/**
 * The readiness steps an aircraft goes through on a catapult, in the trade's order: taxi up and wait
 * behind the blast deflector, hook up (launch bar in the shuttle, holdback fitted), agree the weight,
 * set and read back the setting, raise the deflector, take tension, run up to full power, final checks
 * clear, pilot ready (salute by day, lights at night). Order from NAVEDTRA 14310 (Aviation Boatswain's
 * Mate E 3 & 2), catapult launching procedures: deflectors raised before tension, tension, full-power
 * turn-up, the pilot's salute or navigation lights steady at night, the safety observer's final check,
 * then fire.
 */
export const READINESS_STEP_CATALOGUE = [
  'taxiing',
  'on_catapult',
  'weight_agreed',
  'setting_set',
  'deflector_up',
  'tensioned',
  'run_up',
  'checks_clear',
  'pilot_ready',
] as const;
export type ReadinessStepKey = (typeof READINESS_STEP_CATALOGUE)[number];

/** Steps no ship may leave out: without them the shot rests on nothing checked. */
export const REQUIRED_READINESS_STEPS: readonly ReadinessStepKey[] = [
  'on_catapult',
  'weight_agreed',
  'setting_set',
  'tensioned',
];

/** The default for a new ship: every step of the catalogue. */
export const DEFAULT_READINESS_STEPS: readonly ReadinessStepKey[] = READINESS_STEP_CATALOGUE;

export const isReadinessStep = (value: string): value is ReadinessStepKey =>
  (READINESS_STEP_CATALOGUE as readonly string[]).includes(value);

/**
 * Why a ship's list of steps cannot be used, or null when it can: every step known and once, in the
 * catalogue's order (a ship may leave steps out, not reorder the trade's sequence), the required ones in.
 */
export function readinessStepsProblem(steps: readonly string[]): string | null {
  const unknown = steps.filter((step) => !isReadinessStep(step));
  if (unknown.length > 0) return `Unknown readiness steps: ${unknown.join(', ')}.`;
  if (new Set(steps).size !== steps.length) return 'A readiness step is listed twice.';
  const missing = REQUIRED_READINESS_STEPS.filter((step) => !steps.includes(step));
  if (missing.length > 0) return `These readiness steps cannot be left out: ${missing.join(', ')}.`;
  const order = steps.map((step) => READINESS_STEP_CATALOGUE.indexOf(step as ReadinessStepKey));
  if (order.some((at, i) => i > 0 && at < order[i - 1])) return 'Readiness steps must keep the trade’s order.';
  return null;
}
