import { DEFAULT_READINESS_STEPS, readinessStepsProblem } from './readiness-steps.js';

// The order is the trade's (NAVEDTRA 14310, catapult launching procedures); which steps a ship may leave
// out is Catline's rule (hook-up, weight, setting read-back and tension always stay), no published source.
describe('readinessStepsProblem', () => {
  it('accepts every step, and a ship that leaves optional ones out', () => {
    expect(readinessStepsProblem(DEFAULT_READINESS_STEPS)).toBeNull();
    expect(
      readinessStepsProblem(['on_catapult', 'weight_agreed', 'setting_set', 'tensioned', 'pilot_ready']),
    ).toBeNull();
  });

  it('refuses a reordered, repeated, unknown or incomplete list', () => {
    expect(readinessStepsProblem(['on_catapult', 'setting_set', 'weight_agreed', 'tensioned'])).toBe(
      'Readiness steps must keep the trade’s order.',
    );
    expect(readinessStepsProblem(['on_catapult', 'on_catapult', 'weight_agreed', 'setting_set', 'tensioned'])).toBe(
      'A readiness step is listed twice.',
    );
    expect(readinessStepsProblem(['on_catapult', 'airborne'])).toBe('Unknown readiness steps: airborne.');
    expect(readinessStepsProblem(['on_catapult', 'weight_agreed', 'tensioned'])).toBe(
      'These readiness steps cannot be left out: setting_set.',
    );
  });
});
