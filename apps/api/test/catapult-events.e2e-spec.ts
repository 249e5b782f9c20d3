import type { INestApplication } from '@nestjs/common';
import type { LineupChange } from '@catline/contracts';
import {
  HANDLER,
  LineupDriver,
  catapultOfficer,
  deckEdgeOperator,
  launchKey,
  pilot,
} from './support/lineup-fixtures.js';
import { readChangeLog } from './support/change-log.js';
import { startTestApp } from './support/test-app.js';

describe('hangfire, suspected cold shot and down on the catapult', () => {
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
  async function executingCycle(pilotEmail: string) {
    const {
      cycle,
      slots: [first, second],
    } = await deck.executingCycle({ 1: [{ side: 'C21', pilotEmail }, 'C22'], 2: ['D33'] });
    return { cycle, first, second };
  }

  const post = async (by: string, cycleId: number, slotId: number, event: string, body: object = {}) => {
    const slot = await deck.slot(cycleId, slotId);
    return deck.call(by, 'post', `/api/cycles/${cycleId}/lineup/slots/${slotId}/${event}`, {
      slotVersion: slot.version,
      ...body,
    });
  };

  const lastChange = async (cycleId: number): Promise<LineupChange> => {
    const changes = await readChangeLog(deck.url, await deck.token(HANDLER), cycleId);
    return changes[changes.length - 1];
  };

  it('takes a hangfire only on a tensioned aircraft, suspends it and records who and when', async () => {
    const { cycle, first } = await executingCycle(pilot(3));
    await deck.stepThrough(cycle.id, first.id, 'deflector_up', deckEdgeOperator(1));
    const early = await post(deckEdgeOperator(1), cycle.id, first.id, 'hangfire');
    expect(early.status).toBe(409);
    expect(early.body).toMatchObject({
      code: 'wrong_step',
      message: 'C21 is deflector up; a hangfire is reported only once it is tensioned.',
    });
    await deck.stepThrough(cycle.id, first.id, 'tensioned', deckEdgeOperator(1));
    expect((await post(catapultOfficer(2), cycle.id, first.id, 'hangfire')).status).toBe(403);
    const response = await post(deckEdgeOperator(1), cycle.id, first.id, 'hangfire');
    expect(response.status).toBe(200);
    const slot = await deck.slot(cycle.id, first.id);
    expect(slot).toMatchObject({ status: 'suspended', suspendReason: 'hangfire', statusBy: 'Rune Halsworthy' });
    const change = await lastChange(cycle.id);
    expect(change).toMatchObject({
      kind: 'hangfire',
      actor: { role: 'deck_edge_operator' },
      summary: 'Hangfire: cat 1 fired and C21 did not go; C21 suspended',
    });
    expect(Date.parse(change.at)).not.toBeNaN();
  });

  it('sends an aircraft down on the catapult back to the deck pool, or down, and lets the next one come up', async () => {
    const { cycle, first, second } = await executingCycle(pilot(3));
    await deck.stepThrough(cycle.id, first.id, 'taxiing');
    const taxiing = await post(catapultOfficer(1), cycle.id, first.id, 'down-on-catapult', { outcome: 'down' });
    expect(taxiing.status).toBe(409);
    expect(taxiing.body).toMatchObject({
      code: 'wrong_step',
      message: 'C21 is taxiing; only an aircraft on the catapult or suspended there goes down on it.',
    });
    await deck.stepThrough(cycle.id, first.id, 'weight_agreed');
    expect((await post(catapultOfficer(1), cycle.id, first.id, 'down-on-catapult', { outcome: 'lost' })).status).toBe(
      400,
    );
    const pooled = await post(catapultOfficer(1), cycle.id, first.id, 'down-on-catapult', { outcome: 'pool' });
    expect(pooled.status).toBe(200);
    expect(pooled.body.change).toMatchObject({
      kind: 'down_on_catapult',
      summary: 'C21 unserviceable on cat 1: back to the deck pool',
    });
    const snapshot = await deck.snapshot(cycle.id);
    expect(snapshot.pool).toContain(first.id);
    expect(snapshot.slots.find((slot) => slot.id === first.id)).toMatchObject({
      status: 'planned',
      catapultId: null,
      agreedWeightLb: null,
    });
    await deck.stepThrough(cycle.id, second.id, 'on_catapult');
    const downed = await post(catapultOfficer(1), cycle.id, second.id, 'down-on-catapult', { outcome: 'down' });
    expect(downed.status).toBe(200);
    expect(await deck.slot(cycle.id, second.id)).toMatchObject({
      status: 'down',
      catapultId: null,
      downFromCatapultId: await deck.catapultId(1),
    });
    // Back to the pool is not down: no catapult counts it.
    expect((await deck.slot(cycle.id, first.id)).downFromCatapultId).toBeNull();
  });

  it('takes a suspected cold shot on the last launch: the catapult goes down and the aircraft on it is suspended', async () => {
    const { cycle, first, second } = await executingCycle(pilot(3));
    const catapultId = await deck.catapultId(1);
    const statusPath = `/api/cycles/${cycle.id}/lineup/catapults/${catapultId}/status`;
    const notYet = await post(catapultOfficer(1), cycle.id, first.id, 'cold-shot');
    expect(notYet.status).toBe(409);
    expect(notYet.body.message).toBe('C21 is planned; a suspected cold shot is reported on an aircraft that launched.');
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilot(3));
    expect((await deck.launch(cycle.id, ready, launchKey())).status).toBe(200);
    await deck.stepThrough(cycle.id, second.id, 'on_catapult');
    try {
      const response = await post(catapultOfficer(1), cycle.id, first.id, 'cold-shot');
      expect(response.status).toBe(200);
      expect(response.body.change).toMatchObject({ kind: 'cold_shot_suspected', actor: { role: 'catapult_officer' } });
      expect(response.body.change.summary).toMatch(
        /^Suspected cold shot: C21 from cat 1 \(launched \d\d:\d\d:\d\d UTC\); cat 1 down for inspection; C22 suspended on it$/,
      );
      const snapshot = await deck.snapshot(cycle.id);
      expect(snapshot.lanes.find((lane) => lane.catapultId === catapultId)!.status).toBe('down');
      expect(snapshot.slots.find((slot) => slot.id === first.id)!.status).toBe('launched');
      expect(snapshot.slots.find((slot) => slot.id === second.id)).toMatchObject({
        status: 'suspended',
        suspendReason: 'suspected cold shot',
      });
    } finally {
      await deck.call(HANDLER, 'post', statusPath, { status: 'up', basisStatus: 'down' });
    }
  });

  it('asks the handler to confirm a catapult down under a tensioned aircraft, then suspends the aircraft with a record', async () => {
    const { cycle, first, second } = await executingCycle(pilot(3));
    const catapultId = await deck.catapultId(1);
    const statusPath = `/api/cycles/${cycle.id}/lineup/catapults/${catapultId}/status`;
    await deck.stepThrough(cycle.id, first.id, 'tensioned');
    await deck.stepThrough(cycle.id, second.id, 'taxiing');
    const before = await deck.slot(cycle.id, first.id);
    try {
      const asked = await deck.call(HANDLER, 'post', statusPath, {
        status: 'down',
        basisStatus: 'up',
        reason: 'Shuttle fault',
      });
      expect(asked.status).toBe(409);
      expect(asked.body).toMatchObject({
        code: 'aircraft_on_catapult',
        message: 'C21 is tensioned on cat 1; marking the catapult down suspends C21. Confirm to go on.',
      });
      const unchanged = await deck.snapshot(cycle.id);
      expect(unchanged.lanes.find((lane) => lane.catapultId === catapultId)!.status).toBe('up');
      expect(await deck.slot(cycle.id, first.id)).toMatchObject({ status: 'tensioned', version: before.version });

      const confirmed = await deck.call(HANDLER, 'post', statusPath, {
        status: 'down',
        basisStatus: 'up',
        reason: 'Shuttle fault',
        confirm: true,
      });
      expect(confirmed.status).toBe(200);
      expect(confirmed.body.change).toMatchObject({
        kind: 'catapult_status_set',
        actor: { role: 'handler' },
        summary: 'Cat 1 down: Shuttle fault; C21 suspended on it',
      });
      const after = await deck.snapshot(cycle.id);
      expect(after.lanes.find((lane) => lane.catapultId === catapultId)!.status).toBe('down');
      expect(after.slots.find((slot) => slot.id === first.id)).toMatchObject({
        status: 'suspended',
        suspendReason: 'cat 1 down: Shuttle fault',
      });
      // Waiting behind the deflector is not on the catapult: it stays as it was.
      expect(after.slots.find((slot) => slot.id === second.id)!.status).toBe('taxiing');
      expect((await lastChange(cycle.id)).summary).toBe('Cat 1 down: Shuttle fault; C21 suspended on it');
    } finally {
      await deck.call(HANDLER, 'post', statusPath, { status: 'up', basisStatus: 'down' });
    }
  });
});
