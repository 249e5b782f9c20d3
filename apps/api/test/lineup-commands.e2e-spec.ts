import type { AircraftView, LineupCommandResult, LineupSnapshot, SuggestedLineup } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { applyLineupChanges, applyLineupPatch } from '@catline/contracts';
import { ADMIN, AIR_OPS, HANDLER, LineupDriver, OBSERVER, launchKey, pilot } from './support/lineup-fixtures.js';
import { readChangeLog } from './support/change-log.js';
import { startTestApp } from './support/test-app.js';

const idsOf = (snapshot: LineupSnapshot, catapultNumber: number) =>
  snapshot.lanes.find((lane) => lane.number === catapultNumber)!.slotIds;

describe('lineup commands', () => {
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

  /** A cycle with three aircraft on cat 1 and two on cat 2. */
  async function cycleWithLanes() {
    const cycle = await deck.createCycle();
    const sides = ['C21', 'C22', 'C23', 'D33', 'D34'];
    const slots = [];
    for (const side of sides) slots.push(await deck.addSlot(cycle.id, side));
    for (const [index, slot] of slots.entries()) await deck.place(cycle.id, slot.id, index < 3 ? 1 : 2);
    return { cycle, slots, snapshot: await deck.snapshot(cycle.id) };
  }

  const changesOf = async (cycleId: number, since: number) =>
    readChangeLog(deck.url, await deck.token(OBSERVER), cycleId, { since });

  it('accepts one of two moves of the same slot from the same basis and refuses the other with what changed', async () => {
    const { cycle, slots, snapshot } = await cycleWithLanes();
    const moving = snapshot.slots.find((slot) => slot.id === slots[2].id)!;
    const lane = snapshot.lanes.find((candidate) => candidate.number === 1)!;
    const other = snapshot.lanes.find((candidate) => candidate.number === 2)!;
    const toFront = {
      slotId: moving.id,
      slotVersion: moving.version,
      toCatapultId: lane.catapultId,
      toIndex: 0,
      targetLaneOrder: lane.slotIds,
    };
    const toCat2 = {
      slotId: moving.id,
      slotVersion: moving.version,
      toCatapultId: other.catapultId,
      toIndex: 0,
      targetLaneOrder: other.slotIds,
    };

    const [first, second] = await Promise.all([
      deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/moves`, toFront),
      deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/moves`, toCat2),
    ]);

    expect([first.status, second.status].sort()).toEqual([200, 409]);
    const [winner, loser] = first.status === 200 ? [first, second] : [second, first];
    expect(loser.body.code).toBe('stale_basis');
    expect(loser.body.message).toContain('Tomas Ebberhold');
    expect(loser.body.message).toContain((winner.body as LineupCommandResult).change.summary);
    const changes = await changesOf(cycle.id, snapshot.version);
    expect(changes.map((change) => change.version)).toEqual([snapshot.version + 1]);
    const after = await deck.snapshot(cycle.id);
    if (winner === first) {
      expect(idsOf(after, 1)).toEqual([slots[2].id, slots[0].id, slots[1].id]);
    } else {
      expect(idsOf(after, 1)).toEqual([slots[0].id, slots[1].id]);
      expect(idsOf(after, 2)).toEqual([slots[2].id, slots[3].id, slots[4].id]);
    }
  });

  it('accepts reorders of two lanes made from the same cycle version, with consecutive versions', async () => {
    const { cycle, slots, snapshot } = await cycleWithLanes();
    const reorder = (slotIndex: number, catapultNumber: number) => {
      const lane = snapshot.lanes.find((candidate) => candidate.number === catapultNumber)!;
      const slot = snapshot.slots.find((candidate) => candidate.id === slots[slotIndex].id)!;
      return deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/moves`, {
        slotId: slot.id,
        slotVersion: slot.version,
        toCatapultId: lane.catapultId,
        toIndex: 0,
        targetLaneOrder: lane.slotIds,
      });
    };
    const answers = await Promise.all([reorder(2, 1), reorder(4, 2)]);
    expect(answers.map((answer) => answer.status)).toEqual([200, 200]);
    expect(answers.map((answer) => answer.body.version).sort()).toEqual([snapshot.version + 1, snapshot.version + 2]);
    const after = await deck.snapshot(cycle.id);
    expect(idsOf(after, 1)).toEqual([slots[2].id, slots[0].id, slots[1].id]);
    expect(idsOf(after, 2)).toEqual([slots[4].id, slots[3].id]);
  });

  it('launches on one catapult while the handler reorders another', async () => {
    const cycle = await deck.createCycle();
    const launching = await deck.addSlot(cycle.id, 'C24', { pilotEmail: pilot(2) });
    const waiting = [await deck.addSlot(cycle.id, 'D35'), await deck.addSlot(cycle.id, 'D36')];
    await deck.place(cycle.id, launching.id, 1);
    for (const slot of waiting) await deck.place(cycle.id, slot.id, 2);
    await deck.start(cycle.id);
    const ready = await deck.readyToLaunch(cycle.id, launching.id, pilot(2));
    const snapshot = await deck.snapshot(cycle.id);
    const lane = snapshot.lanes.find((candidate) => candidate.number === 2)!;
    const last = snapshot.slots.find((slot) => slot.id === waiting[1].id)!;

    const [launch, reorder] = await Promise.all([
      deck.launch(cycle.id, ready, launchKey()),
      deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/moves`, {
        slotId: last.id,
        slotVersion: last.version,
        toCatapultId: lane.catapultId,
        toIndex: 0,
        targetLaneOrder: lane.slotIds,
      }),
    ]);

    expect([launch.status, reorder.status]).toEqual([200, 200]);
    const after = await deck.snapshot(cycle.id);
    expect(after.slots.find((slot) => slot.id === launching.id)!.status).toBe('launched');
    expect(idsOf(after, 2)).toEqual([waiting[1].id, waiting[0].id]);
    expect(after.version).toBe(snapshot.version + 2);
  });

  it('records a double launch once and counts one shot', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C25', { pilotEmail: pilot(1) });
    await deck.place(cycle.id, slot.id, 1);
    await deck.start(cycle.id);
    const ready = await deck.readyToLaunch(cycle.id, slot.id, pilot(1));
    const shotsBefore = await shots(slot.aircraftId, ready.catapultId!);
    const key = launchKey();

    const answers = await Promise.all([deck.launch(cycle.id, ready, key), deck.launch(cycle.id, ready, key)]);

    expect(answers.map((answer) => answer.status)).toEqual([200, 200]);
    expect(answers[0].body).toEqual(answers[1].body);
    expect(await shots(slot.aircraftId, ready.catapultId!)).toEqual({
      aircraft: shotsBefore.aircraft + 1,
      catapult: shotsBefore.catapult + 1,
    });
    const launches = (await changesOf(cycle.id, 0)).filter((change) => change.kind === 'slot_launched');
    expect(launches).toHaveLength(1);
    const again = await deck.launch(cycle.id, ready, launchKey());
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('already_launched');
  });

  it('closes the cycle in the same transaction as its last launch, as the next version', async () => {
    const cycle = await deck.createCycle();
    const slot = await deck.addSlot(cycle.id, 'C26', { pilotEmail: pilot(3) });
    await deck.addSlot(cycle.id, 'C27', { spare: true });
    await deck.place(cycle.id, slot.id, 3);
    await deck.start(cycle.id);
    const ready = await deck.readyToLaunch(cycle.id, slot.id, pilot(3));

    const launch = await deck.launch(cycle.id, ready, launchKey());

    expect(launch.status).toBe(200);
    const changes = await changesOf(cycle.id, launch.body.version - 1);
    expect(changes.map((change) => [change.version, change.kind])).toEqual([
      [launch.body.version, 'slot_launched'],
      [launch.body.version + 1, 'cycle_closed'],
    ]);
    const after = await deck.snapshot(cycle.id);
    expect(after.cycle.state).toBe('closed');
    expect(after.slots.map((view) => view.status).sort()).toEqual(['launched', 'scratched']);
  });

  it.each([
    ['a missing slot version', { toIndex: 0, targetLaneOrder: [] }, 'slotVersion'],
    ['a text index', { slotVersion: 0, toIndex: 'first', targetLaneOrder: [] }, 'toIndex'],
    ['a negative index', { slotVersion: 0, toIndex: -1, targetLaneOrder: [] }, 'toIndex'],
    ['a lane order of names', { slotVersion: 0, toIndex: 0, targetLaneOrder: ['D33'] }, 'targetLaneOrder'],
    ['an unknown field', { slotVersion: 0, toIndex: 0, targetLaneOrder: [], speed: 'fast' }, 'speed'],
  ])('refuses a move with %s with a readable 400 and changes nothing', async (_case, fields, named) => {
    const { cycle, slots, snapshot } = await sharedCycle();
    const lane = snapshot.lanes.find((candidate) => candidate.number === 1)!;
    const response = await deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/moves`, {
      slotId: slots[0].id,
      toCatapultId: lane.catapultId,
      ...fields,
    });
    expect(response.status).toBe(400);
    expect(response.body.code).toBe('validation_failed');
    expect(response.body.message).toContain(named);
    expect((await deck.snapshot(cycle.id)).version).toBe(snapshot.version);
  });

  it.each([
    ['a launch without a key', 'launch', { slotVersion: 0 }, 'idempotencyKey'],
    ['a launch key with spaces', 'launch', { slotVersion: 0, idempotencyKey: 'two words here' }, 'idempotencyKey'],
    ['a suspend with a blank reason', 'suspend', { slotVersion: 0, reason: '   ' }, 'reason'],
    ['an unknown readiness step', 'advance', { slotVersion: 0, to: 'airborne' }, 'to'],
    ['a weight in kilograms', 'weight-ack', { slotVersion: 0, grossWeightLb: '20 t' }, 'grossWeightLb'],
    ['a down with a spare named by side number', 'down', { slotVersion: 0, spareSlotId: 'spare' }, 'spareSlotId'],
  ])('refuses %s with a readable 400', async (_case, command, body, named) => {
    const { cycle, slots, snapshot } = await sharedCycle();
    const email = {
      launch: 'cat1@catline.example',
      suspend: 'cat1@catline.example',
      advance: 'cat1@catline.example',
      'weight-ack': pilot(1),
      down: HANDLER,
    }[command]!;
    const response = await deck.call(
      email,
      'post',
      `/api/cycles/${cycle.id}/lineup/slots/${slots[0].id}/${command}`,
      body,
    );
    expect(response.status).toBe(400);
    expect(response.body.message).toContain(named);
    expect((await deck.snapshot(cycle.id)).version).toBe(snapshot.version);
  });

  it('refuses a move to a place behind nothing with a readable 400', async () => {
    const { cycle, slots, snapshot } = await sharedCycle();
    const lane = snapshot.lanes.find((candidate) => candidate.number === 2)!;
    const slot = snapshot.slots.find((candidate) => candidate.id === slots[0].id)!;
    const response = await deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/moves`, {
      slotId: slot.id,
      slotVersion: slot.version,
      toCatapultId: lane.catapultId,
      toIndex: 7,
      targetLaneOrder: lane.slotIds,
    });
    expect(response.status).toBe(400);
    expect(response.body).toMatchObject({
      code: 'invalid_lineup',
      message: 'Place 8 on cat 2 is not open to C21: choose place 1 to 3.',
    });
    expect((await deck.snapshot(cycle.id)).version).toBe(snapshot.version);
  });

  it('marks an aircraft down and lets a spare from the pool take its place', async () => {
    const { cycle, slots } = await cycleWithLanes();
    const spare = await deck.addSlot(cycle.id, 'C28', { spare: true });
    const down = await deck.slot(cycle.id, slots[1].id);

    const result = await deck.ok<LineupCommandResult>(
      HANDLER,
      'post',
      `/api/cycles/${cycle.id}/lineup/slots/${down.id}/down`,
      {
        slotVersion: down.version,
        spareSlotId: spare.id,
      },
    );

    // Its pilot walks to the spare with the place.
    expect(result.change.summary).toBe(`C22 down; spare C28 takes cat 1, place 2; ${down.pilotName} moves to C28`);
    const after = await deck.snapshot(cycle.id);
    expect(idsOf(after, 1)).toEqual([slots[0].id, spare.id, slots[2].id]);
    expect(after.slots.find((slot) => slot.id === down.id)).toMatchObject({
      status: 'down',
      catapultId: null,
      position: null,
    });
    expect(after.pool).not.toContain(down.id);
    const again = await deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/slots/${slots[0].id}/down`, {
      slotVersion: (await deck.slot(cycle.id, slots[0].id)).version,
      spareSlotId: spare.id,
    });
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('spare_unavailable');
  });

  it('marks a catapult down, keeps its slots in the lane as no-go, and refuses a change from a stale status', async () => {
    const { cycle, slots } = await cycleWithLanes();
    const catapultId = await deck.catapultId(2);
    const path = `/api/cycles/${cycle.id}/lineup/catapults/${catapultId}/status`;
    try {
      const result = await deck.ok<LineupCommandResult>(HANDLER, 'post', path, {
        status: 'down',
        basisStatus: 'up',
        reason: 'Shuttle fault',
      });
      expect(result.change.summary).toBe('Cat 2 down: Shuttle fault');
      const after = await deck.snapshot(cycle.id);
      const lane = after.lanes.find((candidate) => candidate.number === 2)!;
      expect(lane).toMatchObject({ status: 'down', go: false, slotIds: [slots[3].id, slots[4].id] });
      const figures = after.slots.find((slot) => slot.id === slots[3].id)!.figures!;
      expect(figures.go).toBe(false);
      expect(figures.reasons.map((reason) => reason.code)).toContain('catapult_down');
      expect(after.slots.find((slot) => slot.id === slots[3].id)!.projectedLaunchAt).toBeNull();

      // A move onto the down catapult carries its lane, status and all; the refusal still names who set it down.
      const moving = after.slots.find((slot) => slot.id === slots[0].id)!;
      await deck.ok(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/moves`, {
        slotId: moving.id,
        slotVersion: moving.version,
        toCatapultId: catapultId,
        toIndex: 0,
        targetLaneOrder: lane.slotIds,
      });
      const stale = await deck.call(HANDLER, 'post', path, { status: 'down', basisStatus: 'up' });
      expect(stale.status).toBe(409);
      expect(stale.body.code).toBe('stale_basis');
      expect(stale.body.message).toBe(
        `Cat 2 is down now: Tomas Ebberhold set it (Cat 2 down: Shuttle fault). Refresh and try again.`,
      );
    } finally {
      await deck.call(HANDLER, 'post', path, { status: 'up', basisStatus: 'down' });
    }
  });

  it('applies the suggested lineup from the version it was made at, and refuses it from an older one', async () => {
    const cycle = await deck.createCycle();
    // Each with a pilot: the suggestion leaves an aircraft without one out.
    const sides = ['C30', 'C31', 'C32', 'D37', 'D38', 'L48'];
    for (const [i, side] of sides.entries()) {
      await deck.addSlot(cycle.id, side, {
        pilotEmail: pilot(i + 2),
        ...(side === 'L48' ? { earlyWarning: true, grossWeightLb: 52_000 } : {}),
      });
    }
    const suggestion = await deck.ok<SuggestedLineup>(HANDLER, 'get', `/api/cycles/${cycle.id}/lineup/suggestion`);
    expect(suggestion.lanes.flatMap((lane) => lane.slotIds)).toHaveLength(6);

    const applied = await deck.ok<LineupCommandResult>(
      HANDLER,
      'post',
      `/api/cycles/${cycle.id}/lineup/suggestion/apply`,
      {
        basisVersion: suggestion.basisVersion,
        lanes: suggestion.lanes,
      },
    );

    const after = await deck.snapshot(cycle.id);
    for (const lane of suggestion.lanes)
      expect(after.lanes.find((candidate) => candidate.catapultId === lane.catapultId)!.slotIds).toEqual(lane.slotIds);
    expect(after.pool).toEqual([]);
    expect(after.lastLaunchAt).toBe(suggestion.lastLaunchAt);
    // The times the dialog shows before applying are the ones the board then shows.
    expect(suggestion.projected).toHaveLength(6);
    for (const launch of suggestion.projected) {
      const slot = after.slots.find((candidate) => candidate.id === launch.slotId)!;
      expect([slot.catapultId, slot.projectedLaunchAt, slot.missesWindow]).toEqual([
        launch.catapultId,
        launch.launchAt,
        launch.missesWindow,
      ]);
    }
    expect(applied.version).toBe(suggestion.basisVersion + 1);
    const stale = await deck.call(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/suggestion/apply`, {
      basisVersion: suggestion.basisVersion,
      lanes: suggestion.lanes,
    });
    expect(stale.status).toBe(409);
    expect(stale.body.message).toContain('Suggested lineup applied');
  });

  it('keeps a change log that replays, patch by patch, to the lineup', async () => {
    const cycle = await deck.createCycle();
    const start = await deck.snapshot(cycle.id);
    const { slots } = await (async () => {
      const added = [
        await deck.addSlot(cycle.id, 'C21', { pilotEmail: pilot(2) }),
        await deck.addSlot(cycle.id, 'D33', { pilotEmail: pilot(3) }),
        await deck.addSlot(cycle.id, 'G43', { grossWeightLb: 26_000, pilotEmail: pilot(4) }),
      ];
      await deck.place(cycle.id, added[0].id, 1);
      await deck.place(cycle.id, added[1].id, 1, 0);
      await deck.place(cycle.id, added[2].id, 4);
      await deck.ok(AIR_OPS, 'patch', `/api/cycles/${cycle.id}/conditions`, {
        basisVersion: (await deck.snapshot(cycle.id)).version,
        trueWindSpeedKt: 4,
      });
      return { slots: added };
    })();

    const changes = await changesOf(cycle.id, 0);

    expect(changes.map((change) => change.version)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    expect(changes.map((change) => change.kind)).toEqual([
      'slot_added',
      'slot_added',
      'slot_added',
      'slot_moved',
      'slot_moved',
      'slot_moved',
      'conditions_changed',
    ]);
    expect(changes[4].summary).toBe('D33 moved to cat 1, place 1');
    const replayed = applyLineupChanges(start, changes);
    expect(replayed).toEqual(await deck.snapshot(cycle.id));
    expect(replayed.slots.map((slot) => slot.id)).toEqual(slots.map((slot) => slot.id));
    expect((await changesOf(cycle.id, 5)).map((change) => change.version)).toEqual([6, 7]);
  });

  it('carries an aircraft edited between two changes in the next patch, as a fresh read shows it', async () => {
    const cycle = await deck.createCycle();
    const [model] = await deck.all<AircraftView>(OBSERVER, '/api/aircraft');
    const side = () => `T${Math.floor(Math.random() * 1_000_000)}`;
    const { typeId, squadronId, parkedSpot } = model;
    const aircraft = await deck.ok<AircraftView>(
      ADMIN,
      'post',
      '/api/aircraft',
      { sideNumber: side(), typeId, squadronId, parkedSpot },
      201,
    );
    const slotId = (await deck.addSlot(cycle.id, aircraft.sideNumber)).id;
    // After this change the API holds the cycle's state in memory (LineupStateCache).
    await deck.place(cycle.id, slotId, 1);
    const renamed = side();
    await deck.ok(ADMIN, 'patch', `/api/aircraft/${aircraft.id}`, { sideNumber: renamed });
    const before = await deck.snapshot(cycle.id);

    const moved = await deck.place(cycle.id, slotId, 2);

    expect(moved.change.patch.slots!.find((slot) => slot.id === slotId)!.sideNumber).toBe(renamed);
    expect(applyLineupPatch(before, moved.version, moved.change.patch)).toEqual(await deck.snapshot(cycle.id));
  });

  it('answers a missing cycle with 404 and a bad since with 400', async () => {
    expect((await deck.call(OBSERVER, 'get', '/api/cycles/999999/lineup')).status).toBe(404);
    expect((await deck.call(OBSERVER, 'get', '/api/cycles/999999/lineup/changes?since=0')).status).toBe(404);
    const bad = await deck.call(OBSERVER, 'get', '/api/cycles/1/lineup/changes?since=soon');
    expect(bad.status).toBe(400);
    expect(bad.body.message).toContain('since');
  });

  let shared: Promise<Awaited<ReturnType<typeof cycleWithLanes>>> | undefined;
  /** One cycle for the checks that change nothing. */
  function sharedCycle() {
    shared ??= cycleWithLanes();
    return shared;
  }

  async function shots(aircraftId: number, catapultId: number) {
    const aircraft = await deck.all<{ id: number; catapultShots: number }>(OBSERVER, '/api/aircraft');
    const ships = await deck.ok<{ catapults: { id: number; shotCount: number }[] }[]>(OBSERVER, 'get', '/api/ships');
    return {
      aircraft: aircraft.find((row) => row.id === aircraftId)!.catapultShots,
      catapult: ships[0].catapults.find((row) => row.id === catapultId)!.shotCount,
    };
  }
});
