import type { INestApplication } from '@nestjs/common';
import { readChangeLog } from './support/change-log.js';
import {
  catapultOfficer,
  deckEdgeOperator,
  HANDLER,
  LineupDriver,
  OBSERVER,
  pilot,
} from './support/lineup-fixtures.js';
import { signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

describe('armed or safe per slot', () => {
  let app: INestApplication;
  let url: string;
  let deck: LineupDriver;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    url = started.url;
    deck = new LineupDriver(started.url);
  });

  afterAll(async () => {
    await app.close();
  });

  const record = async (cycleId: number, slotId: number, armState: string, by: string) => {
    const slot = await deck.slot(cycleId, slotId);
    return deck.call(by, 'post', `/api/cycles/${cycleId}/lineup/slots/${slotId}/arm-state`, {
      slotVersion: slot.version,
      armState,
    });
  };

  it("is recorded by the crew of the aircraft's catapult and the handler, each a logged change with who and when", async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C23', { pilotEmail: pilot(7) });
    expect((await deck.slot(cycle.id, slot.id)).armState).toBeNull();
    await deck.place(cycle.id, slot.id, 1);

    const armed = await record(cycle.id, slot.id, 'armed', catapultOfficer(1));
    expect(armed.status).toBe(200);
    expect(armed.body.change).toMatchObject({ kind: 'arm_state_set', summary: 'C23 recorded armed' });
    const officer = armed.body.change.actor.name as string;
    const seen = await deck.slot(cycle.id, slot.id);
    expect(seen).toMatchObject({ armState: 'armed', armStateBy: officer });
    // Recorded while the change was made: the log stamps it a moment later.
    const lag = Date.parse(armed.body.change.at) - Date.parse(seen.armStateAt!);
    expect(lag).toBeGreaterThanOrEqual(0);
    expect(lag).toBeLessThan(1_000);

    expect((await record(cycle.id, slot.id, 'armed', deckEdgeOperator(1))).body.code).toBe('no_change');
    const safe = await record(cycle.id, slot.id, 'safe', deckEdgeOperator(1));
    expect(safe.status).toBe(200);
    expect((await record(cycle.id, slot.id, 'armed', HANDLER)).status).toBe(200);

    const log = await readChangeLog(url, await signIn(url, OBSERVER), cycle.id);
    const kept = log.filter((change) => change.kind === 'arm_state_set');
    expect(kept.map((change) => [change.summary, change.actor.role])).toEqual([
      ['C23 recorded armed', 'catapult_officer'],
      ['C23 recorded safe', 'deck_edge_operator'],
      ['C23 recorded armed', 'handler'],
    ]);
  });

  it('refuses the crew of another catapult, the crew for an aircraft in the deck pool, and a pilot, changing nothing', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C24', { pilotEmail: pilot(8) });

    const inPool = await record(cycle.id, slot.id, 'armed', catapultOfficer(1));
    expect([inPool.status, inPool.body.code]).toEqual([403, 'not_your_catapult']);

    await deck.place(cycle.id, slot.id, 1);
    const before = await deck.slot(cycle.id, slot.id);
    const otherCrew = await record(cycle.id, slot.id, 'armed', deckEdgeOperator(2));
    expect([otherCrew.status, otherCrew.body.code]).toEqual([403, 'not_your_catapult']);
    expect(otherCrew.body.message).toBe("C24 is not in your catapult's order.");
    const byPilot = await record(cycle.id, slot.id, 'armed', pilot(8));
    expect(byPilot.status).toBe(403);
    const unknown = await record(cycle.id, slot.id, 'hot', HANDLER);
    expect(unknown.status).toBe(400);
    expect(await deck.slot(cycle.id, slot.id)).toMatchObject({ version: before.version, armState: null });
  });
});
