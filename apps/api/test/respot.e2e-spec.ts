import type { DeckPositionView, LineupCommandResult, RespotTarget, SlotView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import {
  HANDLER,
  HANGAR_BAY_A,
  LineupDriver,
  OBSERVER,
  catapultOfficer,
  launchKey,
  pilot,
} from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

describe('the respot: targets, the ordered tows, the ticks and the next cycle', () => {
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

  const HOUR = 3_600_000;
  const plannedAt = (at: number) => ({
    plannedLaunchAt: new Date(at).toISOString(),
    windowStartAt: new Date(at - HOUR / 6).toISOString(),
    windowEndAt: new Date(at + HOUR).toISOString(),
  });
  const spot = (name: string): DeckPositionView => ({ kind: 'spot', name });
  const build = async (cycleId: number, targets: RespotTarget[]) =>
    deck.call(HANDLER, 'post', `/api/cycles/${cycleId}/deck/respot`, {
      targets,
      basisVersion: (await deck.snapshot(cycleId)).version,
    });
  const tick = async (cycleId: number, step: number, who = HANDLER) =>
    deck.call(who, 'post', `/api/cycles/${cycleId}/deck/respot/tows/${step}`, {
      basisVersion: (await deck.snapshot(cycleId)).version,
    });

  /** A cycle whose aircraft are towed, in turn, to the given positions (each first down to bay A). */
  async function cycleOn(placed: Record<string, DeckPositionView>) {
    const cycle = await deck.createCycle();
    const slots: Record<string, SlotView> = {};
    for (const side of Object.keys(placed)) {
      slots[side] = await deck.addSlotInHangar(cycle.id, side);
    }
    for (const [side, position] of Object.entries(placed)) {
      if (position.kind !== 'hangar') await deck.towed(cycle.id, slots[side].id, position);
    }
    return { cycle, slots };
  }

  it('orders the tows so none goes into a held spot or out past one that must move first', async () => {
    // Demo layout (invented): aft-4 waits for aft-3. C27 on aft-3 goes to mid-4; C28 on mid-3 goes into
    // aft-4, behind aft-3; C29 comes up from bay A to aft-3. C29 cannot go until C27 has left aft-3, and
    // C28 must be on aft-4 before C29 parks in front of it: C27, C28, C29, whatever order they are given.
    const { cycle, slots } = await cycleOn({ C27: spot('aft-3'), C28: spot('mid-3'), C29: HANGAR_BAY_A });
    const built = await build(cycle.id, [
      { slotId: slots.C29.id, to: spot('aft-3') },
      { slotId: slots.C28.id, to: spot('aft-4') },
      { slotId: slots.C27.id, to: spot('mid-4') },
    ]);
    expect(built.status).toBe(200);
    expect((built.body as LineupCommandResult).change).toMatchObject({
      kind: 'respot_built',
      summary: 'Respot built: 3 tows for 3 aircraft',
    });
    const { respot } = (await deck.snapshot(cycle.id)).cycle;
    expect(respot!.tows.map((tow) => [tow.slotId, tow.from.name, tow.to.name, tow.doneAt])).toEqual([
      [slots.C27.id, 'aft-3', 'mid-4', null],
      [slots.C28.id, 'mid-3', 'aft-4', null],
      [slots.C29.id, 'bay-A', 'aft-3', null],
    ]);

    // Ticked off one by one, in order, each a change that tows the aircraft.
    const outOfOrder = await tick(cycle.id, 2);
    expect(outOfOrder.status).toBe(409);
    expect(outOfOrder.body).toMatchObject({
      code: 'respot_out_of_order',
      message: 'Tow 1 (C27 to spot mid-4) comes first.',
    });
    const first = await tick(cycle.id, 1);
    expect(first.status).toBe(200);
    expect((first.body as LineupCommandResult).change.summary).toBe(
      'Respot tow 1 done: C27 from spot aft-3 to spot mid-4',
    );
    const seen = await deck.snapshot(cycle.id);
    expect(seen.slots.find((slot) => slot.id === slots.C27.id)!.deckPosition).toEqual(spot('mid-4'));
    expect(seen.cycle.respot!.tows[0].doneAt).not.toBeNull();
    expect((await tick(cycle.id, 1)).body.code).toBe('no_change');
    expect((await tick(cycle.id, 2)).status).toBe(200);
    expect((await tick(cycle.id, 3)).status).toBe(200);
    const after = await deck.snapshot(cycle.id);
    expect(after.slots.find((slot) => slot.id === slots.C29.id)!.deckPosition).toEqual(spot('aft-3'));
    expect(after.cycle.respot!.tows.every((tow) => tow.doneAt !== null)).toBe(true);
  });

  it('refuses a respot that leaves an aircraft shut in, naming the one in its way, and two on one spot', async () => {
    const { cycle, slots } = await cycleOn({ C30: spot('aft-3'), C31: spot('mid-1') });
    const shutIn = await build(cycle.id, [{ slotId: slots.C31.id, to: spot('aft-4') }]);
    expect(shutIn.status).toBe(409);
    expect(shutIn.body).toMatchObject({
      code: 'path_blocked',
      message: 'C31 cannot reach spot aft-4 while C30 stays where it is; give it a target too.',
    });
    const shared = await build(cycle.id, [{ slotId: slots.C31.id, to: spot('aft-3') }]);
    expect(shared.status).toBe(409);
    expect(shared.body).toMatchObject({
      code: 'position_occupied',
      message: 'C30 and C31 would both end on spot aft-3; give each its own.',
    });
    const unknown = await build(cycle.id, [{ slotId: slots.C31.id, to: spot('nowhere') }]);
    expect(unknown.status).toBe(400);
    expect((await deck.snapshot(cycle.id)).cycle.respot).toBeNull();
    expect((await deck.call(OBSERVER, 'post', `/api/cycles/${cycle.id}/deck/respot`, {})).status).toBe(403);
  });

  /**
   * The first half past the hour over an hour from now: a test's cycle planned on it, and the next a minute
   * later, have no other cycle in between to hold their aircraft, since the demo's cycles sit on whole hours
   * and those of earlier tests within the hour from their start (the demo's day cycle once held D35, at one
   * minute to the hour).
   */
  const quietHalfHour = () => {
    const earliest = Date.now() + 61 * 60_000;
    const halfPast = Math.floor(earliest / HOUR) * HOUR + HOUR / 2;
    return halfPast >= earliest ? halfPast : halfPast + HOUR;
  };

  it('starts an aircraft the next cycle where a tow left it, though it did not launch', async () => {
    const planned = quietHalfHour();
    const cycle = await deck.createCycle(plannedAt(planned));
    const stayer = await deck.addSlotInHangar(cycle.id, 'D42');
    await deck.towed(cycle.id, stayer.id, spot('stern-1'));
    const next = await deck.createCycle(plannedAt(planned + 60_000));
    const again = await deck.addSlot(next.id, 'D42');
    expect(again.deckPosition).toEqual(spot('stern-1'));
  });

  it('waits for the last launch, and the recovered aircraft start the next cycle on their targets', async () => {
    const planned = quietHalfHour();
    const cycle = await deck.createCycle(plannedAt(planned));
    const flyer = await deck.addSlot(cycle.id, 'D35', { pilotEmail: pilot(5) });
    await deck.place(cycle.id, flyer.id, 1);
    const early = await build(cycle.id, [{ slotId: flyer.id, to: spot('bow-3') }]);
    expect(early.status).toBe(409);
    expect(early.body).toMatchObject({
      code: 'launches_pending',
      message: 'The respot comes after the last launch; D35 is still to launch.',
    });
    await deck.start(cycle.id);
    await deck.readyToLaunch(cycle.id, flyer.id, pilot(5));
    const launched = await deck.launch(cycle.id, await deck.slot(cycle.id, flyer.id), launchKey(), catapultOfficer(1));
    expect(launched.status).toBe(200);
    // The last launch closed the cycle: it refuses every change but the respot's.
    const closed = await deck.snapshot(cycle.id);
    expect(closed.cycle.state).toBe('closed');
    const fouled = await deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/deck/landing-area`, {
      state: 'fouled',
      reason: 'Debris on deck',
      basisVersion: closed.version,
    });
    expect(fouled.status).toBe(409);
    expect(fouled.body.code).toBe('cycle_closed');
    const built = await build(cycle.id, [{ slotId: flyer.id, to: spot('bow-3') }]);
    expect(built.status).toBe(200);
    // Airborne: no tow now; it lands on bow-3, and the ship's next cycle finds it there.
    expect((await deck.snapshot(cycle.id)).cycle.respot!.tows).toEqual([]);
    const next = await deck.createCycle(plannedAt(planned + 60_000));
    const again = await deck.addSlot(next.id, 'D35');
    expect(again.deckPosition).toEqual(spot('bow-3'));
  });
});
