import type { CycleView, LineupCommandResult } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { AIR_BOSS, AIR_OPS, LineupDriver, OBSERVER } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

const MINUTE = 60_000;

// The air boss's start and stop of launching: one launching cycle per ship, and the window warning.
describe('launching', () => {
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

  const startAs = (email: string, cycle: CycleView, fields: object = {}) =>
    deck.call(email, 'post', `/api/cycles/${cycle.id}/start`, { basisVersion: cycle.version, ...fields });

  const current = (cycle: CycleView) => deck.ok<CycleView>(OBSERVER, 'get', `/api/cycles/${cycle.id}`);

  /** A new cycle with every launch prerequisite ticked, as it stands after the ticks. */
  const readyCycle = async (overrides: Parameters<LineupDriver['createCycle']>[0] = {}) => {
    const created = await deck.createCycle(overrides);
    await deck.tickPrerequisites(created.id);
    return current(created);
  };

  /** A ready cycle whose launch window is open now. */
  const cycleInWindow = () => {
    const now = Date.now();
    return readyCycle({
      plannedLaunchAt: new Date(now + 5 * MINUTE).toISOString(),
      windowStartAt: new Date(now - 10 * MINUTE).toISOString(),
      windowEndAt: new Date(now + 40 * MINUTE).toISOString(),
    });
  };

  it('lets the air boss start launching inside the window, and no one else', async () => {
    const cycle = await cycleInWindow();
    await deck.stopLaunching(cycle.shipId);
    expect((await startAs(AIR_OPS, cycle)).status).toBe(403);
    const started = await startAs(AIR_BOSS, cycle);
    expect(started.status).toBe(200);
    expect((started.body as LineupCommandResult).change).toMatchObject({
      kind: 'cycle_started',
      summary: `Cycle ${cycle.number} started`,
      actor: { role: 'air_boss' },
    });
    expect((await current(cycle)).state).toBe('executing');
  });

  it('warns before starting outside the window, and starts once the air boss confirms', async () => {
    const cycle = await readyCycle();
    await deck.stopLaunching(cycle.shipId);
    const warned = await startAs(AIR_BOSS, cycle);
    expect(warned.status).toBe(409);
    expect(warned.body.code).toBe('outside_window');
    expect(warned.body.message).toMatch(
      /^The launch window is \d\d:\d\d UTC to \d\d:\d\d UTC; now, .* is before it opens\./,
    );
    expect(await current(cycle)).toMatchObject({ state: 'planning', version: cycle.version });

    const confirmed = await startAs(AIR_BOSS, cycle, { confirmOutsideWindow: true });
    expect(confirmed.status).toBe(200);
    expect(confirmed.body.change.summary).toBe(`Cycle ${cycle.number} started, outside its window (confirmed)`);
  });

  it('refuses a second launching cycle on the ship until the first is stopped', async () => {
    const first = await cycleInWindow();
    const second = await cycleInWindow();
    await deck.start(first.id);

    const refused = await startAs(AIR_BOSS, second);
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({
      code: 'ship_already_launching',
      message: `Cycle ${first.number} of this ship is launching; stop or close it before starting another.`,
    });
    expect((await current(second)).state).toBe('planning');

    const running = await current(first);
    const stopped = await deck.ok<LineupCommandResult>(AIR_BOSS, 'post', `/api/cycles/${first.id}/stop`, {
      basisVersion: running.version,
    });
    expect(stopped.change).toMatchObject({
      kind: 'cycle_stopped',
      summary: `Cycle ${first.number}: launching stopped`,
    });
    expect((await current(first)).state).toBe('planning');
    expect((await startAs(AIR_BOSS, await current(second))).status).toBe(200);

    const again = await deck.call(AIR_BOSS, 'post', `/api/cycles/${first.id}/stop`, { basisVersion: stopped.version });
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('wrong_state');
  });

  it('lets one of two starts racing on two cycles of the ship through, and refuses the other', async () => {
    for (let round = 0; round < 3; round += 1) {
      const [one, two] = [await cycleInWindow(), await cycleInWindow()];
      await deck.stopLaunching(one.shipId);
      const answers = await Promise.all([startAs(AIR_BOSS, one), startAs(AIR_BOSS, two)]);
      const statuses = answers.map((answer) => answer.status).sort();
      expect(statuses).toEqual([200, 409]);
      expect(answers.find((answer) => answer.status === 409)!.body.code).toBe('ship_already_launching');
      const states = [(await current(one)).state, (await current(two)).state].sort();
      expect(states).toEqual(['executing', 'planning']);
    }
  });
});
