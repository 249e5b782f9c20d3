import { advance, launchRefusal, suspend, type LaunchFacts } from './readiness-machine.js';

const ready: LaunchFacts = {
  side: 'D33',
  status: 'tensioned',
  gates: [],
  refusals: [],
};
const crosswind = {
  gate: 'crosswind_over_limit',
  soft: false,
  waived: false,
  message: 'Crosswind 18.0 kt from port is over the WKD-41 limit of 15.0 kt.',
} as const;
const staleWind = { gate: 'wind_reading_stale', soft: true, waived: true, message: 'Stale.' } as const;

describe('readiness steps', () => {
  it.each([
    ['planned', 'taxiing'],
    ['taxiing', 'on_catapult'],
    ['on_catapult', 'weight_agreed'],
    ['weight_agreed', 'tensioned'],
  ] as const)('moves from %s to %s', (from, to) => {
    expect(advance('D33', from, to)).toEqual({ ok: true, status: to });
  });

  it('refuses a skipped step and names the next one', () => {
    const result = advance('D33', 'taxiing', 'tensioned');
    expect(result.ok).toBe(false);
    expect(!result.ok && result.refusal).toEqual({
      code: 'wrong_step',
      message: 'D33 is taxiing; the next step is on catapult, not tensioned.',
    });
  });

  it('refuses going back a step', () => {
    expect(advance('D33', 'tensioned', 'on_catapult').ok).toBe(false);
  });

  it('resumes a suspended aircraft to on catapult, and nothing else', () => {
    expect(advance('D33', 'suspended', 'resume')).toEqual({ ok: true, status: 'on_catapult' });
    expect(advance('D33', 'on_catapult', 'resume').ok).toBe(false);
    expect(advance('D33', 'suspended', 'tensioned').ok).toBe(false);
  });

  it('takes no step after a launch', () => {
    const result = advance('D33', 'launched', 'taxiing');
    expect(!result.ok && result.refusal.message).toBe('D33 is launched; it takes no more readiness steps.');
  });

  it.each(['taxiing', 'on_catapult', 'weight_agreed', 'tensioned'] as const)('suspends from %s', (status) => {
    expect(suspend('D33', status)).toEqual({ ok: true, status: 'suspended' });
  });

  it.each(['planned', 'launched', 'suspended', 'down'] as const)('does not suspend from %s', (status) => {
    expect(suspend('D33', status).ok).toBe(false);
  });
});

describe('launchRefusal', () => {
  it('lets a tensioned aircraft with every gate open launch', () => {
    expect(launchRefusal(ready)).toBeNull();
  });

  it('refuses before tension', () => {
    expect(launchRefusal({ ...ready, status: 'weight_agreed' })?.code).toBe('wrong_step');
  });

  it('refuses on a closed hard gate with its code and sentence, with no way around it', () => {
    expect(launchRefusal({ ...ready, gates: [crosswind], refusals: ['crosswind_over_limit'] })).toEqual({
      code: 'crosswind_over_limit',
      message: 'Crosswind 18.0 kt from port is over the WKD-41 limit of 15.0 kt.',
    });
  });

  it('names the first refusing gate and words only the gates that refuse', () => {
    const refusal = launchRefusal({
      ...ready,
      status: 'on_catapult',
      gates: [crosswind, staleWind],
      refusals: ['crosswind_over_limit'],
    });
    expect(refusal).toEqual({ code: 'crosswind_over_limit', message: crosswind.message });
  });
});
