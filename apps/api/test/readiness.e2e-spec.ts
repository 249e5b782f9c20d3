import type { INestApplication } from '@nestjs/common';
import { HANDLER, LineupDriver, catapultOfficer, launchKey, pilot } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

describe('readiness steps and launch', () => {
  let app: INestApplication;
  let deck: LineupDriver;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    deck = new LineupDriver(started.url);
  });

  afterAll(async () => {
    await app.close();
  });

  /** An executing cycle with two aircraft on cat 1 (the first flown by `pilotEmail`) and one on cat 2. */
  async function executingCycle(pilotEmail: string, conditions = {}) {
    const cycle = await deck.createCycle(conditions);
    const first = await deck.addSlot(cycle.id, 'C21', { pilotEmail });
    const second = await deck.addSlot(cycle.id, 'C22');
    const other = await deck.addSlot(cycle.id, 'D33');
    await deck.place(cycle.id, first.id, 1);
    await deck.place(cycle.id, second.id, 1);
    await deck.place(cycle.id, other.id, 2);
    await deck.start(cycle.id);
    return { cycle, first, second, other };
  }

  it('refuses a step by the officer of another catapult with 403', async () => {
    const { cycle, first } = await executingCycle(pilot(4));
    const response = await deck.step(cycle.id, first.id, 'taxiing', catapultOfficer(2));
    expect(response.status).toBe(403);
    expect(response.body).toMatchObject({ code: 'not_your_catapult', message: 'C21 is not on your catapult (cat 2).' });
  });

  it('refuses a skipped step, and a step for the aircraft behind the current one, with 409', async () => {
    const { cycle, first, second } = await executingCycle(pilot(4));
    const skipped = await deck.step(cycle.id, first.id, 'on_catapult');
    expect(skipped.status).toBe(409);
    expect(skipped.body).toMatchObject({
      code: 'wrong_step',
      message: 'C21 is planned; the next step is taxiing, not on catapult.',
    });
    const behind = await deck.step(cycle.id, second.id, 'taxiing');
    expect(behind.status).toBe(409);
    expect(behind.body).toMatchObject({ code: 'not_current_aircraft', message: 'C22 is not next on cat 1; C21 is.' });
  });

  it('refuses readiness steps before the cycle executes', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C23');
    await deck.place(cycle.id, slot.id, 1);
    const response = await deck.step(cycle.id, slot.id, 'taxiing');
    expect(response.status).toBe(409);
    expect(response.body.code).toBe('cycle_not_executing');
  });

  it('refuses weight agreement and launch until the pilot has acknowledged the weight', async () => {
    const { cycle, first } = await executingCycle(pilot(5));
    expect((await deck.step(cycle.id, first.id, 'taxiing')).status).toBe(200);
    expect((await deck.step(cycle.id, first.id, 'on_catapult')).status).toBe(200);

    const agreed = await deck.step(cycle.id, first.id, 'weight_agreed');
    expect(agreed.status).toBe(409);
    expect(agreed.body).toMatchObject({
      code: 'weight_not_agreed',
      message: 'The pilot of C21 has not acknowledged the gross weight of 44,000 lb yet.',
    });
    const launch = await deck.launch(cycle.id, await deck.slot(cycle.id, first.id), launchKey());
    expect(launch.status).toBe(409);
    expect(launch.body.code).toBe('wrong_step');

    await deck.acknowledgeWeight(cycle.id, first.id, pilot(5));
    expect((await deck.step(cycle.id, first.id, 'weight_agreed')).status).toBe(200);
    const slot = await deck.slot(cycle.id, first.id);
    expect(slot.pilotWeightAckAt).not.toBeNull();
    expect(slot.catapultWeightAckAt).not.toBeNull();
  });

  it('lets only the pilot of the slot acknowledge, and only the planned weight', async () => {
    const { cycle, first } = await executingCycle(pilot(6));
    const slot = await deck.slot(cycle.id, first.id);
    const path = `/api/cycles/${cycle.id}/lineup/slots/${slot.id}/weight-ack`;
    const stranger = await deck.call(pilot(7), 'post', path, { slotVersion: slot.version, grossWeightLb: 44_000 });
    expect(stranger.status).toBe(403);
    expect(stranger.body.code).toBe('not_your_slot');
    const wrong = await deck.call(pilot(6), 'post', path, { slotVersion: slot.version, grossWeightLb: 43_000 });
    expect(wrong.status).toBe(409);
    expect(wrong.body).toMatchObject({
      code: 'weight_mismatch',
      message:
        'You entered 43,000 lb; the planned gross weight of C21 is 44,000 lb. Settle it with the catapult officer.',
    });
  });

  it('suspends with a reason, resumes to on catapult, and launches after the steps again', async () => {
    const { cycle, first } = await executingCycle(pilot(8));
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilot(8));
    const suspended = await deck.call(
      catapultOfficer(1),
      'post',
      `/api/cycles/${cycle.id}/lineup/slots/${first.id}/suspend`,
      {
        slotVersion: ready.version,
        reason: 'Launch bar not seated',
      },
    );
    expect(suspended.status).toBe(200);
    expect(suspended.body.change.summary).toBe('C21 suspended on cat 1: Launch bar not seated');
    expect((await deck.launch(cycle.id, await deck.slot(cycle.id, first.id), launchKey())).status).toBe(409);

    expect((await deck.step(cycle.id, first.id, 'resume')).status).toBe(200);
    const resumed = await deck.slot(cycle.id, first.id);
    expect(resumed).toMatchObject({ status: 'on_catapult', suspendReason: null, catapultWeightAckAt: null });
    expect((await deck.step(cycle.id, first.id, 'weight_agreed')).status).toBe(200);
    expect((await deck.step(cycle.id, first.id, 'tensioned')).status).toBe(200);
    expect((await deck.launch(cycle.id, await deck.slot(cycle.id, first.id), launchKey())).status).toBe(200);
  });

  it('refuses a no-go launch without an override reason and records the reason when given', async () => {
    // Wind from 60° off the bow at 30 kt while the ship lies still: far over the 15 kt crosswind limit.
    const { cycle, first } = await executingCycle(pilot(9), {
      shipSpeedKt: 0,
      trueWindFromDeg: 60,
      trueWindSpeedKt: 30,
    });
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilot(9));
    expect(ready.figures!.go).toBe(false);

    const refused = await deck.launch(cycle.id, ready, launchKey());
    expect(refused.status).toBe(409);
    expect(refused.body.code).toBe('no_go');
    expect(refused.body.message).toContain('Crosswind');

    const overridden = await deck.launch(cycle.id, ready, launchKey(), {
      overrideReason: 'Air boss accepts the crosswind',
    });
    expect(overridden.status).toBe(200);
    expect(overridden.body.change.summary).toBe('C21 launched from cat 1 on override: Air boss accepts the crosswind');
    const launched = await deck.slot(cycle.id, first.id);
    expect(launched.overrideReason).toBe('Air boss accepts the crosswind');
    expect(launched.launchRecord).toMatchObject({ go: false, waiver: 'Air boss accepts the crosswind' });
    expect(launched.launchRecord!.reasons.map((reason) => reason.code)).toContain('crosswind_over_limit');
  });

  it('refuses a launch from a catapult marked down, even with an override', async () => {
    const { cycle, first } = await executingCycle(pilot(2));
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilot(2));
    const catapultId = await deck.catapultId(1);
    const path = `/api/cycles/${cycle.id}/lineup/catapults/${catapultId}/status`;
    await deck.ok(HANDLER, 'post', path, { status: 'down', basisStatus: 'up' });
    try {
      const response = await deck.launch(cycle.id, await deck.slot(cycle.id, first.id), launchKey(), {
        overrideReason: 'Try anyway',
      });
      expect(response.status).toBe(409);
      expect(response.body).toMatchObject({ code: 'catapult_unavailable', message: 'Cat 1 is down.' });
    } finally {
      await deck.ok(HANDLER, 'post', path, { status: 'up', basisStatus: 'down' });
    }
    expect(ready.status).toBe('tensioned');
  });
});
