import {
  grantAppUser,
  isMariaDBRunning,
  mariadbServer,
  startMariaDB,
  stopMariaDB,
} from '../../../../scripts/lib/mariadb.mjs';
import { createBusyCycle, handlerTokens } from '../support/busy-cycle.js';
import { readChangeLog } from '../support/change-log.js';
import { CommandBurst } from '../support/command-burst.js';
import { LineupDriver, OBSERVER } from '../support/lineup-fixtures.js';
import { LineupFollower, allAt } from '../support/lineup-follower.js';
import { accepted } from '../support/random-lineup-commands.js';
import { eventually } from '../support/socket-client.js';
import { testEnvironment } from '../support/own-database.js';
import { ApiProcess, type ApiSettings, apiSettings } from './support/api-process.js';
import { logProblems } from './support/answered-commands.js';
import { reportFigure } from './support/figures.js';

// A MariaDB of this spec's own (the private one is shared by everyone working on this machine).
const server = mariadbServer('mariadb-rel');
const DB_PORT = Number(process.env.RELIABILITY_DB_PORT ?? 3317);
const HANDLERS = 4;
const SEED = Number(process.env.RELIABILITY_SEED ?? Date.now() % 1_000_000);

describe(`MariaDB stopped and started under a running API (seed ${SEED})`, () => {
  let settings: ApiSettings;
  let api: ApiProcess | undefined;
  let startedHere = false;
  const followers: LineupFollower[] = [];
  const bursts: CommandBurst[] = [];

  beforeAll(async () => {
    if (!isMariaDBRunning(server)) {
      await startMariaDB(server, DB_PORT);
      startedHere = true;
    }
    grantAppUser(server, { ...testEnvironment(), DB_NAME: 'catline' });
    settings = await apiSettings('dbrestart', { DB_PORT });
    api = await ApiProcess.start(settings);
  }, 120_000);

  afterAll(async () => {
    await Promise.all(bursts.map((burst) => burst.stop()));
    for (const follower of followers) follower.close();
    await api?.stop();
    if (!isMariaDBRunning(server)) await startMariaDB(server, DB_PORT);
    if (startedHere) stopMariaDB(server);
  });

  async function healthUntil(status: number, timeoutMs: number): Promise<{ status: number; body: unknown }> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const health = await api!.health();
      if (health.status === status || Date.now() > deadline) return health;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  }

  it('reports the database down then up, answers 503 meanwhile, applies nothing by half and keeps running', async () => {
    const deck = new LineupDriver(settings.url);
    const { cycleId, first, setUpVersions } = await createBusyCycle(deck);
    const tokens = await handlerTokens(deck, HANDLERS);
    const observer = await deck.token(OBSERVER);
    for (const token of tokens)
      followers.push(new LineupFollower({ url: settings.url, origin: settings.origin, token, cycleId }));
    await Promise.all(followers.map((follower) => follower.ready()));

    const burst = new CommandBurst(settings.url, tokens, followers, SEED);
    bursts.push(burst);
    await burst.acceptedAtLeast(30);
    const stoppingAt = Date.now();
    stopMariaDB(server);
    const down = await healthUntil(503, 15_000);
    const downAt = Date.now();
    expect(down).toEqual({ status: 503, body: { status: 'error', database: 'down' } });
    // Commands keep coming for a while with the database away.
    await new Promise((resolve) => setTimeout(resolve, 1_500));
    const restartingAt = Date.now();
    await startMariaDB(server, DB_PORT);
    const up = await healthUntil(200, 30_000);
    const upAt = Date.now();
    expect(up).toEqual({ status: 200, body: { status: 'ok', database: 'up' } });
    const acceptedBefore = burst.outcomes.filter(accepted).length;
    await burst.acceptedAtLeast(acceptedBefore + 30);
    const outcomes = await burst.stop();

    const duringOutage = outcomes.filter((outcome) => outcome.sentAt >= downAt && outcome.answeredAt <= restartingAt);
    reportFigure('MariaDB restart', {
      commands: outcomes.length,
      accepted: outcomes.filter(accepted).length,
      refused503: outcomes.filter((outcome) => outcome.status === 503).length,
      sentWhileDown: duringOutage.length,
      healthDownAfterMs: downAt - stoppingAt,
      healthUpAfterMs: upAt - restartingAt,
    });

    expect(api!.running).toBe(true);
    expect(duringOutage.length).toBeGreaterThan(0);
    expect(
      duringOutage.filter((outcome) => outcome.status !== 503).map((o) => `${o.status} ${JSON.stringify(o.body)}`),
    ).toEqual([]);
    expect(duringOutage.map((outcome) => (outcome.body as { code?: string }).code)).toEqual(
      duringOutage.map(() => 'database_unavailable'),
    );
    expect(
      outcomes
        .filter((outcome) => ![200, 400, 409, 503].includes(outcome.status))
        .map((o) => `${o.status} ${JSON.stringify(o.body)}`),
    ).toEqual([]);

    const final = await deck.snapshot(cycleId);
    const log = await readChangeLog(settings.url, observer, cycleId);
    expect(logProblems(outcomes, log, setUpVersions, first, final)).toEqual([]);
    await allAt(followers, final.version, 30_000);
    for (const follower of followers) expect(follower.held).toEqual(final);
    await eventually(() => api!.running, 1_000, 'the API to still run');
  });
});
