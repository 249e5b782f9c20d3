import type { DeckPositionView, SlotView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { AIR_BOSS, HANDLER, LineupDriver, catapultOfficer, launchKey, pilot } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

describe('the deck: tows, the landing area and the deck status', () => {
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

  const spot = (name: string): DeckPositionView => ({ kind: 'spot', name });

  /** A fresh cycle with the given demo aircraft, each first towed down to hangar bay A out of the way. */
  async function cycleWith(...sides: string[]) {
    const cycle = await deck.createCycle();
    const slots: SlotView[] = [];
    for (const side of sides) slots.push(await deck.addSlotInHangar(cycle.id, side));
    return { cycle, slots };
  }

  it('tows an aircraft as a versioned change that every screen reads in the snapshot', async () => {
    const { cycle, slots } = await cycleWith('C24');
    const before = await deck.snapshot(cycle.id);
    const result = await deck.towed(cycle.id, slots[0].id, { kind: 'elevator', name: 'lift-fwd' });
    expect(result.version).toBe(before.version + 1);
    expect(result.change).toMatchObject({
      kind: 'aircraft_towed',
      summary: 'C24 towed from hangar bay bay-A to elevator lift-fwd',
    });
    const after = await deck.snapshot(cycle.id);
    expect(after.slots.find((slot) => slot.id === slots[0].id)!.deckPosition).toEqual({
      kind: 'elevator',
      name: 'lift-fwd',
    });
    // The same tow on the version seen before is refused as stale, and changes nothing.
    const stale = await deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/deck/tows`, {
      slotId: slots[0].id,
      slotVersion: before.slots[0].version,
      to: spot('bow-1'),
    });
    expect(stale.status).toBe(409);
    expect(stale.body.code).toBe('stale_basis');
    expect((await deck.snapshot(cycle.id)).version).toBe(after.version);
  });

  it('refuses a tow into an occupied position with 409 naming the aircraft there', async () => {
    const { cycle, slots } = await cycleWith('C25', 'C26');
    await deck.towed(cycle.id, slots[0].id, spot('mid-2'));
    const response = await deck.tow(cycle.id, slots[1].id, spot('mid-2'));
    expect(response.status).toBe(409);
    expect(response.body).toMatchObject({
      code: 'position_occupied',
      message: 'spot mid-2 is held by C25; tow it away first.',
    });
  });

  it('refuses a tow out of a row, or into one, past an aircraft in front, naming it', async () => {
    const { cycle, slots } = await cycleWith('C27', 'C28', 'C29');
    const [front, behind, other] = slots;
    await deck.towed(cycle.id, behind.id, spot('aft-4'));
    await deck.towed(cycle.id, front.id, spot('aft-3'));
    const out = await deck.tow(cycle.id, behind.id, spot('bow-2'));
    expect(out.status).toBe(409);
    expect(out.body).toMatchObject({
      code: 'path_blocked',
      message: 'C28 cannot be towed from spot aft-4 to spot bow-2 until C27 moves.',
    });
    await deck.towed(cycle.id, other.id, spot('stern-1'));
    const into = await deck.tow(cycle.id, front.id, spot('stern-2'));
    expect(into.status).toBe(409);
    expect(into.body).toMatchObject({ code: 'path_blocked' });
    expect(into.body.message).toContain('until C29 moves');
  });

  it('refuses a position the ship does not have with 400', async () => {
    const { cycle, slots } = await cycleWith('C30');
    const response = await deck.tow(cycle.id, slots[0].id, spot('nowhere'));
    expect(response.status).toBe(400);
    expect(response.body.code).toBe('unknown_position');
  });

  it('projects an aircraft from its position: from the hangar it waits for the elevator too', async () => {
    const { cycle, slots } = await cycleWith('C31');
    await deck.place(cycle.id, slots[0].id, 1);
    const below = (await deck.slot(cycle.id, slots[0].id)).projectedLaunchAt!;
    await deck.towed(cycle.id, slots[0].id, spot('bow-1'));
    const onDeck = (await deck.slot(cycle.id, slots[0].id)).projectedLaunchAt!;
    // Demo layout: bay-A to cat 1 is lift-fwd's 50 s trip + 90 s taxi = 140 s; bow-1 taxis 70 s.
    expect((Date.parse(below) - Date.parse(onDeck)) / 1000).toBe(70);
  });

  it('holds an aircraft sent before the one parked in front of it, and says which must move', async () => {
    const { cycle, slots } = await cycleWith('C32', 'D33');
    const [front, behind] = slots;
    await deck.towed(cycle.id, behind.id, spot('aft-4'));
    await deck.towed(cycle.id, front.id, spot('aft-3'));
    await deck.place(cycle.id, behind.id, 3);
    await deck.place(cycle.id, front.id, 3);
    const blocked = await deck.slot(cycle.id, behind.id);
    expect(blocked.mustMove).toEqual(['C32']);
    expect(blocked.projectedLaunchAt).toBeNull();
  });

  it('sets the landing area, and a catapult inside it refuses the launch until it is clear', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'D34', { pilotEmail: pilot(6) });
    await deck.place(cycle.id, slot.id, 3);
    await deck.start(cycle.id);
    await deck.readyToLaunch(cycle.id, slot.id, pilot(6));
    const set = (state: string, reason?: string) =>
      deck.snapshot(cycle.id).then((snapshot) =>
        deck.call(AIR_BOSS, 'post', `/api/cycles/${cycle.id}/deck/landing-area`, {
          state,
          reason,
          basisVersion: snapshot.version,
        }),
      );
    expect((await set('fouled')).status).toBe(400);
    const fouled = await set('fouled', 'Arresting wire down');
    expect(fouled.status).toBe(200);
    const snapshot = await deck.snapshot(cycle.id);
    expect(snapshot.cycle).toMatchObject({
      landingArea: 'fouled',
      landingAreaReason: 'Arresting wire down',
    });
    expect(snapshot.lanes.find((lane) => lane.number === 3)!.closed).toBe(true);
    const refused = await deck.launch(cycle.id, await deck.slot(cycle.id, slot.id), launchKey(), catapultOfficer(3));
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({
      code: 'catapult_closed',
      message:
        'Cat 3 lies in the landing area, which is fouled: Arresting wire down; it fires when the landing area is clear.',
    });
    expect((await set('clear')).status).toBe(200);
    const launched = await deck.launch(cycle.id, await deck.slot(cycle.id, slot.id), launchKey(), catapultOfficer(3));
    expect(launched.status).toBe(200);
  });

  it("holds a catapult on the air boss's deck status: its launch is refused, the other catapult's is not", async () => {
    const cycle = await deck.createCycle();
    const held = await deck.addSlot(cycle.id, 'D34', { pilotEmail: pilot(6) });
    const free = await deck.addSlot(cycle.id, 'C29', { pilotEmail: pilot(7) });
    await deck.place(cycle.id, held.id, 1);
    await deck.place(cycle.id, free.id, 2);
    await deck.start(cycle.id);
    await deck.readyToLaunch(cycle.id, held.id, pilot(6));
    await deck.readyToLaunch(cycle.id, free.id, pilot(7));
    const catapultId = await deck.catapultId(1);
    const set = (by: string, fields: object) =>
      deck.snapshot(cycle.id).then((snapshot) =>
        deck.call(by, 'post', `/api/cycles/${cycle.id}/deck/catapult-status`, {
          catapultId,
          basisVersion: snapshot.version,
          ...fields,
        }),
      );

    expect((await set(AIR_BOSS, { clear: false })).status).toBe(400);
    expect((await set(HANDLER, { clear: false, reason: 'Deck crew forward' })).status).toBe(403);
    const holding = await set(AIR_BOSS, { clear: false, reason: 'Deck crew forward' });
    expect(holding.status).toBe(200);
    expect(holding.body.change).toMatchObject({
      kind: 'deck_status_set',
      summary: 'Cat 1 not clear: Deck crew forward',
    });
    const lanes = (await deck.snapshot(cycle.id)).lanes;
    expect(lanes.find((lane) => lane.number === 1)).toMatchObject({
      deckClear: false,
      deckHoldReason: 'Deck crew forward',
    });
    expect(lanes.find((lane) => lane.number === 2)).toMatchObject({ deckClear: true, deckHoldReason: null });

    const refused = await deck.launch(cycle.id, await deck.slot(cycle.id, held.id), launchKey(), catapultOfficer(1));
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({
      code: 'deck_not_clear',
      message: 'The air boss has not cleared this catapult to launch: Deck crew forward.',
    });
    const other = await deck.launch(cycle.id, await deck.slot(cycle.id, free.id), launchKey(), catapultOfficer(2));
    expect(other.status).toBe(200);
    // A hard gate: there is nothing the air boss can waive.
    expect((await deck.waive(cycle.id, held.id, 'deck_not_clear', 'Hurry')).status).toBeGreaterThanOrEqual(400);

    expect((await set(AIR_BOSS, { clear: true })).body.change.summary).toBe('Cat 1 clear to launch');
    const launched = await deck.launch(cycle.id, await deck.slot(cycle.id, held.id), launchKey(), catapultOfficer(1));
    expect(launched.status).toBe(200);
  });
});
