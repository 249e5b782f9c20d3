import type { LineupCommandResult, SpareCandidate, SuggestedLineup } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { AIR_OPS, HANDLER, LineupDriver, catapultOfficer, launchKey, pilot } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

describe('spares, down aircraft, pilots and returns to the pool', () => {
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

  const slotPath = (cycleId: number, slotId: number, action: string) =>
    `/api/cycles/${cycleId}/lineup/slots/${slotId}/${action}`;

  async function markDown(cycleId: number, slotId: number) {
    const slot = await deck.slot(cycleId, slotId);
    return deck.ok<LineupCommandResult>(HANDLER, 'post', slotPath(cycleId, slotId, 'down'), {
      slotVersion: slot.version,
    });
  }

  it('holds a spare aside: out of the count, the lanes and the suggestion until called', async () => {
    const cycle = await deck.createCycle();
    const flying = await deck.addSlotInHangar(cycle.id, 'C21', { pilotEmail: pilot(2) });
    const spare = await deck.addSlotInHangar(cycle.id, 'D40', { pilotEmail: pilot(3), spare: true, mission: 'Spare' });
    const snapshot = await deck.snapshot(cycle.id);
    expect(snapshot.cycle.slotCount).toBe(1);
    expect(snapshot.slots.find((slot) => slot.id === spare.id)!.heldSpare).toBe(true);

    const lane = snapshot.lanes.find((candidate) => candidate.number === 1)!;
    const move = await deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/moves`, {
      slotId: spare.id,
      slotVersion: spare.version,
      toCatapultId: lane.catapultId,
      toIndex: 0,
      targetLaneOrder: lane.slotIds,
    });
    expect(move.status).toBe(409);
    expect(move.body.code).toBe('spare_held');

    const suggestion = await deck.ok<SuggestedLineup>(HANDLER, 'get', `/api/cycles/${cycle.id}/lineup/suggestion`);
    expect(suggestion.lanes.flatMap((entry) => entry.slotIds)).toEqual([flying.id]);
  });

  it('offers spares of the type first, then of the mission; calling one moves the down pilot to it', async () => {
    const cycle = await deck.createCycle();
    const down = await deck.addSlot(cycle.id, 'C22', { pilotEmail: pilot(4) });
    const other = await deck.addSlot(cycle.id, 'L47', { spare: true, mission: 'Tanker' });
    const sameMission = await deck.addSlot(cycle.id, 'G43', { spare: true });
    const sameType = await deck.addSlot(cycle.id, 'D41', { spare: true, mission: 'Spare' });
    await deck.place(cycle.id, down.id, 1);
    await markDown(cycle.id, down.id);

    const offered = await deck.ok<SpareCandidate[]>(HANDLER, 'get', slotPath(cycle.id, down.id, 'spares'));
    expect(offered.map((candidate) => [candidate.slotId, candidate.match])).toEqual([
      [sameType.id, 'type'],
      [sameMission.id, 'mission'],
      [other.id, 'other'],
    ]);

    const before = await deck.snapshot(cycle.id);
    const downNow = before.slots.find((slot) => slot.id === down.id)!;
    const spareNow = before.slots.find((slot) => slot.id === sameType.id)!;
    const called = await deck.ok<LineupCommandResult>(HANDLER, 'post', slotPath(cycle.id, down.id, 'spare'), {
      slotVersion: downNow.version,
      spareSlotId: sameType.id,
      spareVersion: spareNow.version,
    });
    expect(called.version).toBe(before.version + 1);
    expect(called.change.summary).toBe(`Spare D41 called for C22; ${downNow.pilotName} moves to D41`);
    const after = await deck.snapshot(cycle.id);
    expect(after.slots.find((slot) => slot.id === sameType.id)).toMatchObject({
      heldSpare: false,
      pilotId: downNow.pilotId,
      pilotWeightAckAt: null,
    });
    expect(after.slots.find((slot) => slot.id === down.id)!.pilotId).toBeNull();
    expect(after.cycle.slotCount).toBe(before.cycle.slotCount + 1);
    // The spare, called, may now join a lane.
    await deck.place(cycle.id, sameType.id, 1);
  });

  it('keeps a called spare in the cycle when the aircraft it stood in for goes down again', async () => {
    const cycle = await deck.createCycle();
    const down = await deck.addSlot(cycle.id, 'C22', { pilotEmail: pilot(4) });
    const spare = await deck.addSlot(cycle.id, 'D41', { spare: true, mission: 'Spare' });
    const standIn = await deck.addSlot(cycle.id, 'G43', { pilotEmail: pilot(5) });
    await deck.place(cycle.id, down.id, 1);
    await markDown(cycle.id, down.id);
    const downNow = await deck.slot(cycle.id, down.id);
    await deck.ok<LineupCommandResult>(HANDLER, 'post', slotPath(cycle.id, down.id, 'spare'), {
      slotVersion: downNow.version,
      spareSlotId: spare.id,
      spareVersion: (await deck.slot(cycle.id, spare.id)).version,
    });
    const upAgainAndPlaced = async () => {
      await deck.ok<LineupCommandResult>(HANDLER, 'post', slotPath(cycle.id, down.id, 'up'), {
        slotVersion: (await deck.slot(cycle.id, down.id)).version,
        reason: 'Hydraulic leak fixed',
      });
      await deck.place(cycle.id, down.id, 1);
    };
    await upAgainAndPlaced();
    const counted = (await deck.snapshot(cycle.id)).cycle.slotCount;

    // Down again without a spare: the one called for it stays called, counted and free to join a lane.
    await markDown(cycle.id, down.id);
    const after = await deck.snapshot(cycle.id);
    expect(after.slots.find((slot) => slot.id === spare.id)!.heldSpare).toBe(false);
    expect(after.cycle.slotCount).toBe(counted);
    await deck.place(cycle.id, spare.id, 2);

    // A second stand-in would leave the first one's call unrecorded, so it is refused and nothing changes.
    await upAgainAndPlaced();
    const before = await deck.snapshot(cycle.id);
    const refused = await deck.call(HANDLER, 'post', slotPath(cycle.id, down.id, 'down'), {
      slotVersion: before.slots.find((slot) => slot.id === down.id)!.version,
      spareSlotId: standIn.id,
    });
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({
      code: 'spare_unavailable',
      message:
        'D41 already stood in for C22; mark C22 down without a spare and place another aircraft from the deck pool.',
    });
    expect((await deck.snapshot(cycle.id)).version).toBe(before.version);
  });

  it('puts a down aircraft back in the deck pool with a reason ("up again")', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C23', { pilotEmail: pilot(5) });
    await deck.place(cycle.id, slot.id, 2);
    await markDown(cycle.id, slot.id);
    const down = await deck.slot(cycle.id, slot.id);
    // Out of cat 2's order, it is still counted as cat 2's down aircraft.
    const cat2 = (await deck.snapshot(cycle.id)).lanes.find((lane) => lane.number === 2)!;
    expect(down).toMatchObject({ status: 'down', catapultId: null, downFromCatapultId: cat2.catapultId });
    const up = await deck.ok<LineupCommandResult>(HANDLER, 'post', slotPath(cycle.id, slot.id, 'up'), {
      slotVersion: down.version,
      reason: 'Hydraulic leak fixed',
    });
    expect(up.change).toMatchObject({
      kind: 'aircraft_up',
      summary: 'C23 up again, back in the deck pool: Hydraulic leak fixed',
      actor: { role: 'handler' },
    });
    const after = await deck.snapshot(cycle.id);
    expect(after.slots.find((candidate) => candidate.id === slot.id)).toMatchObject({
      status: 'planned',
      catapultId: null,
      downFromCatapultId: null,
    });
    expect(after.pool).toContain(slot.id);
    const again = await deck.call(HANDLER, 'post', slotPath(cycle.id, slot.id, 'up'), {
      slotVersion: (await deck.slot(cycle.id, slot.id)).version,
      reason: 'Twice',
    });
    expect(again.status).toBe(409);
  });

  it('returns a taxiing aircraft (officer) and an on-catapult one (handler with agreement) to the pool', async () => {
    const cycle = await deck.createCycle();
    const first = await deck.addSlot(cycle.id, 'C24', { pilotEmail: pilot(6) });
    const second = await deck.addSlot(cycle.id, 'C25', { pilotEmail: pilot(7) });
    await deck.place(cycle.id, first.id, 1);
    await deck.place(cycle.id, second.id, 1);
    await deck.start(cycle.id);
    expect((await deck.step(cycle.id, first.id, 'taxiing')).status).toBe(200);

    const taxiing = await deck.slot(cycle.id, first.id);
    const byOfficer = await deck.ok<LineupCommandResult>(
      catapultOfficer(1),
      'post',
      slotPath(cycle.id, first.id, 'return'),
      { slotVersion: taxiing.version, reason: 'Nose wheel steering fault' },
    );
    expect(byOfficer.change.summary).toBe('C24 returned from cat 1 to the deck pool: Nose wheel steering fault');
    let after = await deck.snapshot(cycle.id);
    expect(after.pool).toContain(first.id);
    expect(after.lanes.find((lane) => lane.number === 1)!.slotIds).toEqual([second.id]);
    expect(after.slots.find((slot) => slot.id === first.id)).toMatchObject({ status: 'planned', position: null });

    for (const to of ['taxiing', 'on_catapult'] as const)
      expect((await deck.step(cycle.id, second.id, to)).status).toBe(200);
    const onCatapult = await deck.slot(cycle.id, second.id);
    const withoutAgreement = await deck.call(HANDLER, 'post', slotPath(cycle.id, second.id, 'return'), {
      slotVersion: onCatapult.version,
      reason: 'Respot',
    });
    expect(withoutAgreement.status).toBe(403);
    expect(withoutAgreement.body.code).toBe('agreement_required');
    const byHandler = await deck.ok<LineupCommandResult>(HANDLER, 'post', slotPath(cycle.id, second.id, 'return'), {
      slotVersion: onCatapult.version,
      reason: 'Respot',
      catapultOfficerAgreed: true,
    });
    expect(byHandler.change.summary).toBe(
      "C25 returned from cat 1 to the deck pool with the catapult officer's agreement: Respot",
    );
    after = await deck.snapshot(cycle.id);
    expect(after.lanes.find((lane) => lane.number === 1)!.slotIds).toEqual([]);
  });

  it('returns an aircraft from the last step before the launch, and refuses one already launched', async () => {
    const cycle = await deck.createCycle();
    const ready = await deck.addSlot(cycle.id, 'C26', { pilotEmail: pilot(8) });
    const launched = await deck.addSlot(cycle.id, 'C27', { pilotEmail: pilot(9) });
    await deck.place(cycle.id, launched.id, 2);
    await deck.place(cycle.id, ready.id, 1);
    await deck.start(cycle.id);
    expect(await deck.readyToLaunch(cycle.id, ready.id, pilot(8))).toMatchObject({ status: 'pilot_ready' });

    const atPilotReady = await deck.slot(cycle.id, ready.id);
    const returned = await deck.ok<LineupCommandResult>(
      catapultOfficer(1),
      'post',
      slotPath(cycle.id, ready.id, 'return'),
      { slotVersion: atPilotReady.version, reason: 'Pilot reports a canopy seal warning' },
    );
    expect(returned.change.summary).toBe(
      'C26 returned from cat 1 to the deck pool: Pilot reports a canopy seal warning',
    );
    const after = await deck.snapshot(cycle.id);
    expect(after.pool).toContain(ready.id);
    expect(after.slots.find((slot) => slot.id === ready.id)).toMatchObject({
      status: 'planned',
      catapultWeightAckAt: null,
    });

    const shot = await deck.launch(cycle.id, await deck.readyToLaunch(cycle.id, launched.id, pilot(9)), launchKey());
    expect(shot.status).toBe(200);
    const gone = await deck.slot(cycle.id, launched.id);
    const refused = await deck.call(catapultOfficer(2), 'post', slotPath(cycle.id, launched.id, 'return'), {
      slotVersion: gone.version,
      reason: 'Too late',
    });
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({
      code: 'wrong_step',
      message: 'C27 is launched; only an aircraft taxiing or on the catapult returns to the pool.',
    });
  });

  it('keeps a pilot-less aircraft out of every catapult order, so it never waits on a catapult for a pilot', async () => {
    const cycle = await deck.createCycle();
    const tanker = await deck.addSlot(cycle.id, 'L49', { tanker: true, mission: 'Tanker' });
    const lane = (await deck.snapshot(cycle.id)).lanes.find((candidate) => candidate.number === 2)!;
    const move = await deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/moves`, {
      slotId: tanker.id,
      slotVersion: tanker.version,
      toCatapultId: lane.catapultId,
      toIndex: 0,
      targetLaneOrder: lane.slotIds,
    });
    expect(move.status).toBe(409);
    expect(move.body).toMatchObject({
      code: 'pilot_missing',
      message: 'L49 has no pilot; assign one before it joins cat 2.',
    });

    const applied = await deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/suggestion/apply`, {
      basisVersion: (await deck.snapshot(cycle.id)).version,
      lanes: [{ catapultId: lane.catapultId, slotIds: [tanker.id] }],
    });
    expect(applied.status).toBe(409);
    expect(applied.body.code).toBe('pilot_missing');

    // Crewed and placed, it keeps its pilot while it stands in the order.
    await deck.place(cycle.id, tanker.id, 2);
    const placed = await deck.slot(cycle.id, tanker.id);
    const off = await deck.call(AIR_OPS, 'post', slotPath(cycle.id, tanker.id, 'pilot'), {
      slotVersion: placed.version,
      pilotId: null,
    });
    expect(off.status).toBe(409);
    expect(off.body.message).toBe('L49 is in the order of cat 2; move it to the deck pool before its pilot leaves it.');
    const elsewhere = await deck.addSlot(cycle.id, 'C32');
    const moved = await deck.call(AIR_OPS, 'post', slotPath(cycle.id, elsewhere.id, 'pilot'), {
      slotVersion: elsewhere.version,
      pilotId: placed.pilotId,
    });
    expect(moved.status).toBe(409);
    expect(moved.body.code).toBe('pilot_missing');
  });

  it('leaves a pilot-less aircraft out of the suggestion, listed as unassigned, until air operations assigns one', async () => {
    const cycle = await deck.createCycle();
    const manned = await deck.addSlotInHangar(cycle.id, 'C26', { pilotEmail: pilot(8) });
    const tanker = await deck.addSlotInHangar(cycle.id, 'L48', { tanker: true, mission: 'Tanker' });
    let suggestion = await deck.ok<SuggestedLineup>(HANDLER, 'get', `/api/cycles/${cycle.id}/lineup/suggestion`);
    expect(suggestion.lanes.flatMap((lane) => lane.slotIds)).toEqual([manned.id]);
    expect(suggestion.unassigned).toEqual([tanker.id]);

    // Air operations moves the pilot from C26 to the tanker in one change.
    const pilotId = (await deck.me(pilot(8))).id;
    const moved = await deck.ok<LineupCommandResult>(AIR_OPS, 'post', slotPath(cycle.id, tanker.id, 'pilot'), {
      slotVersion: tanker.version,
      pilotId,
    });
    expect(moved.change.summary).toMatch(/ moves from C26 to L48$/);
    const after = await deck.snapshot(cycle.id);
    expect(after.slots.find((slot) => slot.id === tanker.id)!.pilotId).toBe(pilotId);
    expect(after.slots.find((slot) => slot.id === manned.id)!.pilotId).toBeNull();
    suggestion = await deck.ok<SuggestedLineup>(HANDLER, 'get', `/api/cycles/${cycle.id}/lineup/suggestion`);
    expect(suggestion.lanes.flatMap((lane) => lane.slotIds)).toEqual([tanker.id]);
    expect(suggestion.unassigned).toEqual([manned.id]);

    const notPilot = await deck.call(HANDLER, 'post', slotPath(cycle.id, manned.id, 'pilot'), {
      slotVersion: (await deck.slot(cycle.id, manned.id)).version,
      pilotId: (await deck.me(HANDLER)).id,
    });
    expect(notPilot.status).toBe(400);
    expect(notPilot.body.code).toBe('invalid_pilot');
  });
});
