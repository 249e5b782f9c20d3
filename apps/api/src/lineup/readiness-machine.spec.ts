import { advance, launchRefusal, suspend, type LaunchFacts } from './readiness-machine.js';

const ready: LaunchFacts = {
  side: 'D33',
  status: 'tensioned',
  cycleNumber: 3,
  cycleState: 'executing',
  catapultNumber: 2,
  catapultUp: true,
  catapultClosed: false,
  pilotWeightAgreed: true,
  catapultWeightAgreed: true,
  go: true,
  noGoReasons: [],
};

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
  it('lets a tensioned, agreed, go aircraft launch', () => {
    expect(launchRefusal(ready)).toBeNull();
  });

  it('refuses before tension', () => {
    expect(launchRefusal({ ...ready, status: 'weight_agreed' })?.code).toBe('wrong_step');
  });

  it('refuses without both weight agreements', () => {
    expect(launchRefusal({ ...ready, pilotWeightAgreed: false })?.code).toBe('weight_not_agreed');
    expect(launchRefusal({ ...ready, catapultWeightAgreed: false })?.message).toBe(
      "D33 cannot launch without the catapult officer's gross weight agreement.",
    );
  });

  it('refuses outside an executing cycle', () => {
    expect(launchRefusal({ ...ready, cycleState: 'planning' })?.code).toBe('cycle_not_executing');
  });

  it('refuses from a catapult that is down or closed, even with an override', () => {
    expect(launchRefusal({ ...ready, catapultUp: false, overrideReason: 'needed' })?.code).toBe('catapult_unavailable');
    expect(launchRefusal({ ...ready, catapultClosed: true, overrideReason: 'needed' })?.code).toBe(
      'catapult_unavailable',
    );
  });

  it('refuses a no-go figure unless an override reason is given', () => {
    const noGo = {
      ...ready,
      go: false,
      noGoReasons: ['Crosswind 18.0 kt from port is over the WKD-41 limit of 15.0 kt.'],
    };
    expect(launchRefusal(noGo)).toEqual({
      code: 'no_go',
      message:
        'D33 is no-go: Crosswind 18.0 kt from port is over the WKD-41 limit of 15.0 kt. Launch only with an override reason.',
    });
    expect(launchRefusal({ ...noGo, overrideReason: 'Ship cannot turn into the wind; air boss approved' })).toBeNull();
  });
});
