import type { INestApplication } from '@nestjs/common';
import {
  AIR_OPS,
  HANDLER,
  LineupDriver,
  catapultOfficer,
  deckEdgeOperator,
  launchKey,
  pilot,
} from './support/lineup-fixtures.js';
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
    expect(launch.body.code).toBe('weight_not_agreed');

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

  // WKD-41 (demo type, invented): maximum 51,000 lb, crosswind limit 15 kt, recommended excess 12 kt,
  // minimum launch airspeed 151 kt at 51,000 lb; the demo catapults give it at most 186.8 kt at 51,000 lb
  // (launch-math's energy model). The ship lies still so the true wind is the wind over the deck, in
  // standard sea-level air (15 °C, 1013.25 hPa: ICAO standard atmosphere) so no hot-day correction applies.
  const tailwind = (kt: number) => ({
    shipSpeedKt: 0,
    trueWindFromDeg: 180,
    trueWindSpeedKt: kt,
    temperatureC: 15,
    pressureHpa: 1013.25,
  });

  it.each([
    ['over_max_gross_weight', {}, 52_000, 'Gross weight 52,000 lb is over the WKD-41 maximum of 51,000 lb.'],
    // 30 kt from 60° off the bow: about 26 kt across cat 1, over the 15 kt limit.
    ['crosswind_over_limit', { shipSpeedKt: 0, trueWindFromDeg: 60, trueWindSpeedKt: 30 }, 44_000, 'Crosswind'],
    // 45 kt of tailwind: excess -45 - (151 - 186.8) = -9.2 kt, below zero.
    ['end_speed_below_minimum', tailwind(45), 51_000, 'Excess wind over deck -9.'],
  ] as const)(
    'refuses a launch past the hard limit %s with its code, and no waiver opens it',
    async (code, conditions, weight, words) => {
      const cycle = await deck.createCycle(conditions);
      const slot = await deck.addSlot(cycle.id, 'C21', { pilotEmail: pilot(9), grossWeightLb: weight });
      await deck.place(cycle.id, slot.id, 1);
      await deck.start(cycle.id);
      const ready = await deck.readyToLaunch(cycle.id, slot.id, pilot(9));
      expect(ready.gates).toEqual(expect.arrayContaining([expect.objectContaining({ gate: code, soft: false })]));

      const refused = await deck.launch(cycle.id, ready, launchKey());
      expect(refused.status).toBe(409);
      expect(refused.body.code).toBe(code);
      expect(refused.body.message).toContain(words);
      const waiver = await deck.waive(cycle.id, slot.id, code, 'Try anyway');
      expect(waiver.status).toBe(400);
      const refusedAgain = await deck.launch(
        cycle.id,
        await deck.slot(cycle.id, slot.id),
        launchKey(),
        deckEdgeOperator(1),
      );
      expect(refusedAgain.body.code).toBe(code);
      expect((await deck.slot(cycle.id, slot.id)).status).toBe('tensioned');
    },
  );

  it('takes a launch field for no-go no more: the request refuses an override reason', async () => {
    const { cycle, first } = await executingCycle(pilot(3));
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilot(3));
    const response = await deck.call(
      catapultOfficer(1),
      'post',
      `/api/cycles/${cycle.id}/lineup/slots/${first.id}/launch`,
      {
        slotVersion: ready.version,
        idempotencyKey: launchKey(),
        overrideReason: 'Launch despite no-go',
      },
    );
    expect(response.status).toBe(400);
    expect((await deck.slot(cycle.id, first.id)).status).toBe('tensioned');
  });

  it('launches a soft limit only under the air boss’s waiver, marked on the record', async () => {
    // 30 kt of tailwind: excess -30 - (151 - 186.8) = 5.8 kt, above zero but under the 12 kt recommended.
    const cycle = await deck.createCycle(tailwind(30));
    const slot = await deck.addSlot(cycle.id, 'C22', { pilotEmail: pilot(8), grossWeightLb: 51_000 });
    await deck.place(cycle.id, slot.id, 1);
    await deck.start(cycle.id);
    const ready = await deck.readyToLaunch(cycle.id, slot.id, pilot(8));
    expect(ready.gates).toEqual([
      expect.objectContaining({ gate: 'excess_below_recommended', soft: true, waived: false }),
    ]);
    expect((await deck.launch(cycle.id, ready, launchKey())).body.code).toBe('excess_below_recommended');

    const byOfficer = await deck.call(
      catapultOfficer(1),
      'post',
      `/api/cycles/${cycle.id}/lineup/slots/${slot.id}/waivers`,
      {
        slotVersion: ready.version,
        gate: 'excess_below_recommended',
        reason: 'Mine to give',
      },
    );
    expect(byOfficer.status).toBe(403);
    const stale = await deck.waive(cycle.id, slot.id, 'wind_reading_stale', 'Nothing stale here');
    expect(stale.status).toBe(409);
    expect(stale.body.code).toBe('nothing_to_waive');

    const waived = await deck.waive(cycle.id, slot.id, 'excess_below_recommended', 'Ship cannot make more wind');
    expect(waived.status).toBe(200);
    const withWaiver = await deck.slot(cycle.id, slot.id);
    expect(withWaiver.waivers).toEqual([
      expect.objectContaining({
        gate: 'excess_below_recommended',
        reason: 'Ship cannot make more wind',
        by: 'Bram Osterwick',
      }),
    ]);
    const launched = await deck.launch(cycle.id, withWaiver, launchKey(), deckEdgeOperator(1));
    expect(launched.status).toBe(200);
    expect(launched.body.change.summary).toBe(
      'C22 launched from cat 1 under waiver: excess wind over deck below the recommended value: Ship cannot make more wind',
    );
    const note = 'excess wind over deck below the recommended value: Ship cannot make more wind';
    const record = await deck.slot(cycle.id, slot.id);
    expect(record).toMatchObject({
      status: 'launched',
      overrideReason: note,
      launchRecord: { go: false, waiver: note },
    });
  });

  it('drops a tensioned aircraft back to weight agreed when the wind changes, until tension is taken again', async () => {
    const { cycle, first } = await executingCycle(pilot(7));
    await deck.readyToLaunch(cycle.id, first.id, pilot(7));
    const { version } = await deck.snapshot(cycle.id);
    const changed = await deck.ok<{ change: { summary: string } }>(
      AIR_OPS,
      'patch',
      `/api/cycles/${cycle.id}/conditions`,
      {
        basisVersion: version,
        trueWindSpeedKt: 14,
      },
    );
    expect(changed.change.summary).toBe('Conditions: wind 0° 14 kt; re-verify: C21 to weight agreed');
    const dropped = await deck.slot(cycle.id, first.id);
    expect(dropped).toMatchObject({ status: 'weight_agreed', reverifyCause: 'wind' });
    expect(dropped.gates).toEqual([expect.objectContaining({ gate: 'reverify_required', soft: false })]);
    const refused = await deck.launch(cycle.id, dropped, launchKey());
    expect(refused.body).toMatchObject({
      code: 'reverify_required',
      message: 'Figures changed (the wind) — re-verify the setting for C21.',
    });

    expect((await deck.step(cycle.id, first.id, 'tensioned')).status).toBe(200);
    const verified = await deck.slot(cycle.id, first.id);
    expect(verified).toMatchObject({ status: 'tensioned', reverifyCause: null, gates: [] });
    expect((await deck.launch(cycle.id, verified, launchKey())).status).toBe(200);
  });

  it('refuses a launch from a catapult marked down, with its own code', async () => {
    const { cycle, first } = await executingCycle(pilot(2));
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilot(2));
    const catapultId = await deck.catapultId(1);
    const path = `/api/cycles/${cycle.id}/lineup/catapults/${catapultId}/status`;
    await deck.ok(HANDLER, 'post', path, { status: 'down', basisStatus: 'up' });
    try {
      const response = await deck.launch(cycle.id, await deck.slot(cycle.id, first.id), launchKey());
      expect(response.status).toBe(409);
      expect(response.body).toMatchObject({ code: 'catapult_down', message: 'Cat 1 is down.' });
    } finally {
      await deck.ok(HANDLER, 'post', path, { status: 'up', basisStatus: 'down' });
    }
    expect(ready.status).toBe('tensioned');
  });

  it('lets the deck edge operator of the catapult step, suspend and launch, and refuses the one of another', async () => {
    const { cycle, first } = await executingCycle(pilot(6));
    const other = await deck.step(cycle.id, first.id, 'taxiing', deckEdgeOperator(2));
    expect(other.status).toBe(403);
    expect(other.body.code).toBe('not_your_catapult');
    expect((await deck.step(cycle.id, first.id, 'taxiing', deckEdgeOperator(1))).status).toBe(200);
    await deck.acknowledgeWeight(cycle.id, first.id, pilot(6));
    for (const to of ['on_catapult', 'weight_agreed', 'tensioned'] as const)
      expect((await deck.step(cycle.id, first.id, to, deckEdgeOperator(1))).status).toBe(200);
    const launched = await deck.launch(cycle.id, await deck.slot(cycle.id, first.id), launchKey(), deckEdgeOperator(1));
    expect(launched.status).toBe(200);
    expect(launched.body.change.actor).toMatchObject({ role: 'deck_edge_operator', name: 'Rune Halsworthy' });
  });
});
