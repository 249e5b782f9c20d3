import { LaunchMathInputError } from '../errors.js';
import { DEFAULT_READINESS_STEPS } from '../readiness/readiness-steps.js';
import { at, CYCLE_START } from '../testing/cycles.fixture.js';
import { seconds } from '../units/units.js';
import { readyToLaunchAt, type ReadinessInput } from './launch-readiness.js';

// Step times are the module's own rule (common practice, no source): weight agreed 15 s, setting set
// 10 s, deflector up 10 s, tensioned 10 s, every other step no wait; 45 s from the catapult to tension.
const now = at(600);
const ready = (overrides: Partial<ReadinessInput>): number =>
  (readyToLaunchAt({
    position: 'planned',
    since: now,
    taxi: seconds(90),
    steps: DEFAULT_READINESS_STEPS,
    now,
    ...overrides,
  }) -
    CYCLE_START) /
  1000;

describe('earliest launch from an aircraft readiness', () => {
  it('gives a planned aircraft its whole taxi and every step from now', () => {
    // By hand: 600 + 90 taxi + 15 + 10 + 10 + 10 = 735 s.
    expect(ready({ position: 'planned' })).toBe(735);
  });

  it('counts a taxiing aircraft from when it started to taxi', () => {
    // By hand: taxiing since 560 s: 560 + 90 + 45 = 695 s.
    expect(ready({ position: 'taxiing', since: at(560) })).toBe(695);
  });

  it('lets a tensioned aircraft go at once', () => {
    expect(ready({ position: 'tensioned', since: at(595) })).toBe(600);
  });

  it('leaves only the steps still to do', () => {
    // By hand: setting set at 590 s, then deflector up 10 s and tension 10 s: 590 + 20 = 610 s.
    expect(ready({ position: 'setting_set', since: at(590) })).toBe(610);
  });

  it('never puts a launch before now, however long the aircraft has stood at its step', () => {
    // By hand: on the catapult since 400 s, 400 + 45 = 445 s, before now: now, 600 s.
    expect(ready({ position: 'on_catapult', since: at(400) })).toBe(600);
  });

  it('has a suspended aircraft hook up again from now', () => {
    // By hand: back on the catapult at the resume, then 45 s of steps: 600 + 45 = 645 s.
    expect(ready({ position: 'suspended', since: at(100) })).toBe(645);
  });

  it('skips the steps the ship does not run', () => {
    // By hand: a ship without deflector up: 600 + 90 + 15 + 10 + 10 = 725 s.
    const steps = DEFAULT_READINESS_STEPS.filter((step) => step !== 'deflector_up');
    expect(ready({ position: 'planned', steps })).toBe(725);
  });

  it('refuses a negative taxi time', () => {
    expect(() => ready({ taxi: seconds(-1) })).toThrow(LaunchMathInputError);
  });
});
