import type { INestApplication } from '@nestjs/common';
import {
  READINESS_STEPS,
  type AircraftTypeView,
  type LineupChange,
  type Page,
  type ReadinessStep,
} from '@catline/contracts';
import {
  ADMIN,
  AIR_BOSS,
  AIR_OPS,
  HANDLER,
  LineupDriver,
  OBSERVER,
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
    const {
      cycle,
      slots: [first, second, other],
    } = await deck.executingCycle({ 1: [{ side: 'C21', pilotEmail }, 'C22'], 2: ['D33'] }, conditions);
    return { cycle, first, second, other };
  }

  it('refuses a step by the officer of another catapult with 403', async () => {
    const { cycle, first } = await executingCycle(pilot(4));
    const response = await deck.step(cycle.id, first.id, 'taxiing', catapultOfficer(2));
    expect(response.status).toBe(403);
    expect(response.body).toMatchObject({ code: 'not_your_catapult', message: 'C21 is not on your catapult (cat 2).' });
  });

  it('refuses a skipped step, and lets the aircraft behind taxi up and wait but go no further', async () => {
    const { cycle, first, second } = await executingCycle(pilot(4));
    const skipped = await deck.step(cycle.id, first.id, 'on_catapult');
    expect(skipped.status).toBe(409);
    expect(skipped.body).toMatchObject({
      code: 'wrong_step',
      message: 'C21 is planned; the next step is taxiing, not on catapult.',
    });
    expect((await deck.step(cycle.id, first.id, 'taxiing')).status).toBe(200);
    expect((await deck.step(cycle.id, first.id, 'on_catapult')).status).toBe(200);
    expect((await deck.step(cycle.id, second.id, 'taxiing')).status).toBe(200);
    const behind = await deck.step(cycle.id, second.id, 'on_catapult');
    expect(behind.status).toBe(409);
    expect(behind.body).toMatchObject({
      code: 'not_current_aircraft',
      message: 'C22 may taxi up and wait behind the deflector; C21 is on the catapult.',
    });
  });

  it("runs a catapult's own list of steps beside the ship's, and refuses the step its list leaves out", async () => {
    const cat2 = (await deck.demoShip()).catapults.find((catapult) => catapult.number === 2)!;
    // A list of the catapult's own: no deflector to raise (Catline's example, no source).
    const own = READINESS_STEPS.filter((step) => step !== 'deflector_up');
    const patchCat2 = (readinessSteps: ReadinessStep[] | null) =>
      deck.call(ADMIN, 'patch', `/api/ships/1/catapults/${cat2.id}`, { readinessSteps });
    const changed = await patchCat2(own);
    expect(changed.status).toBe(200);
    expect(changed.body.readinessSteps).toEqual(own);
    try {
      const { cycle, first, other } = await executingCycle(pilot(4));
      const { lanes } = await deck.snapshot(cycle.id);
      expect(lanes.find((lane) => lane.number === 1)!.readinessSteps).toEqual(READINESS_STEPS);
      expect(lanes.find((lane) => lane.number === 2)!.readinessSteps).toEqual(own);

      await deck.stepThrough(cycle.id, other.id, 'setting_set');
      const left = await deck.step(cycle.id, other.id, 'deflector_up');
      expect(left.status).toBe(409);
      expect(left.body).toMatchObject({
        code: 'wrong_step',
        message: 'D33 is setting set; the next step is tensioned, not deflector up.',
      });
      expect((await deck.step(cycle.id, other.id, 'tensioned')).status).toBe(200);

      // Cat 1 still runs the ship's list, deflector and all.
      await deck.stepThrough(cycle.id, first.id, 'setting_set');
      expect((await deck.step(cycle.id, first.id, 'tensioned')).body.code).toBe('wrong_step');
      expect((await deck.step(cycle.id, first.id, 'deflector_up')).status).toBe(200);
    } finally {
      const back = await patchCat2(null);
      expect(back.status).toBe(200);
      expect(back.body.readinessSteps).toBeNull();
    }
  });

  it('refuses a new list of steps that leaves out the step an aircraft stands at, until it is past it', async () => {
    const cat2 = (await deck.demoShip()).catapults.find((catapult) => catapult.number === 2)!;
    const withoutDeflector = READINESS_STEPS.filter((step) => step !== 'deflector_up');
    const patchCat2 = (readinessSteps: ReadinessStep[] | null) =>
      deck.call(ADMIN, 'patch', `/api/ships/1/catapults/${cat2.id}`, { readinessSteps });
    const { cycle, other } = await executingCycle(pilot(4));
    await deck.stepThrough(cycle.id, other.id, 'deflector_up');
    const refused = await patchCat2(withoutDeflector);
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({
      code: 'readiness_step_in_use',
      message:
        'The new list leaves out a step an aircraft stands at: D33 on cat 2 is at "deflector up". Take it past that step, or change the list once it has launched.',
    });
    expect((await deck.snapshot(cycle.id)).lanes.find((lane) => lane.number === 2)!.readinessSteps).toEqual(
      READINESS_STEPS,
    );
    // The ship's list too, for the catapults that follow it.
    const { profile } = await deck.ok<{ profile: object }>(ADMIN, 'get', '/api/ships/1');
    const shipRefused = await deck.call(ADMIN, 'patch', '/api/ships/1', {
      profile: { ...profile, readinessSteps: withoutDeflector },
    });
    expect(shipRefused.body.code).toBe('readiness_step_in_use');

    await deck.step(cycle.id, other.id, 'tensioned');
    try {
      const { version } = await deck.snapshot(cycle.id);
      expect((await patchCat2(withoutDeflector)).status).toBe(200);
      // The change reaches the stations live, the lane carrying the list it runs now.
      const { items } = await deck.ok<Page<LineupChange>>(
        OBSERVER,
        'get',
        `/api/cycles/${cycle.id}/lineup/changes?since=${version}`,
      );
      expect(items).toEqual([
        expect.objectContaining({
          kind: 'readiness_steps_changed',
          summary: `Cat 2 runs its own readiness steps: ${withoutDeflector.join(', ').replaceAll('_', ' ')}`,
          patch: expect.objectContaining({
            lanes: [expect.objectContaining({ number: 2, readinessSteps: withoutDeflector })],
          }),
        }),
      ]);
      await deck.stepThrough(cycle.id, other.id);
      expect((await deck.slot(cycle.id, other.id)).status).toBe('pilot_ready');
    } finally {
      expect((await patchCat2(null)).status).toBe(200);
    }
  });

  it('refuses readiness steps before the cycle executes', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C23');
    await deck.place(cycle.id, slot.id, 1);
    const response = await deck.step(cycle.id, slot.id, 'taxiing');
    expect(response.status).toBe(409);
    expect(response.body.code).toBe('cycle_not_executing');
  });

  it('records the weight the pilot corrects from the tablet, works the setting out from it and logs both figures', async () => {
    const { cycle, first } = await executingCycle(pilot(5));
    await deck.stepThrough(cycle.id, first.id, 'on_catapult', deckEdgeOperator(1));
    const shown = await deck.slot(cycle.id, first.id);
    const path = `/api/cycles/${cycle.id}/lineup/slots/${first.id}/weight-ack`;
    const stranger = await deck.call(pilot(7), 'post', path, { slotVersion: shown.version, grossWeightLb: 44_000 });
    expect(stranger.status).toBe(403);
    expect(stranger.body.code).toBe('not_your_slot');
    expect(await deck.slot(cycle.id, first.id)).toMatchObject({ version: shown.version, pilotWeightAckLb: null });
    const answered = await deck.call(pilot(5), 'post', path, { slotVersion: shown.version, grossWeightLb: 46_500 });
    expect(answered.status).toBe(200);
    expect(answered.body.change.summary).toBe('Pilot of C21 answers 46,500 lb (planned 44,000 lb)');

    const planned = await deck.step(cycle.id, first.id, 'weight_agreed', deckEdgeOperator(1), 44_000);
    expect(planned.status).toBe(409);
    expect(planned.body.code).toBe('weight_mismatch');
    const agreed = await deck.step(cycle.id, first.id, 'weight_agreed', deckEdgeOperator(1), 46_500);
    expect(agreed.body.change.summary).toBe('C21 weight agreed on cat 1: 46,500 lb (planned 44,000 lb)');
    expect(agreed.body.change.actor).toMatchObject({ role: 'deck_edge_operator' });
    expect(agreed.body.change.at).toEqual(expect.any(String));
    const recorded = await deck.slot(cycle.id, first.id);
    expect(recorded).toMatchObject({ status: 'weight_agreed', agreedWeightLb: 46_500, grossWeightLb: 44_000 });
    // 2,500 lb more on the same catapult and wind: a higher end speed is wanted, so no lower setting.
    expect(recorded.figures!.catapultSetting!).toBeGreaterThanOrEqual(shown.figures!.catapultSetting!);
    expect(recorded.figures!.requiredAirspeedKt!).toBeGreaterThan(shown.figures!.requiredAirspeedKt!);
  });

  it('takes the agreement back when the pilot answers a different figure after it was recorded', async () => {
    const { cycle, first } = await executingCycle(pilot(4));
    await deck.readyToLaunch(cycle.id, first.id, pilot(4));
    const ready = await deck.slot(cycle.id, first.id);
    const corrected = await deck.call(pilot(4), 'post', `/api/cycles/${cycle.id}/lineup/slots/${first.id}/weight-ack`, {
      slotVersion: ready.version,
      grossWeightLb: 45_000,
    });
    expect(corrected.body.change.summary).toBe(
      'Pilot of C21 answers 45,000 lb (planned 44,000 lb); re-verify: C21 to on catapult',
    );
    expect(await deck.slot(cycle.id, first.id)).toMatchObject({
      status: 'on_catapult',
      agreedWeightLb: null,
      reverifyCause: 'weight',
    });
    expect((await deck.launch(cycle.id, await deck.slot(cycle.id, first.id), launchKey())).body.code).toBe(
      'weight_not_agreed',
    );
  });

  it.each([
    ['the catapult officer', () => catapultOfficer(1)],
    ['the deck edge operator', () => deckEdgeOperator(1)],
    ['the pilot of the aircraft', () => pilot(2)],
    ['the air boss', () => AIR_BOSS],
  ])('suspends in one tap by %s, with no reason asked', async (_who, by) => {
    const { cycle, first } = await executingCycle(pilot(2));
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilot(2));
    const path = `/api/cycles/${cycle.id}/lineup/slots/${first.id}/suspend`;
    const response = await deck.call(by(), 'post', path, { slotVersion: ready.version });
    expect(response.status).toBe(200);
    expect(response.body.change.summary).toBe('C21 suspended on cat 1');
    expect(await deck.slot(cycle.id, first.id)).toMatchObject({ status: 'suspended', suspendReason: null });
  });

  it('refuses a suspend by another pilot, the crew of another catapult and the handler', async () => {
    const { cycle, first } = await executingCycle(pilot(2));
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilot(2));
    const path = `/api/cycles/${cycle.id}/lineup/slots/${first.id}/suspend`;
    const codes = [];
    for (const by of [pilot(3), deckEdgeOperator(2), catapultOfficer(2), HANDLER])
      codes.push((await deck.call(by, 'post', path, { slotVersion: ready.version })).body.code);
    expect(codes).toEqual(['not_your_slot', 'not_your_catapult', 'not_your_catapult', 'forbidden_role']);
    expect((await deck.slot(cycle.id, first.id)).status).toBe('pilot_ready');
  });

  it('lets the person who took a step undo it within 10 s, and nobody else', async () => {
    const { cycle, first } = await executingCycle(pilot(3));
    await deck.readyToLaunch(cycle.id, first.id, pilot(3));
    const undoBy = async (email: string) =>
      deck.call(email, 'post', `/api/cycles/${cycle.id}/lineup/slots/${first.id}/undo`, {
        slotVersion: (await deck.slot(cycle.id, first.id)).version,
      });
    const other = await undoBy(deckEdgeOperator(1));
    expect(other.status).toBe(403);
    expect(other.body.code).toBe('not_your_step');
    const undone = await undoBy(catapultOfficer(1));
    expect(undone.status).toBe(200);
    expect(undone.body.change.summary).toBe('C21 on cat 1: pilot ready undone');
    expect((await deck.slot(cycle.id, first.id)).status).toBe('checks_clear');
    expect((await undoBy(catapultOfficer(1))).body.code).toBe('nothing_to_undo');
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
    expect(resumed).toMatchObject({
      status: 'on_catapult',
      suspendReason: null,
      catapultWeightAckAt: null,
      agreedWeightLb: null,
    });
    await deck.stepThrough(cycle.id, first.id);
    expect((await deck.launch(cycle.id, await deck.slot(cycle.id, first.id), launchKey())).status).toBe(200);
  });

  // WKD-41 (demo type, invented): maximum 51,000 lb, crosswind limit 15 kt, recommended excess 12 kt,
  // minimum launch airspeed 151 kt at 51,000 lb; the demo's approved setting for 51,000 lb clean off cat 1,
  // 27, gives it 164.5 kt end speed (launch-math's energy model). The ship lies still so the true wind is the wind over the deck, in
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
    // 45 kt of tailwind: excess -45 - (151 - 164.5) = -31.5 kt, below zero.
    ['end_speed_below_minimum', tailwind(45), 51_000, 'Excess wind over deck -31.'],
  ] as const)(
    'refuses a launch past the hard limit %s with its code, and no waiver opens it',
    async (code, conditions, weight, words) => {
      const cycle = await deck.createCycle(conditions);
      const slot = await deck.addSlot(cycle.id, 'C21', { pilotEmail: pilot(9), grossWeightLb: weight });
      await deck.place(cycle.id, slot.id, 1);
      await deck.start(cycle.id);
      await deck.acknowledgeWeight(cycle.id, slot.id, pilot(9));
      // Above the approved table's last row there is no setting to set, so none to read back: the aircraft
      // stops at the weight agreement, and the launch is refused for the weight all the same.
      const last = code === 'over_max_gross_weight' ? 'weight_agreed' : 'pilot_ready';
      await deck.stepThrough(cycle.id, slot.id, last);
      if (last === 'weight_agreed')
        expect((await deck.step(cycle.id, slot.id, 'setting_set')).body.code).toBe('approved_setting_missing');
      const ready = await deck.slot(cycle.id, slot.id);
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
      expect((await deck.slot(cycle.id, slot.id)).status).toBe(last);
    },
  );

  it("refuses a launch whose end speed is over the type's maximum (overstress), from the type's own field", async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C21', { pilotEmail: pilot(9) });
    await deck.place(cycle.id, slot.id, 1);
    await deck.start(cycle.id);
    const ready = await deck.readyToLaunch(cycle.id, slot.id, pilot(9));
    expect(ready.gates).toEqual([]);
    const types = await deck.ok<AircraftTypeView[]>(ADMIN, 'get', '/api/aircraft-types');
    const type = types.find((candidate) => candidate.designation === 'WKD-41')!;
    const endSpeed = ready.figures!.endSpeedKt;
    // One knot under the shot's own end speed: the demo's 190 kt becomes a limit this shot passes.
    const limit = Math.floor(endSpeed) - 1;
    await deck.ok(ADMIN, 'patch', `/api/aircraft-types/${type.id}`, { maxEndSpeedKt: limit });
    try {
      // A change of the type's launch data takes the aircraft back to re-verify: the setting is read back again.
      expect(await deck.slot(cycle.id, slot.id)).toMatchObject({
        status: 'weight_agreed',
        reverifyCause: 'launch_data',
      });
      await deck.stepThrough(cycle.id, slot.id);
      const over = await deck.slot(cycle.id, slot.id);
      expect(over.gates).toEqual([expect.objectContaining({ gate: 'end_speed_over_max', soft: false })]);
      const refused = await deck.launch(cycle.id, over, launchKey());
      expect(refused.status).toBe(409);
      expect(refused.body).toMatchObject({
        code: 'end_speed_over_max',
        message: `End speed ${endSpeed.toFixed(1)} kt is over the WKD-41 maximum of ${limit.toFixed(1)} kt.`,
      });
      const cleared = await deck.call(ADMIN, 'patch', `/api/aircraft-types/${type.id}`, { maxEndSpeedKt: null });
      expect(cleared.status).toBe(400);
    } finally {
      await deck.ok(ADMIN, 'patch', `/api/aircraft-types/${type.id}`, { maxEndSpeedKt: type.maxEndSpeedKt });
    }
    await deck.stepThrough(cycle.id, slot.id);
    expect((await deck.slot(cycle.id, slot.id)).gates).toEqual([]);
  });

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
    expect((await deck.slot(cycle.id, first.id)).status).toBe('pilot_ready');
  });

  it('launches a soft limit only under the air boss’s waiver, marked on the record', async () => {
    // 8 kt of tailwind: excess -8 - (151 - 164.5) = 5.5 kt, above zero but under the 12 kt recommended.
    const cycle = await deck.createCycle(tailwind(8));
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

  it.each([
    ['the wind', { trueWindSpeedKt: 14 }, 'wind 0° 14 kt', 'wind'],
    ['the ship’s speed', { shipSpeedKt: 28 }, 'ship 0° 28 kt', 'ship_speed'],
  ])(
    'drops an aircraft past the weight agreement back to it when %s changes, until the setting is read back',
    async (what, conditions, described, cause) => {
      const { cycle, first } = await executingCycle(pilot(7));
      await deck.readyToLaunch(cycle.id, first.id, pilot(7));
      const { version } = await deck.snapshot(cycle.id);
      const changed = await deck.ok<{ change: { summary: string } }>(
        AIR_OPS,
        'patch',
        `/api/cycles/${cycle.id}/conditions`,
        { basisVersion: version, ...conditions },
      );
      expect(changed.change.summary).toBe(`Conditions: ${described}; re-verify: C21 to weight agreed`);
      const dropped = await deck.slot(cycle.id, first.id);
      expect(dropped).toMatchObject({ status: 'weight_agreed', reverifyCause: cause });
      expect(dropped.gates).toEqual([expect.objectContaining({ gate: 'reverify_required', soft: false })]);
      const refused = await deck.launch(cycle.id, dropped, launchKey());
      expect(refused.body).toMatchObject({
        code: 'reverify_required',
        message: `Figures changed (${what}) — re-verify the setting for C21.`,
      });

      expect((await deck.step(cycle.id, first.id, 'setting_set')).status).toBe(200);
      expect(await deck.slot(cycle.id, first.id)).toMatchObject({ reverifyCause: null, gates: [] });
      await deck.stepThrough(cycle.id, first.id);
      const verified = await deck.slot(cycle.id, first.id);
      expect((await deck.launch(cycle.id, verified, launchKey())).status).toBe(200);
    },
  );

  it('refuses a launch from a catapult marked down, with its own code', async () => {
    const { cycle, first, second } = await executingCycle(pilot(2));
    const catapultId = await deck.catapultId(1);
    const path = `/api/cycles/${cycle.id}/lineup/catapults/${catapultId}/status`;
    // Down before the aircraft comes up: marking it down under the aircraft would suspend it.
    await deck.ok(HANDLER, 'post', path, { status: 'down', basisStatus: 'up' });
    try {
      const ready = await deck.readyToLaunch(cycle.id, first.id, pilot(2));
      const response = await deck.launch(cycle.id, ready, launchKey());
      expect(response.status).toBe(409);
      expect(response.body).toMatchObject({ code: 'catapult_down', message: 'Cat 1 is down.' });
      // Read after the refusal: the aircraft still waits ready on the catapult, which is still down.
      const after = await deck.snapshot(cycle.id);
      expect(after.slots.find((slot) => slot.id === first.id)).toMatchObject({
        status: 'pilot_ready',
        version: ready.version,
        launchedAt: null,
        launchRecord: null,
      });
      expect(after.lanes.find((lane) => lane.number === 1)).toMatchObject({
        status: 'down',
        slotIds: [first.id, second.id],
      });
    } finally {
      await deck.ok(HANDLER, 'post', path, { status: 'up', basisStatus: 'down' });
    }
  });

  it('lets the deck edge operator of the catapult step, suspend and launch, and refuses the one of another', async () => {
    const { cycle, first } = await executingCycle(pilot(6));
    const other = await deck.step(cycle.id, first.id, 'taxiing', deckEdgeOperator(2));
    expect(other.status).toBe(403);
    expect(other.body.code).toBe('not_your_catapult');
    expect((await deck.step(cycle.id, first.id, 'taxiing', deckEdgeOperator(1))).status).toBe(200);
    await deck.acknowledgeWeight(cycle.id, first.id, pilot(6));
    await deck.stepThrough(cycle.id, first.id, undefined, deckEdgeOperator(1));
    const launched = await deck.launch(cycle.id, await deck.slot(cycle.id, first.id), launchKey(), deckEdgeOperator(1));
    expect(launched.status).toBe(200);
    expect(launched.body.change.actor).toMatchObject({ role: 'deck_edge_operator', name: 'Rune Halsworthy' });
  });
});
