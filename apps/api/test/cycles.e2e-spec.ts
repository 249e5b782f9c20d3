import type { CycleView, LineupCommandResult, Page } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import {
  AIR_BOSS,
  AIR_OPS,
  HANDLER,
  LineupDriver,
  OBSERVER,
  goodConditions,
  pilot,
} from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

describe('cycles', () => {
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

  const validBody = async (fields: object = {}) => ({
    shipId: (await deck.demoShip()).id,
    number: 1000 + Math.floor(Math.random() * 8999),
    plannedLaunchAt: '2027-01-10T09:00:00.000Z',
    windowStartAt: '2027-01-10T08:50:00.000Z',
    windowEndAt: '2027-01-10T09:40:00.000Z',
    ...goodConditions,
    ...fields,
  });

  /** Posts a valid new cycle, drawing again when another spec's cycle already holds the random number. */
  const createFresh = async () => {
    for (;;) {
      const body = await validBody();
      const response = await deck.call(AIR_OPS, 'post', '/api/cycles', body);
      if (response.body?.code !== 'cycle_number_taken') return { body, response };
    }
  };

  it('creates a cycle in planning at version 0', async () => {
    const { body, response } = await createFresh();
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({ ...body, state: 'planning', version: 0, slotCount: 0, launchedCount: 0 });
    expect(response.headers.location).toBe(`/api/cycles/${response.body.id}`);
    const located = await deck.call(AIR_OPS, 'get', response.headers.location);
    expect(located.body).toEqual(response.body);
    const again = await deck.call(AIR_OPS, 'post', '/api/cycles', body);
    expect(again.status).toBe(409);
    expect(again.body).toMatchObject({
      code: 'cycle_number_taken',
      message: `This ship already has a cycle ${body.number}.`,
    });
  });

  it.each([
    [
      'a window that ends before it starts',
      { windowEndAt: '2027-01-10T08:00:00.000Z' },
      'The launch window must end after it starts.',
    ],
    [
      'a planned launch outside the window',
      { plannedLaunchAt: '2027-01-10T11:00:00.000Z' },
      'The planned launch time must fall inside the launch window.',
    ],
    ['a course past 360°', { shipCourseDeg: 400 }, 'shipCourseDeg must be at most 360 degrees true'],
    ['an unknown weather case', { weatherCase: 'IV' }, 'weatherCase must be I, II or III'],
    [
      'a date without a time zone',
      { plannedLaunchAt: 'tomorrow' },
      'plannedLaunchAt must be an ISO 8601 date and time',
    ],
    ['a missing wind', { trueWindSpeedKt: undefined }, 'trueWindSpeedKt must be a number'],
  ])('refuses %s with a readable 400', async (_case, fields, message) => {
    const before = (await deck.ok<Page<CycleView>>(OBSERVER, 'get', '/api/cycles?limit=1')).total;
    const response = await deck.call(AIR_OPS, 'post', '/api/cycles', await validBody(fields));
    expect(response.status).toBe(400);
    expect(response.body.message).toContain(message);
    expect((await deck.ok<Page<CycleView>>(OBSERVER, 'get', '/api/cycles?limit=1')).total).toBe(before);
  });

  it('refuses an unknown ship with 404', async () => {
    const response = await deck.call(AIR_OPS, 'post', '/api/cycles', await validBody({ shipId: 9999 }));
    expect(response.status).toBe(404);
  });

  it('lists cycles newest first with their counts, the demo ones included', async () => {
    const cycles = await deck.all<CycleView>(OBSERVER, '/api/cycles');
    const times = cycles.map((cycle) => Date.parse(cycle.plannedLaunchAt));
    expect(times).toEqual([...times].sort((a, b) => b - a));
    const closed = cycles.find((cycle) => cycle.number === 1)!;
    expect(closed).toMatchObject({ state: 'closed', slotCount: 10, launchedCount: 9 });
    expect((await deck.call(OBSERVER, 'get', '/api/cycles/999999')).status).toBe(404);
    expect((await deck.call(OBSERVER, 'get', '/api/cycles/first')).status).toBe(400);
  });

  it('changes conditions as a versioned change and refuses a stale basis with what changed', async () => {
    const cycle = await deck.createCycle();
    const path = `/api/cycles/${cycle.id}/conditions`;
    const changed = await deck.ok<LineupCommandResult>(AIR_OPS, 'patch', path, {
      basisVersion: 0,
      trueWindFromDeg: 250,
      trueWindSpeedKt: 18,
      weatherCase: 'II',
    });
    expect(changed.version).toBe(1);
    expect(changed.change).toMatchObject({
      kind: 'conditions_changed',
      summary: 'Conditions: wind 250° 18 kt, case II',
      actor: { name: 'Priya Quennevar' },
    });
    expect(changed.change.patch.cycle).toMatchObject({
      trueWindFromDeg: 250,
      trueWindSpeedKt: 18,
      weatherCase: 'II',
      version: 1,
    });

    const stale = await deck.call(AIR_OPS, 'patch', path, { basisVersion: 0, night: true });
    expect(stale.status).toBe(409);
    expect(stale.body).toMatchObject({ code: 'stale_basis' });
    expect(stale.body.message).toContain('Conditions: wind 250° 18 kt, case II (Priya Quennevar)');

    const blank = await deck.call(AIR_OPS, 'patch', path, { basisVersion: 1, shipSpeedKt: null });
    expect(blank.status).toBe(400);
    const same = await deck.call(AIR_OPS, 'patch', path, { basisVersion: 1, weatherCase: 'II' });
    expect(same.status).toBe(409);
    expect(same.body.code).toBe('no_change');
    expect((await deck.ok<CycleView>(OBSERVER, 'get', `/api/cycles/${cycle.id}`)).version).toBe(1);
  });

  it('starts a cycle in planning once, and closes it, scratching what did not launch', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C29');
    await deck.place(cycle.id, slot.id, 2);
    const started = await deck.start(cycle.id);
    expect(started.change).toMatchObject({ kind: 'cycle_started' });
    const twice = await deck.call(AIR_BOSS, 'post', `/api/cycles/${cycle.id}/start`, {
      basisVersion: started.version,
      confirmOutsideWindow: true,
    });
    expect(twice.status).toBe(409);
    expect(twice.body.code).toBe('wrong_state');

    const closed = await deck.ok<LineupCommandResult>(AIR_OPS, 'post', `/api/cycles/${cycle.id}/close`, {
      basisVersion: started.version,
    });
    expect(closed.change.summary).toBe(`Cycle ${cycle.number} closed; 1 aircraft not launched scratched`);
    const after = await deck.snapshot(cycle.id);
    expect(after.cycle.state).toBe('closed');
    expect(after.slots[0]).toMatchObject({ status: 'scratched', catapultId: null });
    const move = await deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/moves`, {
      slotId: slot.id,
      slotVersion: after.slots[0].version,
      toCatapultId: null,
      toIndex: 0,
      targetLaneOrder: [],
    });
    expect(move.status).toBe(409);
    expect(move.body.code).toBe('cycle_closed');
  });

  it('adds aircraft to the deck pool, once each, with an active pilot who flies nothing else in the cycle', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'D37', { pilotEmail: pilot(4), spare: true });
    expect(slot).toMatchObject({
      sideNumber: 'D37',
      pilotName: 'Dev Hollowmere',
      spare: true,
      catapultId: null,
      status: 'planned',
    });
    expect((await deck.snapshot(cycle.id)).pool).toEqual([slot.id]);

    const body = {
      pilotId: null,
      mission: 'Strike',
      fuelLb: 9000,
      stores: '',
      grossWeightLb: 41_000,
      tanker: false,
      earlyWarning: false,
      spare: false,
    };
    const path = `/api/cycles/${cycle.id}/slots`;
    const twice = await deck.call(AIR_OPS, 'post', path, { ...body, aircraftId: await deck.aircraftId('D37') });
    expect(twice.status).toBe(409);
    expect(twice.body.code).toBe('aircraft_already_in_cycle');
    const unknown = await deck.call(AIR_OPS, 'post', path, { ...body, aircraftId: 999_999 });
    expect(unknown.status).toBe(404);
    const notAPilot = await deck.call(AIR_OPS, 'post', path, {
      ...body,
      aircraftId: await deck.aircraftId('D38'),
      pilotId: (await deck.me(HANDLER)).id,
    });
    expect(notAPilot.status).toBe(400);
    expect(notAPilot.body.code).toBe('invalid_pilot');
    const busyPilot = await deck.call(AIR_OPS, 'post', path, {
      ...body,
      aircraftId: await deck.aircraftId('D38'),
      pilotId: (await deck.me(pilot(4))).id,
    });
    expect(busyPilot.status).toBe(409);
    expect(busyPilot.body.message).toBe(`Dev Hollowmere already flies D37 in cycle ${cycle.number}.`);
    const heavy = await deck.call(AIR_OPS, 'post', path, {
      ...body,
      aircraftId: await deck.aircraftId('D38'),
      grossWeightLb: -5,
    });
    expect(heavy.status).toBe(400);
    expect((await deck.snapshot(cycle.id)).version).toBe(1);
  });
});
