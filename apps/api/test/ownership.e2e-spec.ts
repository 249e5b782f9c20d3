import type { INestApplication } from '@nestjs/common';
import type { LineupSnapshot, ReadinessStep, SlotView } from '@catline/contracts';
import { LineupDriver, catapultOfficer, deckEdgeOperator, launchKey, pilot } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

// Ownership, not just role: one aircraft on cat 1, flown by OWNER_PILOT, is taken through every command
// that acts on one catapult's lane or one pilot's slot. Before its owner sends each command, the same
// command goes first from people of the same role who do not own it (the crew of cat 2, another pilot,
// for an undo also the other crew member of cat 1): each is refused with 403 and leaves the lineup as it
// was. The tests run in order on the one aircraft, each going on from where the one before left it.
const OWNER_PILOT = pilot(11);
const OTHER_PILOT = pilot(12);
const CAT_1 = catapultOfficer(1);

type Ownership = 'not_your_catapult' | 'not_your_slot' | 'not_your_step';
/** Who must be refused, and with which code. */
type Strangers = ReadonlyArray<readonly [email: string, code: Ownership]>;

const OTHER_CREW: Strangers = [
  [catapultOfficer(2), 'not_your_catapult'],
  [deckEdgeOperator(2), 'not_your_catapult'],
];
const OTHER_PILOTS: Strangers = [[OTHER_PILOT, 'not_your_slot']];

describe('ownership of catapult and slot commands', () => {
  let app: INestApplication;
  let deck: LineupDriver;
  let cycleId: number;
  let slotId: number;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    deck = new LineupDriver(started.url);
    cycleId = (await deck.createCycle()).id;
    slotId = (await deck.addSlot(cycleId, 'C21', { pilotEmail: OWNER_PILOT })).id;
    await deck.place(cycleId, slotId, 1);
    await deck.start(cycleId);
  });

  afterAll(async () => {
    await app.close();
  });

  /** What a refused command must leave alone: every slot, every lane with its catapult, the pool, the version. */
  const lineup = ({ version, lanes, pool, slots }: LineupSnapshot) => ({ version, lanes, pool, slots });

  /** Strangers first, refused (see refusedTo); then `owner`, taken: the strangers were refused a command that works. */
  async function ownedBy(
    owner: string,
    strangers: Strangers,
    command: string,
    body: (slot: SlotView) => object,
  ): Promise<SlotView> {
    await refusedTo(strangers, command, body);
    const path = `/api/cycles/${cycleId}/lineup/slots/${slotId}/${command}`;
    const answer = await deck.call(owner, 'post', path, body(await deck.slot(cycleId, slotId)));
    expect({ owner, command, status: answer.status, body: answer.body }).toMatchObject({ status: 200 });
    return deck.slot(cycleId, slotId);
  }

  /** Sends `command`, built on the slot as it stands, as each stranger: refused, and nothing changed. */
  async function refusedTo(strangers: Strangers, command: string, body: (slot: SlotView) => object): Promise<void> {
    const path = `/api/cycles/${cycleId}/lineup/slots/${slotId}/${command}`;
    for (const [stranger, code] of strangers) {
      const before = await deck.snapshot(cycleId);
      const slot = before.slots.find((candidate) => candidate.id === slotId)!;
      const response = await deck.call(stranger, 'post', path, body(slot));
      const after = await deck.snapshot(cycleId);
      expect({ stranger, command, status: response.status, code: response.body.code }).toEqual({
        stranger,
        command,
        status: 403,
        code,
      });
      expect(lineup(after)).toEqual(lineup(before));
    }
  }

  const slotVersion = (slot: SlotView) => ({ slotVersion: slot.version });
  const advance = (to: ReadinessStep | 'resume') => (slot: SlotView) => ({
    slotVersion: slot.version,
    to,
    ...(to === 'weight_agreed' ? { agreedWeightLb: slot.pilotWeightAckLb ?? slot.grossWeightLb } : {}),
    ...(to === 'setting_set' ? { settingReadBack: slot.figures?.catapultSetting } : {}),
  });

  /** The ship's readiness steps from where the slot stands up to `last` (every one by default). */
  async function stepsUpTo(last?: ReadinessStep): Promise<SlotView> {
    const { readinessSteps } = await deck.snapshot(cycleId);
    let slot = await deck.slot(cycleId, slotId);
    const from = slot.status === 'planned' ? 0 : readinessSteps.indexOf(slot.status as ReadinessStep) + 1;
    const to = last === undefined ? readinessSteps.length - 1 : readinessSteps.indexOf(last);
    for (const next of readinessSteps.slice(from, to + 1)) {
      slot = await ownedBy(CAT_1, OTHER_CREW, 'advance', advance(next));
      expect(slot.status).toBe(next);
    }
    return slot;
  }

  it("refuses another pilot's weight answer, agreeing or correcting", async () => {
    const planned = (await deck.slot(cycleId, slotId)).grossWeightLb;
    const corrected = planned + 600;
    const answered = await ownedBy(OWNER_PILOT, OTHER_PILOTS, 'weight-ack', (slot) => ({
      slotVersion: slot.version,
      grossWeightLb: corrected,
    }));
    expect(answered.pilotWeightAckLb).toBe(corrected);
    // After the agreement a different figure drops the aircraft back to agree again: only its pilot's does.
    expect((await stepsUpTo('weight_agreed')).agreedWeightLb).toBe(corrected);
    const back = await ownedBy(OWNER_PILOT, OTHER_PILOTS, 'weight-ack', (slot) => ({
      slotVersion: slot.version,
      grossWeightLb: planned,
    }));
    expect(back).toMatchObject({ pilotWeightAckLb: planned, status: 'on_catapult', agreedWeightLb: null });
  });

  it("refuses every readiness step to the other catapult's crew, and an undo to whoever did not take the step", async () => {
    const strangersToUndo: Strangers = [...OTHER_CREW, [deckEdgeOperator(1), 'not_your_step']];
    // Signed in before the step: a sign-in (argon2) inside the undo's 10 s on a loaded machine let the window close.
    await Promise.all(strangersToUndo.map(([email]) => deck.token(email)));
    expect((await stepsUpTo('weight_agreed')).agreedWeightLb).toBe((await deck.slot(cycleId, slotId)).grossWeightLb);
    const undone = await ownedBy(CAT_1, strangersToUndo, 'undo', slotVersion);
    expect(undone).toMatchObject({ status: 'on_catapult', agreedWeightLb: null });
    expect((await stepsUpTo()).status).toBe('pilot_ready');
  });

  it('refuses a suspend, its reason and the resume to the other catapult’s crew and another pilot', async () => {
    const suspended = await ownedBy(OWNER_PILOT, [...OTHER_CREW, ...OTHER_PILOTS], 'suspend', slotVersion);
    expect(suspended.status).toBe('suspended');
    const reason = (slot: SlotView) => ({ slotVersion: slot.version, reason: 'pilot' });
    expect(
      (await ownedBy(OWNER_PILOT, [...OTHER_CREW, ...OTHER_PILOTS], 'suspend-reason', reason)).suspendReason,
    ).toBeTruthy();
    expect((await ownedBy(CAT_1, OTHER_CREW, 'advance', advance('resume'))).status).toBe('on_catapult');
  });

  it("refuses the other catapult's crew a hangfire, a return to the pool and down on the catapult", async () => {
    await stepsUpTo('tensioned');
    expect((await ownedBy(CAT_1, OTHER_CREW, 'hangfire', slotVersion)).status).toBe('suspended');
    await ownedBy(CAT_1, OTHER_CREW, 'advance', advance('resume'));
    // Only a catapult officer (of its catapult) or the handler returns an aircraft to the pool.
    const returned = await ownedBy(CAT_1, OTHER_CREW.slice(0, 1), 'return', (slot) => ({
      slotVersion: slot.version,
      reason: 'Ownership check',
    }));
    expect(returned).toMatchObject({ status: 'planned', catapultId: null });
    await deck.place(cycleId, slotId, 1, 0);
    await stepsUpTo('on_catapult');
    const down = await ownedBy(CAT_1, OTHER_CREW, 'down-on-catapult', (slot) => ({
      slotVersion: slot.version,
      outcome: 'pool',
    }));
    expect(down).toMatchObject({ status: 'planned', catapultId: null });
  });

  it("refuses the other catapult's crew the launch and a cold shot reported on it", async () => {
    await deck.place(cycleId, slotId, 1, 0);
    expect((await stepsUpTo()).status).toBe('pilot_ready');
    const key = launchKey();
    expect(
      (await ownedBy(CAT_1, OTHER_CREW, 'launch', (slot) => ({ slotVersion: slot.version, idempotencyKey: key })))
        .status,
    ).toBe('launched');
    // The owner's cold shot would take the ship's shared cat 1 down for every other spec: strangers only.
    await refusedTo(OTHER_CREW, 'cold-shot', slotVersion);
  });
});
