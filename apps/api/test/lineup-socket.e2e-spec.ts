import {
  ROLES,
  type LineupChange,
  type LineupCommandResult,
  type LineupSnapshot,
  applyLineupChanges,
} from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import { TEST_PASSWORD, createUser } from './support/fleet-fixtures.js';
import { HANDLER, LineupDriver, OBSERVER, pilot } from './support/lineup-fixtures.js';
import { demoEmail, signIn } from './support/sign-in.js';
import { type ClientSocket, connected, eventually, join, openSocket, recordChanges } from './support/socket-client.js';
import { startTestApp } from './support/test-app.js';

describe('live lineup over socket.io', () => {
  let app: INestApplication;
  let url: string;
  let origin: string;
  let deck: LineupDriver;
  const sockets: ClientSocket[] = [];

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    deck = new LineupDriver(url);
    origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
  });

  afterEach(() => {
    for (const socket of sockets.splice(0)) socket.disconnect();
  });

  afterAll(async () => {
    await app.close();
  });

  async function open(token: string): Promise<ClientSocket> {
    const socket = openSocket(url, { token, origin });
    sockets.push(socket);
    await connected(socket);
    return socket;
  }

  async function joinSnapshot(socket: ClientSocket, cycleId: number): Promise<LineupSnapshot> {
    const result = await join(socket, { cycleId });
    if (!result.ok || result.mode !== 'snapshot') throw new Error(`Join answered ${JSON.stringify(result)}`);
    return result.snapshot;
  }

  /** A cycle with `perLane` planned aircraft on each of the four catapults. */
  async function cycleWithFullLanes(perLane: number) {
    const cycle = await deck.createCycle();
    const sides = [
      'C21',
      'C22',
      'C23',
      'C24',
      'C25',
      'C26',
      'C27',
      'C28',
      'C29',
      'C30',
      'C31',
      'C32',
      'D33',
      'D34',
      'D35',
      'D36',
    ];
    for (const [index, side] of sides.slice(0, perLane * 4).entries()) {
      const slot = await deck.addSlot(cycle.id, side);
      await deck.place(cycle.id, slot.id, (index % 4) + 1);
    }
    return cycle;
  }

  /** Moves the last aircraft of a lane to its front, `count` times, keeping its basis from each answer. */
  async function rotateLane(
    token: string,
    cycleId: number,
    start: LineupSnapshot,
    catapultNumber: number,
    count: number,
  ) {
    const lane = start.lanes.find((candidate) => candidate.number === catapultNumber)!;
    let order = [...lane.slotIds];
    const versions = new Map(start.slots.map((slot) => [slot.id, slot.version]));
    for (let i = 0; i < count; i += 1) {
      const slotId = order.at(-1)!;
      const response = await deck.callWith(token, 'post', `/api/cycles/${cycleId}/lineup/moves`, {
        slotId,
        slotVersion: versions.get(slotId),
        toCatapultId: lane.catapultId,
        toIndex: 0,
        targetLaneOrder: order,
      });
      if (response.status !== 200)
        throw new Error(
          `Move ${i} on cat ${catapultNumber} answered ${response.status}: ${JSON.stringify(response.body)}`,
        );
      const { patch } = (response.body as LineupCommandResult).change;
      for (const slot of patch.slots ?? []) versions.set(slot.id, slot.version);
      order = patch.lanes!.find((candidate) => candidate.catapultId === lane.catapultId)!.slotIds;
    }
  }

  const versionsOf = (changes: LineupChange[]) => changes.map((change) => change.version);
  const range = (from: number, count: number) => Array.from({ length: count }, (_, i) => from + i);

  it('delivers each of 200 changes by four handlers to each of 50 clients, in order and once', async () => {
    const cycle = await cycleWithFullLanes(4);
    const admin = await deck.token(demoEmail('admin'));
    const handlers = [await deck.token(HANDLER)];
    for (let i = 0; i < 3; i += 1)
      handlers.push(await signIn(url, (await createUser(url, admin, 'handler')).email, TEST_PASSWORD));
    const observer = await deck.token(OBSERVER);
    const clients = await Promise.all(
      Array.from({ length: 50 }, async () => {
        const socket = await open(observer);
        const received = recordChanges(socket);
        return { snapshot: await joinSnapshot(socket, cycle.id), received };
      }),
    );
    const start = await deck.snapshot(cycle.id);
    expect(clients.every((client) => client.snapshot.version === start.version)).toBe(true);

    await Promise.all(handlers.map((token, lane) => rotateLane(token, cycle.id, start, lane + 1, 50)));

    const final = await deck.snapshot(cycle.id);
    expect(final.version).toBe(start.version + 200);
    await eventually(
      () => clients.every((client) => client.received.length >= 200),
      30_000,
      'all 50 clients to get 200 changes',
    );
    for (const client of clients) {
      expect(versionsOf(client.received)).toEqual(range(start.version + 1, 200));
      expect(applyLineupChanges(client.snapshot, client.received)).toEqual(final);
    }
    expect(new Set(clients[0].received.map((change) => change.actor.name)).size).toBe(4);
  }, 120_000);

  it('replays the 20 changes a client missed while disconnected, in order, when it rejoins from its version', async () => {
    const cycle = await cycleWithFullLanes(2);
    const socket = await open(await deck.token(OBSERVER));
    const held = await joinSnapshot(socket, cycle.id);
    socket.disconnect();

    await rotateLane(await deck.token(HANDLER), cycle.id, held, 2, 20);

    const live = recordChanges(socket);
    socket.connect();
    await connected(socket);
    const result = await join(socket, { cycleId: cycle.id, sinceVersion: held.version });
    if (!result.ok || result.mode !== 'replay') throw new Error(`Rejoin answered ${JSON.stringify(result)}`);
    expect(versionsOf(result.changes)).toEqual(range(held.version + 1, 20));
    expect(applyLineupChanges(held, result.changes)).toEqual(await deck.snapshot(cycle.id));
    expect(live).toEqual([]);

    await rotateLane(await deck.token(HANDLER), cycle.id, await deck.snapshot(cycle.id), 1, 1);
    await eventually(() => live.length === 1, 5_000, 'the next change after the replay');
    expect(live[0].version).toBe(held.version + 21);
  });

  it('answers a rejoin from a version the cycle has not reached with a snapshot', async () => {
    const cycle = await deck.createCycle();
    const socket = await open(await deck.token(OBSERVER));
    const result = await join(socket, { cycleId: cycle.id, sinceVersion: 50 });
    expect(result).toMatchObject({ ok: true, mode: 'snapshot', snapshot: { version: 0 } });
  });

  it('lets every role join a cycle room', async () => {
    const cycle = await deck.createCycle();
    for (const role of ROLES) {
      const socket = await open(await deck.token(demoEmail(role)));
      expect(await join(socket, { cycleId: cycle.id })).toMatchObject({ ok: true, mode: 'snapshot' });
    }
  });

  it('refuses a join that names no cycle, or a cycle that does not exist, in its acknowledgement', async () => {
    const socket = await open(await deck.token(OBSERVER));
    const malformed = await join(socket, { cycleId: 'seven' as unknown as number });
    expect(malformed).toMatchObject({ ok: false, code: 'validation_failed' });
    expect(malformed.ok === false && malformed.message).toContain('cycleId');
    expect(await join(socket, { cycleId: 999_999 })).toEqual({
      ok: false,
      code: 'not_found',
      message: 'Cycle 999999 does not exist.',
    });
  });

  describe('refuses a connection', () => {
    async function refusal(options: { token?: string; origin?: string }) {
      const socket = openSocket(url, options);
      sockets.push(socket);
      const error = await connected(socket).then(
        () => null,
        (failure: Error & { data?: { code: string } }) => failure,
      );
      return { message: error?.message, code: error?.data?.code };
    }

    async function tokenWith(claims: { exp: number }) {
      const jwt = app.get(JwtService);
      const { sub, role, tv, sid } = jwt.decode<{ sub: number; role: string; tv: number; sid: string }>(
        await deck.token(OBSERVER),
      );
      return jwt.signAsync({ sub, role, tv, sid, ...claims });
    }

    it('without a token', async () => {
      expect(await refusal({ origin })).toEqual({ message: 'Sign in to connect.', code: 'unauthenticated' });
    });

    it('with a token that is not ours', async () => {
      expect((await refusal({ origin, token: 'not.a.token' })).code).toBe('session_invalid');
    });

    it('with an expired token', async () => {
      const expired = await tokenWith({ exp: Math.floor(Date.now() / 1000) - 60 });
      expect((await refusal({ origin, token: expired })).code).toBe('session_invalid');
    });

    it('from a foreign origin, or from none', async () => {
      const token = await deck.token(OBSERVER);
      expect(await refusal({ origin: 'http://elsewhere.example', token })).toEqual({
        message: 'This page is not allowed to connect to Catline.',
        code: 'origin_refused',
      });
      expect((await refusal({ token })).code).toBe('origin_refused');
    });

    it('when the token runs out, unless the session is refreshed first', async () => {
      const shortLived = () => tokenWith({ exp: Math.floor(Date.now() / 1000) + 2 });
      const cut = await open(await shortLived());
      const kept = await open(await shortLived());
      const expired = new Promise<void>((resolve) => cut.once('session:expired', () => resolve()));
      const refreshed = await kept
        .timeout(5_000)
        .emitWithAck('session:refresh', { accessToken: await deck.token(OBSERVER) });
      expect(refreshed).toMatchObject({ ok: true });

      await expired;
      await eventually(() => cut.disconnected, 3_000, 'the expired socket to be cut');
      await new Promise((resolve) => setTimeout(resolve, 500));
      expect(kept.connected).toBe(true);
    });
  });

  it("gives a pilot's socket no way to change the lineup", async () => {
    const cycle = await cycleWithFullLanes(1);
    const socket = await open(await deck.token(pilot(1)));
    const held = await joinSnapshot(socket, cycle.id);
    const lane = held.lanes[0];
    const slot = held.slots.find((candidate) => candidate.id === lane.slotIds[0])!;
    const move = { slotId: slot.id, slotVersion: slot.version, toCatapultId: null, toIndex: 0, targetLaneOrder: [] };

    const unanswered = await (
      socket as unknown as { timeout(ms: number): { emitWithAck(event: string, body: object): Promise<unknown> } }
    )
      .timeout(500)
      .emitWithAck('lineup:move', move)
      .then(
        () => 'answered',
        () => 'no answer',
      );
    expect(unanswered).toBe('no answer');
    const refresh = await socket
      .timeout(5_000)
      .emitWithAck('session:refresh', { accessToken: await deck.token(HANDLER) });
    expect(refresh).toEqual({ ok: false, message: 'That token belongs to someone else.' });
    const rest = await deck.call(pilot(1), 'post', `/api/cycles/${cycle.id}/lineup/moves`, move);
    expect(rest.status).toBe(403);
    expect((await deck.snapshot(cycle.id)).version).toBe(held.version);
  });
});
