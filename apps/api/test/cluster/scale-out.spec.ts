import type { LineupSnapshot } from '@catline/contracts';
import { HANDLER, LineupDriver, launchKey, OBSERVER, pilot } from '../support/lineup-fixtures.js';
import { eventually } from '../support/socket-client.js';
import { ApiCluster } from './api-cluster.js';
import { CatapultToggler } from './catapult-toggler.js';
import { FollowingClient } from './following-client.js';

const CLIENTS_PER_PROCESS = 3;
/**
 * How often one client may have to catch up from the change log in the proxy run. Two processes'
 * broadcasts can overtake each other now and then; more than this means the shared rooms do not carry
 * the changes and clients live on replays.
 */
const MAX_REJOINS_PER_CLIENT = 5;
const SIDES = ['C21', 'C22', 'C23', 'C24', 'C25', 'C26', 'C27', 'C28'];

/** The versions after `from` up to `to`, each once, in order. */
const versionsBetween = (from: number, to: number) => Array.from({ length: to - from }, (_, i) => from + 1 + i);

describe('two API processes sharing one board through Redis', () => {
  let cluster: ApiCluster;
  let deck: LineupDriver;
  let cycleId: number;
  let catapultIds: number[];
  let observerToken: string;
  let handlerToken: string;
  const clients: FollowingClient[] = [];

  beforeAll(async () => {
    cluster = await ApiCluster.start(2);
    deck = new LineupDriver(cluster.urls[0]);
    const cycle = await deck.createCycle();
    cycleId = cycle.id;
    for (const [index, side] of SIDES.entries()) {
      const slot = await deck.addSlot(cycleId, side);
      await deck.place(cycleId, slot.id, (index % 4) + 1);
    }
    catapultIds = await Promise.all([1, 2, 3, 4].map((number) => deck.catapultId(number)));
    observerToken = await deck.token(OBSERVER);
    handlerToken = await deck.token(HANDLER);
  }, 180_000);

  afterEach(() => {
    for (const client of clients.splice(0)) client.close();
  });

  afterAll(async () => {
    await cluster?.stop();
  });

  /** CLIENTS_PER_PROCESS clients on each process, joined to the cycle. */
  async function followers(): Promise<FollowingClient[]> {
    const opened = cluster.urls.flatMap((_, at) =>
      Array.from({ length: CLIENTS_PER_PROCESS }, () => new FollowingClient(cluster.urls, at, observerToken, cycleId)),
    );
    clients.push(...opened);
    await Promise.all(opened.map((client) => client.start()));
    return opened;
  }

  /** Waits for every client to reach the database's version, then checks what each applied against it. */
  async function expectEveryChangeInOrder(following: FollowingClient[], startedAt: number[]): Promise<LineupSnapshot> {
    const final = await deck.snapshot(cycleId);
    await eventually(
      () => following.every((client) => client.version >= final.version),
      20_000,
      'every client to reach the last version',
    );
    following.forEach((client, index) => {
      expect(client.failures).toEqual([]);
      expect(client.applied).toEqual(versionsBetween(startedAt[index], final.version));
      expect(client.snapshot).toEqual(final);
    });
    return final;
  }

  it('delivers 500 changes committed on both processes to every client on either, in order', async () => {
    const following = await followers();
    const startedAt = following.map((client) => client.version);
    // Two handlers on each process, each on a catapult of its own, all at once.
    const handlers = catapultIds.map(
      (catapultId, index) => new CatapultToggler(cluster.urls, index % 2, handlerToken, cycleId, catapultId),
    );
    await Promise.all(handlers.map((handler) => handler.run(125)));

    const final = await expectEveryChangeInOrder(following, startedAt);
    expect(final.version - startedAt[0]).toBe(500);
    // Broadcasts cross between the processes: without the shared rooms, a client would get half the
    // changes only through rejoining. A gap now and then (two processes' broadcasts overtaking) is fine.
    for (const client of following) expect(client.replayed).toBeLessThan(50);
    const gaps = following.reduce((sum, client) => sum + client.gaps, 0);
    const replayed = following.reduce((sum, client) => sum + client.replayed, 0);
    console.info(
      `500 changes from two processes, ${following.length} clients: ${gaps} gaps, ${replayed} changes taken from a replay`,
    );
  });

  it('carries moves, readiness steps and launches through the cluster proxy to every client, in order', async () => {
    const frontDoor = await cluster.frontDoor();
    const crew = new LineupDriver(frontDoor);
    const cycle = await crew.createCycle();
    // Two aircraft for each of cats 1 and 2, to be readied and launched; one on cat 3 that the handler
    // keeps moving between cats 3 and 4 meanwhile. Each has a pilot, as a catapult's order needs.
    const launching = new Map<number, { slotId: number; pilotEmail: string }[]>([
      [1, []],
      [2, []],
    ]);
    for (const [index, side] of ['C21', 'C22', 'C23', 'C24'].entries()) {
      const pilotEmail = pilot(index + 1);
      const slot = await crew.addSlot(cycle.id, side, { pilotEmail });
      const catapult = (index % 2) + 1;
      await crew.place(cycle.id, slot.id, catapult);
      launching.get(catapult)!.push({ slotId: slot.id, pilotEmail });
    }
    const shuttled = await crew.addSlot(cycle.id, 'C25', { pilotEmail: pilot(5) });
    await crew.place(cycle.id, shuttled.id, 3);
    // A catapult's status belongs to the ship: the toggling above may have left cats 1 and 2 down.
    for (const lane of (await crew.snapshot(cycle.id)).lanes.filter(
      (lane) => lane.number <= 2 && lane.status === 'down',
    ))
      await crew.ok(HANDLER, 'post', `/api/cycles/${cycle.id}/lineup/catapults/${lane.catapultId}/status`, {
        status: 'up',
        basisStatus: 'down',
      });
    await crew.start(cycle.id);

    // Every client connects through the proxy, which hands each websocket to the next process.
    const following = Array.from(
      { length: 2 * CLIENTS_PER_PROCESS },
      () => new FollowingClient([frontDoor], 0, observerToken, cycle.id),
    );
    clients.push(...following);
    await Promise.all(following.map((client) => client.start()));
    const startedAt = following.map((client) => client.version);

    const crews = [...launching].map(async ([, slots]) => {
      for (const { slotId, pilotEmail } of slots) {
        const ready = await crew.readyToLaunch(cycle.id, slotId, pilotEmail);
        const answer = await crew.launch(cycle.id, ready, launchKey());
        expect({ status: answer.status, body: answer.body }).toMatchObject({ status: 200 });
      }
    });
    const handler = (async () => {
      for (let move = 0; move < 30; move += 1) await crew.place(cycle.id, shuttled.id, move % 2 === 0 ? 4 : 3);
    })();
    await Promise.all([...crews, handler]);

    const final = await deck.snapshot(cycle.id);
    await eventually(
      () => following.every((client) => client.version >= final.version),
      20_000,
      'every client to reach the last version',
    );
    following.forEach((client, index) => {
      expect(client.failures).toEqual([]);
      expect(client.applied).toEqual(versionsBetween(startedAt[index], final.version));
      expect(client.snapshot).toEqual(final);
      expect(client.gaps).toBeLessThanOrEqual(MAX_REJOINS_PER_CLIENT);
    });
    const launched = final.slots.filter((slot) => slot.status === 'launched').map((slot) => slot.sideNumber);
    expect(launched.sort()).toEqual(['C21', 'C22', 'C23', 'C24']);
    expect(final.lanes.find((lane) => lane.number === 3)!.slotIds).toEqual([shuttled.id]);
    const gaps = following.reduce((sum, client) => sum + client.gaps, 0);
    console.info(
      `Proxy run: ${final.version - startedAt[0]} changes (30 moves, readiness steps, 4 launches), ${following.length} clients: ${gaps} rejoins`,
    );
  });

  it('moves the clients of a crashed process to the other one without losing a change', async () => {
    const following = await followers();
    const startedAt = following.map((client) => client.version);
    const onSecond = following.filter((client) => client.url === cluster.urls[1]);
    const handlers = [0, 1].map(
      (at) => new CatapultToggler(cluster.urls, at, handlerToken, cycleId, catapultIds[at * 2]),
    );
    const running = Promise.all(handlers.map((handler) => handler.run(100)));

    await eventually(
      () => following.every((client) => client.applied.length >= 40),
      30_000,
      '40 changes before the crash',
    );
    await cluster.crash(1);
    await running;

    const final = await expectEveryChangeInOrder(following, startedAt);
    // A command cut off by the crash may have committed without an answer.
    expect(final.version - startedAt[0]).toBeGreaterThanOrEqual(200);
    for (const client of onSecond) {
      expect(client.url).toBe(cluster.urls[0]);
      expect(client.failovers).toBe(1);
    }
  });
});
