import fc from 'fast-check';
import { HARD_LAUNCH_GATES, LAUNCH_GATES, SOFT_LAUNCH_GATES } from '../launch/launch-gates.js';
import {
  READINESS_REFUSALS,
  UNDO_WINDOW_MS,
  isPast,
  nextStep,
  readinessTransition,
  type ReadinessActor,
  type ReadinessCommand,
  type SlotReadiness,
} from './readiness-machine.js';
import { DEFAULT_READINESS_STEPS, READINESS_STEP_CATALOGUE, type ReadinessStepKey } from './readiness-steps.js';
import { REVERIFY_CAUSES, reverifyDropBack } from './reverify.js';

// The step order is the trade's (NAVEDTRA 14310, Aviation Boatswain's Mate E 3 & 2, catapult launching
// procedures: deflectors raised before tension, tension, full-power turn-up, the pilot's salute or
// navigation lights steady at night, the safety observer's final check, then fire). Who may suspend
// (crew, pilot, air boss) and the 10 s undo are Catline's rules from its issue, no published source.

const steps = DEFAULT_READINESS_STEPS;
const fresh: SlotReadiness = {
  status: 'planned',
  placeInLane: 0,
  agreedWeight: null,
  pilotAnswer: null,
  reverify: null,
  settingReadBack: null,
  lastStep: null,
};
/** The approved setting for 44,000 lb in these examples (an invented table row). */
const APPROVED = 18;
const officer: ReadinessActor = { id: 11, role: 'catapult_officer', atThisCatapult: true, fliesIt: false };
const operator: ReadinessActor = { id: 12, role: 'deck_edge_operator', atThisCatapult: true, fliesIt: false };

/** Takes `slot` through the steps up to `to` as the officer, agreeing 44,000 lb and reading back its setting. */
function stepTo(to: ReadinessStepKey, slot = fresh): SlotReadiness {
  let state = slot;
  for (const step of steps.slice(0, steps.indexOf(to) + 1)) {
    const result = readinessTransition(steps, state, officer, {
      kind: 'advance',
      to: step,
      at: 0,
      agreedWeight: 44_000,
      settingReadBack: APPROVED,
      approvedSetting: APPROVED,
    });
    if (!result.ok) throw new Error(`${step}: ${result.code}`);
    state = result.state;
  }
  return state;
}

describe('readinessTransition', () => {
  it('takes the trade’s steps one tap at a time, then launches from pilot ready', () => {
    expect(steps).toEqual([
      'taxiing',
      'on_catapult',
      'weight_agreed',
      'setting_set',
      'deflector_up',
      'tensioned',
      'run_up',
      'checks_clear',
      'pilot_ready',
    ]);
    const ready = stepTo('pilot_ready');
    expect(readinessTransition(steps, ready, operator, { kind: 'launch', refusals: [] })).toMatchObject({
      ok: true,
      state: { status: 'launched' },
    });
    expect(readinessTransition(steps, stepTo('run_up'), operator, { kind: 'launch', refusals: [] })).toEqual({
      ok: false,
      code: 'wrong_step',
    });
  });

  it('refuses a skipped step', () => {
    expect(readinessTransition(steps, fresh, officer, { kind: 'advance', to: 'on_catapult', at: 0 })).toEqual({
      ok: false,
      code: 'wrong_step',
    });
  });

  it('lets the next aircraft taxi and wait behind the deflector, and no further', () => {
    const behind = { ...fresh, placeInLane: 1 };
    const taxied = readinessTransition(steps, behind, officer, { kind: 'advance', to: 'taxiing', at: 0 });
    expect(taxied).toMatchObject({ ok: true, state: { status: 'taxiing' } });
    const hooked = readinessTransition(steps, { ...behind, status: 'taxiing' }, officer, {
      kind: 'advance',
      to: 'on_catapult',
      at: 0,
    });
    expect(hooked).toEqual({ ok: false, code: 'not_current_aircraft' });
    expect(
      readinessTransition(steps, { ...fresh, placeInLane: 2 }, officer, { kind: 'advance', to: 'taxiing', at: 0 }),
    ).toEqual({ ok: false, code: 'not_current_aircraft' });
  });

  it('records the weight the pilot answered from the tablet, and refuses another figure', () => {
    const hooked = { ...stepTo('on_catapult'), pilotAnswer: 45_500 };
    const record = (agreedWeight: number) =>
      readinessTransition(steps, hooked, operator, { kind: 'advance', to: 'weight_agreed', at: 0, agreedWeight });
    expect(record(44_000)).toEqual({ ok: false, code: 'weight_mismatch' });
    expect(record(45_500)).toMatchObject({ ok: true, state: { status: 'weight_agreed', agreedWeight: 45_500 } });
  });

  it('takes the setting read back from the console only when it equals the approved one', () => {
    const agreed = stepTo('weight_agreed');
    const readBack = (settingReadBack: number | undefined, approvedSetting: number | null = APPROVED) =>
      readinessTransition(steps, agreed, operator, {
        kind: 'advance',
        to: 'setting_set',
        at: 0,
        settingReadBack,
        approvedSetting,
      });
    expect(readBack(17)).toEqual({ ok: false, code: 'setting_mismatch' });
    expect(readBack(undefined)).toEqual({ ok: false, code: 'setting_not_read_back' });
    expect(readBack(18, null)).toEqual({ ok: false, code: 'approved_setting_missing' });
    expect(readBack(18)).toMatchObject({ ok: true, state: { status: 'setting_set', settingReadBack: 18 } });
  });

  it('keeps one person able to agree the weight and read the setting back', () => {
    // Catline's choice: a ship with one catapult officer on a catapult must still launch; the record
    // names both people, the rule does not demand two.
    expect(stepTo('setting_set')).toMatchObject({ status: 'setting_set', settingReadBack: APPROVED });
  });

  it('forgets the read-back when the aircraft goes back before it', () => {
    const set = stepTo('deflector_up');
    const suspended = readinessTransition(steps, set, officer, { kind: 'suspend' });
    if (!suspended.ok) throw new Error(suspended.code);
    expect(suspended.state.settingReadBack).toBe(APPROVED);
    expect(readinessTransition(steps, suspended.state, officer, { kind: 'resume' })).toMatchObject({
      ok: true,
      state: { status: 'on_catapult', settingReadBack: null },
    });
  });

  it('lets the person who took a step undo it within 10 s, and nobody else', () => {
    const set = readinessTransition(steps, stepTo('weight_agreed'), operator, {
      kind: 'advance',
      to: 'setting_set',
      at: 1_000,
      settingReadBack: APPROVED,
      approvedSetting: APPROVED,
    });
    if (!set.ok) throw new Error(set.code);
    const undoBy = (actor: ReadinessActor, at: number) =>
      readinessTransition(steps, set.state, actor, { kind: 'undo', at });
    expect(undoBy(officer, 2_000)).toEqual({ ok: false, code: 'not_your_step' });
    expect(undoBy(operator, 1_000 + UNDO_WINDOW_MS + 1)).toEqual({ ok: false, code: 'undo_expired' });
    expect(undoBy(operator, 1_000 + UNDO_WINDOW_MS)).toMatchObject({
      ok: true,
      state: { status: 'weight_agreed', settingReadBack: null },
    });
  });

  it('lets the crew, the pilot and the air boss suspend, and nobody else', () => {
    const tensioned = stepTo('tensioned');
    const suspendBy = (actor: Partial<ReadinessActor>) =>
      readinessTransition(steps, tensioned, { ...officer, ...actor }, { kind: 'suspend' });
    for (const role of ['catapult_officer', 'deck_edge_operator'])
      expect(suspendBy({ role })).toMatchObject({ ok: true, state: { status: 'suspended' } });
    expect(suspendBy({ role: 'pilot', atThisCatapult: false, fliesIt: true })).toMatchObject({ ok: true });
    expect(suspendBy({ role: 'air_boss', atThisCatapult: false })).toMatchObject({ ok: true });
    expect(suspendBy({ role: 'pilot', atThisCatapult: false, fliesIt: false })).toEqual({
      ok: false,
      code: 'not_your_slot',
    });
    expect(suspendBy({ role: 'handler', atThisCatapult: false })).toEqual({ ok: false, code: 'forbidden_role' });
    expect(suspendBy({ atThisCatapult: false })).toEqual({ ok: false, code: 'not_your_catapult' });
  });

  it('takes a hangfire only once tension is taken, into suspend', () => {
    expect(readinessTransition(steps, stepTo('deflector_up'), officer, { kind: 'hangfire' })).toEqual({
      ok: false,
      code: 'wrong_step',
    });
    expect(readinessTransition(steps, stepTo('run_up'), officer, { kind: 'hangfire' })).toMatchObject({
      ok: true,
      state: { status: 'suspended' },
    });
  });

  it('takes the reason for a suspend afterwards, from whoever may suspend, only while suspended', () => {
    const suspended: SlotReadiness = { ...stepTo('tensioned'), status: 'suspended', lastStep: null };
    const pilot = { ...officer, role: 'pilot', atThisCatapult: false, fliesIt: true };
    expect(readinessTransition(steps, suspended, pilot, { kind: 'suspend_reason' })).toEqual({
      ok: true,
      state: suspended,
    });
    expect(readinessTransition(steps, suspended, { ...pilot, fliesIt: false }, { kind: 'suspend_reason' })).toEqual({
      ok: false,
      code: 'not_your_slot',
    });
    expect(readinessTransition(steps, stepTo('tensioned'), officer, { kind: 'suspend_reason' })).toEqual({
      ok: false,
      code: 'wrong_step',
    });
  });

  it('takes a suspected cold shot only on a launched aircraft, and leaves it launched', () => {
    const launched: SlotReadiness = { ...stepTo('pilot_ready'), status: 'launched', lastStep: null };
    expect(readinessTransition(steps, launched, officer, { kind: 'cold_shot' })).toEqual({ ok: true, state: launched });
    expect(readinessTransition(steps, stepTo('pilot_ready'), officer, { kind: 'cold_shot' })).toEqual({
      ok: false,
      code: 'wrong_step',
    });
    expect(readinessTransition(steps, launched, { ...officer, role: 'pilot' }, { kind: 'cold_shot' })).toEqual({
      ok: false,
      code: 'forbidden_role',
    });
  });

  it('refuses a launch with the first gate that refuses, hard or soft', () => {
    const ready = stepTo('pilot_ready');
    expect(
      readinessTransition(steps, ready, officer, {
        kind: 'launch',
        refusals: ['crosswind_over_limit', 'wind_reading_stale'],
      }),
    ).toEqual({ ok: false, code: 'crosswind_over_limit' });
  });
});

// The model run: random commands by every role against a lane of three aircraft, with the figures
// changing under them now and then.
const ROLES = [
  'admin',
  'air_operations',
  'air_boss',
  'handler',
  'catapult_officer',
  'deck_edge_operator',
  'pilot',
  'observer',
] as const;
const CATAPULT_ROLES: readonly string[] = ['catapult_officer', 'deck_edge_operator'];
const GATE_OR_READINESS: readonly string[] = [...READINESS_REFUSALS, ...LAUNCH_GATES];

type Step =
  | { kind: 'command'; slot: number; actor: ReadinessActor; command: Drawn }
  /** `setting`: the approved setting for the agreed weight under the new figures. */
  | { kind: 'figures_changed'; cause: (typeof REVERIFY_CAUSES)[number]; setting: number | null }
  | { kind: 'pilot_answers'; slot: number; weight: number };

// Mostly the catapult's own crew taking the next step, so runs get far along the steps; the rest of the
// time anyone asking anything.
const actorArb = fc.oneof(
  {
    weight: 6,
    arbitrary: fc.record({
      id: fc.integer({ min: 1, max: 2 }),
      role: fc.constantFrom('catapult_officer', 'deck_edge_operator'),
      atThisCatapult: fc.constant(true),
      fliesIt: fc.constant(false),
    }),
  },
  {
    weight: 2,
    arbitrary: fc.record({
      id: fc.integer({ min: 1, max: 4 }),
      role: fc.constantFrom(...ROLES),
      atThisCatapult: fc.boolean(),
      fliesIt: fc.boolean(),
    }),
  },
);
/**
 * 'next' is the slot's next step in the ship's order, resolved when the command is sent; a read-back of
 * 'approved' is the approved setting at that moment, 'off by one' one above it.
 */
type ReadBack = 'approved' | 'off by one' | undefined;
type Drawn =
  | Exclude<ReadinessCommand, { kind: 'advance' }>
  | {
      kind: 'advance';
      to: ReadinessStepKey | 'next';
      at: number;
      agreedWeight?: number;
      readBack: ReadBack;
    };
const commandArb: fc.Arbitrary<Drawn> = fc.oneof(
  {
    weight: 12,
    arbitrary: fc.record({
      kind: fc.constant('advance' as const),
      to: fc.oneof(
        { weight: 5, arbitrary: fc.constant('next' as const) },
        fc.constantFrom(...READINESS_STEP_CATALOGUE),
      ),
      at: fc.integer({ min: 0, max: 30_000 }),
      agreedWeight: fc.option(fc.constantFrom(44_000, 45_500), { nil: undefined, freq: 4 }),
      readBack: fc.constantFrom<ReadBack>('approved', 'approved', 'approved', 'off by one', undefined),
    }),
  },
  fc.record({ kind: fc.constant('undo' as const), at: fc.integer({ min: 0, max: 30_000 }) }),
  fc.constant({ kind: 'suspend' as const }),
  fc.constant({ kind: 'suspend_reason' as const }),
  fc.constant({ kind: 'resume' as const }),
  {
    weight: 3,
    arbitrary: fc.record({
      kind: fc.constant('launch' as const),
      refusals: fc.subarray([...HARD_LAUNCH_GATES, ...SOFT_LAUNCH_GATES], { maxLength: 2 }),
    }),
  },
  fc.constant({ kind: 'hangfire' as const }),
  fc.constant({ kind: 'cold_shot' as const }),
  fc.record({
    kind: fc.constant('down_on_catapult' as const),
    outcome: fc.constantFrom('pool' as const, 'down' as const),
  }),
);
const stepArb: fc.Arbitrary<Step> = fc.oneof(
  {
    weight: 12,
    arbitrary: fc.record({
      kind: fc.constant('command' as const),
      slot: fc.nat(2),
      actor: actorArb,
      command: commandArb,
    }),
  },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant('figures_changed' as const),
      cause: fc.constantFrom(...REVERIFY_CAUSES),
      setting: fc.option(fc.integer({ min: 11, max: 20 }), { freq: 6 }),
    }),
  },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant('pilot_answers' as const),
      slot: fc.nat(2),
      weight: fc.constantFrom(44_000, 45_500),
    }),
  },
);

const GONE = ['launched', 'down', 'planned-out'];

/** The drawn step command as sent: the next step resolved, the weight the pilot answered, the read-back. */
function resolve(
  drawn: Extract<Drawn, { kind: 'advance' }>,
  before: SlotReadiness,
  approved: number | null,
): ReadinessCommand {
  const { readBack, ...rest } = drawn;
  const next = drawn.to === 'next';
  const settingReadBack =
    readBack === undefined || approved === null ? undefined : readBack === 'approved' ? approved : approved + 1;
  return {
    ...rest,
    to: next ? (nextStep(steps, before.status) ?? 'taxiing') : (drawn.to as ReadinessStepKey),
    agreedWeight:
      next && drawn.agreedWeight !== undefined ? (before.pilotAnswer ?? drawn.agreedWeight) : drawn.agreedWeight,
    settingReadBack,
    approvedSetting: approved,
  };
}

describe('readiness model run', () => {
  it('never reaches an illegal state, never launches past a gate, and names every refusal', () => {
    fc.assert(
      fc.property(fc.array(stepArb, { minLength: 60, maxLength: 200 }), (run) => {
        // A slot sent back to the deck pool leaves the lane ('planned-out' in the model).
        const lane: (SlotReadiness & { out?: boolean })[] = [fresh, fresh, fresh].map((slot) => ({ ...slot }));
        // The approved setting for the agreed weight under the figures of the moment; the same for every
        // aircraft of the lane, which is enough to tell a current read-back from a stale one.
        let approved: number | null = APPROVED;
        const place = (index: number) =>
          lane.slice(0, index).filter((slot) => !slot.out && !GONE.includes(slot.status)).length;
        for (const step of run) {
          if (step.kind === 'figures_changed') {
            approved = step.setting;
            lane.forEach((slot, index) => {
              const back = reverifyDropBack(steps, slot.status, step.cause);
              if (back)
                lane[index] = {
                  ...slot,
                  status: back.to as ReadinessStepKey,
                  reverify: step.cause,
                  agreedWeight: back.weightAgreementVoid ? null : slot.agreedWeight,
                  settingReadBack: null,
                  lastStep: null,
                };
            });
            continue;
          }
          if (step.kind === 'pilot_answers') {
            lane[step.slot] = { ...lane[step.slot], pilotAnswer: step.weight };
            continue;
          }
          const before = lane[step.slot];
          if (before.out) continue;
          const drawn = step.command;
          const command: ReadinessCommand = drawn.kind === 'advance' ? resolve(drawn, before, approved) : drawn;
          const result = readinessTransition(steps, { ...before, placeInLane: place(step.slot) }, step.actor, command);
          // The crew's launch past a closed gate is refused with that gate's code, whatever else holds.
          const crew = CATAPULT_ROLES.includes(step.actor.role) && step.actor.atThisCatapult;
          if (crew && command.kind === 'launch' && command.refusals.length > 0)
            expect(result).toEqual({ ok: false, code: command.refusals[0] });
          if (!result.ok) {
            expect(GATE_OR_READINESS).toContain(result.code);
            continue;
          }
          const after = result.state;
          // Only the catapult's own crew moves an aircraft, bar a suspend.
          // A reason changes nothing of where the aircraft stands.
          if (command.kind === 'suspend_reason') expect(after.status).toBe('suspended');
          if (command.kind !== 'suspend' && command.kind !== 'suspend_reason') {
            expect(CATAPULT_ROLES).toContain(step.actor.role);
            expect(step.actor.atThisCatapult).toBe(true);
          }
          if (after.status === 'launched') {
            expect(command).toMatchObject({ kind: 'launch', refusals: [] });
            expect(before.status).toBe(steps[steps.length - 1]);
            expect(place(step.slot)).toBe(0);
          }
          // A suspected cold shot is a report: the aircraft has gone and stays gone.
          if (command.kind === 'cold_shot') expect(after.status).toBe('launched');
          if (command.kind === 'advance' && after.status !== 'taxiing') expect(place(step.slot)).toBe(0);
          lane[step.slot] = { ...after, out: command.kind === 'down_on_catapult' && after.status === 'planned' };
          if (command.kind === 'advance' && command.to === 'setting_set')
            expect(command.settingReadBack).toBe(command.approvedSetting);
          for (const slot of lane) {
            if (slot.status === 'weight_agreed' || isPast(slot.status, 'weight_agreed'))
              expect(slot.agreedWeight).not.toBeNull();
            // Past the read-back, the figure read back is the approved setting under today's figures.
            if (slot.status === 'setting_set' || isPast(slot.status, 'setting_set')) {
              expect(slot.reverify).toBeNull();
              expect(slot.settingReadBack).toBe(approved);
            } else if (slot.status !== 'suspended' && slot.status !== 'launched') {
              expect(slot.settingReadBack).toBeNull();
            }
          }
          // At most one aircraft of the lane is past the deflector at a time.
          expect(lane.filter((slot) => !slot.out && isPast(slot.status, 'taxiing')).length).toBeLessThanOrEqual(1);
        }
      }),
    );
  });
});
