import type { INestApplication } from '@nestjs/common';
import type { CycleReport } from '@catline/contracts';
import {
  AIR_BOSS,
  HANDLER,
  LineupDriver,
  catapultOfficer,
  deckEdgeOperator,
  pilot,
} from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

describe('suspend with one tap, the reason afterwards', () => {
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

  /** An executing cycle with one aircraft on cat 1, flown by `pilotEmail`, hooked up. */
  async function hookedUp(pilotEmail: string) {
    const {
      cycle,
      slots: [slot],
    } = await deck.executingCycle({ 1: [{ side: 'C21', pilotEmail }], 2: ['D33'] });
    await deck.stepThrough(cycle.id, slot.id, 'on_catapult');
    return { cycleId: cycle.id, slotId: slot.id };
  }

  const send = async (by: string, cycleId: number, slotId: number, path: string, body: object = {}) => {
    const slot = await deck.slot(cycleId, slotId);
    return deck.call(by, 'post', `/api/cycles/${cycleId}/lineup/slots/${slotId}/${path}`, {
      slotVersion: slot.version,
      ...body,
    });
  };

  it.each([
    ['the catapult officer', catapultOfficer(1)],
    ['the deck edge operator', deckEdgeOperator(1)],
    ['the pilot of the aircraft', pilot(6)],
    ['the air boss', AIR_BOSS],
  ])('lets %s suspend with one tap and choose the reason afterwards', async (_who, email) => {
    const { cycleId, slotId } = await hookedUp(pilot(6));
    const tapped = await send(email, cycleId, slotId, 'suspend');
    expect(tapped.status).toBe(200);
    expect(await deck.slot(cycleId, slotId)).toMatchObject({ status: 'suspended', suspendReason: null });
    const given = await send(email, cycleId, slotId, 'suspend-reason', { reason: 'launch_bar' });
    expect(given.status).toBe(200);
    expect(given.body.change).toMatchObject({ kind: 'suspend_reason_given', summary: 'C21 suspended for: Launch bar' });
    expect(await deck.slot(cycleId, slotId)).toMatchObject({ status: 'suspended', suspendReason: 'Launch bar' });
  });

  it('takes other only with a few words, refuses an unknown choice, the handler and a slot not suspended', async () => {
    const { cycleId, slotId } = await hookedUp(pilot(6));
    const early = await send(catapultOfficer(1), cycleId, slotId, 'suspend-reason', { reason: 'deck' });
    expect(early.status).toBe(409);
    expect(early.body).toMatchObject({
      code: 'wrong_step',
      message: 'C21 is on catapult; a reason is given only while it is suspended.',
    });
    await send(catapultOfficer(1), cycleId, slotId, 'suspend');
    const bare = await send(catapultOfficer(1), cycleId, slotId, 'suspend-reason', { reason: 'other' });
    expect(bare.status).toBe(422);
    expect(bare.body).toMatchObject({ code: 'reason_required', message: 'Say in a few words why C21 was suspended.' });
    expect((await send(catapultOfficer(1), cycleId, slotId, 'suspend-reason', { reason: 'weather' })).status).toBe(400);
    expect((await send(HANDLER, cycleId, slotId, 'suspend-reason', { reason: 'deck' })).status).toBe(403);
    expect((await send(pilot(2), cycleId, slotId, 'suspend-reason', { reason: 'deck' })).status).toBe(403);
    const other = await send(pilot(6), cycleId, slotId, 'suspend-reason', { reason: 'other', text: 'Canopy seal' });
    expect(other.status).toBe(200);
    expect((await deck.slot(cycleId, slotId)).suspendReason).toBe('Canopy seal');
    const report = await deck.ok<CycleReport>(HANDLER, 'get', `/api/cycles/${cycleId}/report`);
    expect(report.suspends.map((suspend) => suspend.reason)).toEqual(['Canopy seal']);
  });
});
