import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  type GaleraCluster,
  type GaleraNode,
  galeraStatus,
  restartGaleraNode,
  startGaleraCluster,
  stopGaleraCluster,
  stopGaleraNode,
} from '../../../../scripts/lib/galera.mjs';
import { grantAppUser } from '../../../../scripts/lib/mariadb.mjs';
import { ensureRedisInstalled, startRedis, stopRedis } from '../../../../scripts/lib/redis.mjs';
import { logProblems } from '../reliability/support/answered-commands.js';
import { ApiProcess, type ApiSettings, apiSettings } from '../reliability/support/api-process.js';
import { reportFigure } from '../reliability/support/figures.js';
import { createBusyCycle, handlerTokens } from '../support/busy-cycle.js';
import { readChangeLog } from '../support/change-log.js';
import { CommandBurst } from '../support/command-burst.js';
import { LineupDriver, OBSERVER } from '../support/lineup-fixtures.js';
import { LineupFollower, allAt } from '../support/lineup-follower.js';
import { freePort } from '../support/mail-catcher.js';
import { type CommandOutcome, accepted } from '../support/random-lineup-commands.js';
import { testEnvironment } from '../support/own-database.js';

const NODES = 3;
// Three processes starting at once beside three database nodes on a shared 2-core machine.
const API_START_MS = 180_000;
const WRITERS = 16;
const SEED = Number(process.env.RELIABILITY_SEED ?? Date.now() % 1_000_000);
// The system temp folder is shared by every checkout on the machine: the cluster's folder is named after this one.
const CHECKOUT = createHash('sha256')
  .update(fileURLToPath(import.meta.url))
  .digest('hex')
  .slice(0, 8);
// Process i writes through node i; the node stopped during the run is the second.
const STOPPED = 1;

/** Status counters of every node whose sum tells how many transactions the cluster refused at commit. */
function refusedAtCommit(nodes: readonly GaleraNode[]): { certificationFailures: number; aborted: number } {
  const sum = (variable: string) => nodes.reduce((total, node) => total + Number(galeraStatus(node, variable) ?? 0), 0);
  return { certificationFailures: sum('wsrep_local_cert_failures'), aborted: sum('wsrep_local_bf_aborts') };
}

const codeOf = (outcome: CommandOutcome) => (outcome.body as { code?: string } | null)?.code;

async function healthUntil(api: ApiProcess, status: number, timeoutMs: number): Promise<number> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const { status: answered } = await api.health();
    if (answered === status || Date.now() > deadline) return answered;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

describe(`API processes on a three-node Galera cluster (seed ${SEED})`, () => {
  let cluster: GaleraCluster;
  let redisPort = 0;
  let redisDir = '';
  const settings: ApiSettings[] = [];
  const apis: ApiProcess[] = [];
  const followers: LineupFollower[] = [];
  const bursts: CommandBurst[] = [];

  beforeAll(async () => {
    ensureRedisInstalled();
    cluster = await startGaleraCluster({ name: `test-${CHECKOUT}`, size: NODES });
    grantAppUser(cluster.nodes[0], { ...testEnvironment(), DB_NAME: 'catline' });
    const base = await apiSettings('galera', { DB_PORT: cluster.nodes[0].port });
    redisDir = mkdtempSync(path.join(tmpdir(), 'catline-galera-redis-'));
    redisPort = await freePort();
    const redis = await startRedis({ port: redisPort, dir: redisDir });
    const ports = await Promise.all(cluster.nodes.map(() => freePort()));
    const urls = ports.map((port) => `http://127.0.0.1:${port}`);
    for (const [index, node] of cluster.nodes.entries()) {
      settings.push({
        url: urls[index],
        origin: urls[index],
        env: {
          ...base.env,
          PORT: String(ports[index]),
          DB_PORT: String(node.port),
          REDIS_URL: redis.url,
          WEB_ORIGINS: urls.join(','),
        },
      });
    }
    // Kept one by one, so that afterAll stops the ones that started when another did not.
    await Promise.all(
      settings.map(async (each, index) => {
        apis[index] = await ApiProcess.start(each, API_START_MS);
      }),
    );
  }, 480_000);

  afterAll(async () => {
    await Promise.all(bursts.map((burst) => burst.stop()));
    for (const follower of followers) follower.close();
    await Promise.all(apis.map((api) => api.stop()));
    if (redisPort) stopRedis(redisPort);
    if (redisDir) rmSync(redisDir, { recursive: true, force: true });
    if (cluster) stopGaleraCluster(cluster);
  });

  it('keeps one gapless log with 16 writers on three nodes, and goes on while a node is away', async () => {
    const deck = new LineupDriver(settings[0].url);
    const { cycleId, first, setUpVersions } = await createBusyCycle(deck);
    const tokens = await handlerTokens(deck, WRITERS);
    const observer = await deck.token(OBSERVER);
    // Writer w sends through process w mod 3, and follows the cycle on that process.
    const processOf = (writer: number) => writer % NODES;
    for (const [writer, token] of tokens.entries()) {
      const { url, origin } = settings[processOf(writer)];
      followers.push(new LineupFollower({ url, origin, token, cycleId, rejoinAfterRefusalMs: 300 }));
    }
    await Promise.all(followers.map((follower) => follower.ready()));
    const refusedBefore = refusedAtCommit(cluster.nodes);
    for (const [index, each] of settings.entries()) {
      const writers = tokens.map((_, writer) => writer).filter((writer) => processOf(writer) === index);
      bursts.push(
        new CommandBurst(
          each.url,
          writers.map((writer) => tokens[writer]),
          writers.map((writer) => followers[writer]),
          SEED + index * 1000,
        ),
      );
    }
    const acceptedBy = (index: number) => bursts[index].outcomes.filter(accepted).length;
    await Promise.all(bursts.map((burst) => burst.acceptedAtLeast(20, 60_000)));

    // The stopped node's counters start again from zero: count what it refused before it goes.
    const refusedByStopped = refusedAtCommit([cluster.nodes[STOPPED]]);
    const stoppingAt = Date.now();
    stopGaleraNode(cluster.nodes[STOPPED]);
    expect(await healthUntil(apis[STOPPED], 503, 20_000)).toBe(503);
    const downAt = Date.now();
    const others = settings.map((_, index) => index).filter((index) => index !== STOPPED);
    await Promise.all(others.map((index) => bursts[index].acceptedAtLeast(acceptedBy(index) + 20, 60_000)));
    const restartingAt = Date.now();
    await restartGaleraNode(cluster, cluster.nodes[STOPPED]);
    expect(await healthUntil(apis[STOPPED], 200, 60_000)).toBe(200);
    const upAt = Date.now();
    await bursts[STOPPED].acceptedAtLeast(acceptedBy(STOPPED) + 10, 60_000);
    const byProcess = await Promise.all(bursts.map((burst) => burst.stop()));
    const outcomes: CommandOutcome[] = byProcess.flat();

    const refusedAfter = refusedAtCommit(cluster.nodes);
    const refused = {
      certificationFailures:
        refusedAfter.certificationFailures -
        refusedBefore.certificationFailures +
        refusedByStopped.certificationFailures,
      aborted: refusedAfter.aborted - refusedBefore.aborted + refusedByStopped.aborted,
    };
    const whileDown = byProcess[STOPPED].filter(
      (outcome) => outcome.sentAt >= downAt && outcome.answeredAt <= restartingAt,
    );
    const busy = outcomes.filter((outcome) => codeOf(outcome) === 'database_busy').length;
    reportFigure('Galera, three nodes', {
      seed: SEED,
      commands: outcomes.length,
      accepted: outcomes.filter(accepted).length,
      refused409: outcomes.filter((outcome) => outcome.status === 409).length,
      refusedBusyAfterRetries: busy,
      refusedNodeDown: outcomes.filter((outcome) => codeOf(outcome) === 'database_unavailable').length,
      acceptedPerProcess: byProcess.map((each) => each.filter(accepted).length).join('/'),
      certificationFailures: refused.certificationFailures,
      abortedByReplication: refused.aborted,
      unhealthyAfterMs: downAt - stoppingAt,
      rejoinedAndHealthyAfterMs: upAt - restartingAt,
    });

    // Every refusal is a rule's (409, 400), the stopped node's (503 database_unavailable, from its process
    // only), or a command that lost the cycle's row to another node at every attempt (503 database_busy:
    // nothing was changed, try again).
    const unexpected = byProcess.flatMap((each, index) =>
      each.filter(
        (outcome) =>
          ![200, 400, 409].includes(outcome.status) &&
          !(outcome.status === 503 && codeOf(outcome) === 'database_busy') &&
          !(index === STOPPED && outcome.status === 503),
      ),
    );
    // The processes' own account of a 5xx, for the failure message.
    const logged =
      unexpected.length === 0
        ? []
        : apis.map(
            (api, index) =>
              `process ${index}: ${api
                .log()
                .split('\n')
                .filter((line) => /ERROR/.test(line))
                .slice(-5)
                .join('\n')}`,
          );
    expect([...unexpected.map((outcome) => `${outcome.status} ${JSON.stringify(outcome.body)}`), ...logged]).toEqual(
      [],
    );
    expect(whileDown.length).toBeGreaterThan(0);
    expect(whileDown.map((outcome) => outcome.status)).toEqual(whileDown.map(() => 503));

    const final = await deck.snapshot(cycleId);
    const log = await readChangeLog(settings[0].url, observer, cycleId);
    expect(logProblems(outcomes, log, setUpVersions, first, final)).toEqual([]);
    // A busy answer says nothing was changed: only requests cut off by the stopped node may have committed unanswered.
    const unanswered = outcomes.filter(
      (outcome) => outcome.status === 0 || codeOf(outcome) === 'database_unavailable',
    ).length;
    expect(log.length - setUpVersions - outcomes.filter(accepted).length).toBeLessThanOrEqual(unanswered);
    // Every node holds the same lineup: read through each process.
    for (const each of settings.slice(1)) expect(await new LineupDriver(each.url).snapshot(cycleId)).toEqual(final);
    await allAt(followers, final.version, 60_000);
    for (const follower of followers) expect(follower.held).toEqual(final);
    for (const api of apis) expect(api.running).toBe(true);
  });
});
