import type { CycleView, LineupChange, LineupCommandResult, Page } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { demoShip } from '../src/database/seeds/demo-fleet.js';
import {
  ADMIN,
  AIR_BOSS,
  AIR_OPS,
  HANDLER,
  LineupDriver,
  OBSERVER,
  catapultOfficer,
} from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

// The ship profile's launch prerequisites: the air boss ticks each for a cycle before launching starts.
describe('launch prerequisites', () => {
  let app: INestApplication;
  let deck: LineupDriver;
  const names = demoShip.profile.launchPrerequisites;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    deck = new LineupDriver(started.url);
  });

  afterAll(async () => {
    await app.close();
  });

  const current = (cycle: { id: number }) => deck.ok<CycleView>(OBSERVER, 'get', `/api/cycles/${cycle.id}`);

  /** Ticks or unticks the prerequisite at `index` of the profile's list (its number is one more). */
  const set = async (email: string, cycle: { id: number }, index: number, ticked: boolean) =>
    deck.call(email, 'put', `/api/cycles/${cycle.id}/prerequisites/${index + 1}`, {
      ticked,
      basisVersion: (await current(cycle)).version,
    });

  const start = async (cycle: { id: number }) =>
    deck.call(AIR_BOSS, 'post', `/api/cycles/${cycle.id}/start`, {
      basisVersion: (await current(cycle)).version,
      confirmOutsideWindow: true,
    });

  it('lists the ship profile’s prerequisites unticked on a new cycle', async () => {
    const cycle = await deck.createCycle();
    expect(cycle.launchPrerequisites).toEqual(
      names.map((name) => ({ name, ticked: false, tickedBy: null, tickedAt: null })),
    );
  });

  it.each([
    ['a blank item', ['Deck swept', '  '], 'launchPrerequisites must not hold a blank item'],
    ['one item twice', ['Deck swept', 'Deck swept'], 'launchPrerequisites must not name one item twice'],
    ['an item too long', ['x'.repeat(81)], 'launchPrerequisites must each be at most 80 characters'],
    ['not a list', 'Deck swept', 'launchPrerequisites must be a list of short texts'],
  ])('refuses a ship profile whose list holds %s, with a sentence', async (_case, launchPrerequisites, message) => {
    const ship = await deck.demoShip();
    const refused = await deck.call(ADMIN, 'patch', `/api/ships/${ship.id}`, {
      profile: { ...demoShip.profile, launchPrerequisites },
    });
    expect(refused.status).toBe(400);
    expect(refused.body.message).toContain(message);
  });

  it('refuses to start launching, naming every prerequisite not ticked', async () => {
    const cycle = await deck.createCycle();
    await deck.stopLaunching(cycle.shipId);
    expect((await set(AIR_BOSS, cycle, 1, true)).status).toBe(200);

    const refused = await start(cycle);
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({
      code: 'prerequisites_not_ticked',
      message: `Launching cannot start until the air boss ticks every launch prerequisite; not ticked: ${names[0]}, ${names[2]}, ${names[3]}.`,
    });
    expect((await current(cycle)).state).toBe('planning');
  });

  it('lets only the air boss tick, and records who ticked and when in the cycle and its change log', async () => {
    const cycle = await deck.createCycle();
    for (const email of [AIR_OPS, HANDLER, OBSERVER, catapultOfficer(1)]) {
      expect((await set(email, cycle, 0, true)).status).toBe(403);
    }
    expect((await current(cycle)).version).toBe(0);

    const before = Date.now();
    const ticked = await set(AIR_BOSS, cycle, 0, true);
    expect(ticked.status).toBe(200);
    const change = (ticked.body as LineupCommandResult).change;
    expect(change).toMatchObject({
      kind: 'launch_prerequisite_set',
      summary: `Launch prerequisite ticked: ${names[0]}`,
      actor: { role: 'air_boss' },
      version: 1,
    });
    const tick = (await current(cycle)).launchPrerequisites[0];
    expect(tick).toMatchObject({ name: names[0], ticked: true, tickedBy: change.actor.name });
    expect(Date.parse(tick.tickedAt!)).toBeGreaterThanOrEqual(before - 1000);

    const log = await deck.ok<Page<LineupChange>>(OBSERVER, 'get', `/api/cycles/${cycle.id}/lineup/changes?since=0`);
    expect(log.items.map((item) => [item.kind, item.actor.role, item.summary])).toEqual([
      ['launch_prerequisite_set', 'air_boss', `Launch prerequisite ticked: ${names[0]}`],
    ]);
  });

  it('takes a tick back before the start, refuses what changes nothing or names no prerequisite', async () => {
    const cycle = await deck.createCycle();
    expect((await set(AIR_BOSS, cycle, 2, true)).status).toBe(200);
    const untick = await set(AIR_BOSS, cycle, 2, false);
    expect(untick.status).toBe(200);
    expect(untick.body.change.summary).toBe(`Launch prerequisite no longer ticked: ${names[2]}`);
    expect((await current(cycle)).launchPrerequisites[2]).toEqual({
      name: names[2],
      ticked: false,
      tickedBy: null,
      tickedAt: null,
    });

    const again = await set(AIR_BOSS, cycle, 2, false);
    expect(again.status).toBe(409);
    expect(again.body).toMatchObject({ code: 'no_change', message: `${names[2]} already is not ticked.` });
    const missing = await set(AIR_BOSS, cycle, names.length, true);
    expect(missing.status).toBe(404);
    expect(missing.body.message).toBe(`The ship has no launch prerequisite number ${names.length + 1}.`);
    const blank = await deck.call(AIR_BOSS, 'put', `/api/cycles/${cycle.id}/prerequisites/1`, {
      ticked: 'yes',
      basisVersion: 0,
    });
    expect(blank.status).toBe(400);
    expect(blank.body.message).toContain('ticked must be true or false');
  });

  it('starts launching once every prerequisite is ticked; then the ticks stand as they are', async () => {
    const cycle = await deck.createCycle();
    await deck.stopLaunching(cycle.shipId);
    for (const index of names.keys()) expect((await set(AIR_BOSS, cycle, index, true)).status).toBe(200);
    const started = await start(cycle);
    expect(started.status).toBe(200);
    expect(started.body.change).toMatchObject({ kind: 'cycle_started' });

    const late = await set(AIR_BOSS, cycle, 0, false);
    expect(late.status).toBe(409);
    expect(late.body.code).toBe('wrong_state');
    expect((await current(cycle)).launchPrerequisites.every((item) => item.ticked)).toBe(true);
    await deck.stopLaunching(cycle.shipId);
  });
});
