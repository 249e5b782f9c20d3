// `npm run bench`: the same set-up as `npm start` on a database of its own (catline_bench), the
// API on :3200, then the measurements of DEVELOPERS.md § Benchmarks. Client load runs in separate
// processes on 127.0.0.1. Prints a table and writes bench-results/bench-<time>.json (git-ignored).
// Options: --clients=100,500,1000,2000 --moves=200 --per-second=2 --commands=1000 --runs=5
// --only=fanout,commit,math,web,lighthouse,latency
// --cluster: two API processes (:3200 and :3203) sharing rooms through a Redis of their own (:6381),
// with the fan-out clients and the watching browser pages spread over both; commands still go to :3200.
import { spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { createBenchCycle } from '../apps/api/bench/lib/bench-cycle.mjs';
import { ensureRedisInstalled, startRedis, stopRedis } from './lib/redis.mjs';
import { root, run, runAsync, sleep, step } from './lib/run.mjs';
import { setUp } from './lib/setup.mjs';

const { values: args } = parseArgs({
  options: {
    clients: { type: 'string', default: '100,500,1000,2000' },
    moves: { type: 'string', default: '200' },
    'per-second': { type: 'string', default: '2' },
    commands: { type: 'string', default: '1000' },
    runs: { type: 'string', default: '5' },
    only: { type: 'string', default: 'fanout,commit,math,web,lighthouse,latency' },
    cluster: { type: 'boolean', default: false },
  },
});
const parts = new Set(args.only.split(','));
const port = 3200;
const url = `http://127.0.0.1:${port}`;
// The bare socket.io baseline takes port + 1, its deflating twin port + 2 (so a second API process
// in --cluster takes port + 3).
const ports = args.cluster ? [port, port + 3] : [port];
const urls = ports.map((p) => `http://127.0.0.1:${p}`);
const REDIS_PORT = 6381;

const { pnpm, env } = await setUp({ browser: ['web', 'lighthouse', 'latency'].some((part) => parts.has(part)) });
step('Building');
run(pnpm, ['-r', 'build']);
const benchEnv = {
  ...process.env,
  ...env,
  DB_NAME: `${env.DB_NAME}_bench`,
  PORT: String(port),
  WEB_ORIGINS: urls.join(','),
  NODE_ENV: 'production',
  LOGIN_RATE_LIMIT: '100000',
};
step(`Recreating ${benchEnv.DB_NAME}`);
run(pnpm, ['--filter', '@catline/api', 'db:reset'], { env: benchEnv });

if (args.cluster) ensureRedisInstalled();
const redis = args.cluster ? await startRedis({ port: REDIS_PORT, dir: path.join(root, '.data/redis-bench') }) : null;
const servers = ports.map((p) =>
  runAsync('node', ['apps/api/dist/main.js'], {
    env: { ...benchEnv, PORT: String(p), ...(redis ? { REDIS_URL: redis.url } : {}) },
    stdio: ['ignore', 'ignore', 'inherit'],
  }),
);
const results = {
  at: new Date().toISOString(),
  machine: { cpus: (await import('node:os')).cpus().length, node: process.version },
  apiProcesses: ports.length,
};
try {
  for (const each of urls) {
    for (
      let waited = 0;
      !(await fetch(`${each}/api/health`).then(
        (r) => r.ok,
        () => false,
      ));
      waited += 250
    ) {
      if (waited > 30_000) throw new Error(`the API at ${each} did not start`);
      await sleep(250);
    }
  }
  const cycleId = await createBenchCycle(url);
  const node = (script, options) => {
    const result = spawnSync('node', [script, JSON.stringify(options)], {
      cwd: root,
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'inherit'],
      maxBuffer: 1 << 26,
    });
    if (result.status !== 0) throw new Error(`${script} failed`);
    return JSON.parse(result.stdout.trim().split('\n').pop());
  };
  if (parts.has('fanout')) {
    step('Fan-out latency (this takes a while: paced moves run at the given rate)');
    results.fanOut = node('apps/api/bench/fan-out.mjs', {
      url,
      urls,
      origin: url,
      cycleId,
      barePort: port + 1,
      deflateClients: [1000],
      clients: args.clients.split(',').map(Number),
      moves: Number(args.moves),
      perSecond: Number(args['per-second']),
    });
  }
  if (parts.has('commit')) {
    step('Commit rate');
    results.commitRate = node('apps/api/bench/commit-rate.mjs', {
      url,
      cycleId,
      handlers: [1, 4, 16],
      commands: Number(args.commands),
      runs: Number(args.runs),
      db: {
        host: env.DB_HOST,
        port: Number(env.DB_PORT),
        user: env.DB_USER,
        password: env.DB_PASSWORD,
        database: benchEnv.DB_NAME,
      },
    });
  }
  if (parts.has('math')) {
    step('Computation');
    results.computation = node('packages/launch-math/bench/plan-40.mjs', { json: true });
    results.suggestionLoop = node('apps/api/bench/suggestion-loop.mjs', { json: true });
  }
  if (parts.has('web')) {
    step('Web');
    results.web = node('apps/web/bench/web.mjs', { url, cycleId });
  }
  if (parts.has('lighthouse')) {
    step('Lighthouse');
    results.lighthouse = node('apps/web/bench/lighthouse.mjs', { url, cycleId });
  }
  // Last: it moves 20 aircraft of the bench cycle's pool onto catapult 1.
  if (parts.has('latency')) {
    step('Live latency in the browser');
    results.liveLatency = node('apps/web/bench/live-latency.mjs', { urls, cycleId, pages: 20, moves: 20 });
  }
} catch (error) {
  // The parts measured before a failure are still written and printed; the run still fails.
  results.failed = error.message;
  process.exitCode = 1;
} finally {
  for (const server of servers) server.child.kill('SIGTERM');
  await Promise.all(servers.map((server) => server.exited));
  if (redis?.started) stopRedis(REDIS_PORT);
}

const dir = path.join(root, 'bench-results');
mkdirSync(dir, { recursive: true });
const file = path.join(dir, `bench-${results.at.replace(/[:.]/g, '-')}.json`);
writeFileSync(file, `${JSON.stringify(results, null, 2)}\n`);
printTables(results);
console.log(`\nWritten to ${path.relative(root, file)}`);
if (results.failed) console.error(`\nThe bench stopped early: ${results.failed}`);

function printTables({ fanOut, commitRate, computation, suggestionLoop, web, lighthouse, liveLatency, apiProcesses }) {
  if (fanOut) {
    const spread = apiProcesses > 1 ? `, clients spread over ${apiProcesses} API processes` : '';
    console.log(`\nFan-out latency, ms from sending the command to each client receiving the change${spread}`);
    console.table(
      fanOut.flatMap((row) =>
        ['paced', 'burst'].map((mode) => ({
          clients: row.clients,
          mode,
          p50: row.catline[mode].p50,
          p95: row.catline[mode].p95,
          p99: row.catline[mode].p99,
          max: row.catline[mode].max,
          'bare p50': row.bare[mode].p50,
          'bare p99': row.bare[mode].p99,
          'p50 ratio': row.ratio[`${mode}P50`],
          'p99 ratio': row.ratio[`${mode}P99`],
          'bare deflate p99': row.deflate?.[mode].p99 ?? '',
          'deflate p99 ratio': row.ratio[`deflate${mode === 'paced' ? 'Paced' : 'Burst'}P99`] ?? '',
          missing: row.catline[mode].missing,
          'out of order': row.catline[mode].outOfOrder,
          duplicates: row.catline[mode].duplicates,
          'payload B': row.payloadBytes,
        })),
      ),
    );
  }
  if (commitRate) {
    console.log('\nCommit rate: lineup moves through the API against single-row mysql2 transactions');
    console.table(commitRate);
  }
  if (computation) {
    console.log(
      '\nComputation: projection and suggested lineup on 4 catapults (packages/launch-math/bench/plan-40.mjs)',
    );
    console.table(computation.rows);
  }
  if (suggestionLoop) {
    console.log("\nThe API's event loop while a suggestion runs (apps/api/bench/suggestion-loop.mjs)");
    console.table(suggestionLoop.rows);
  }
  if (web) {
    const { lastLineupLoad, ...figures } = web;
    console.log('\nWeb');
    console.table([figures]);
    console.log(`The last Lineup load, ms from the navigation's start:\n  ${lastLineupLoad.join('\n  ')}`);
  }
  if (lighthouse) {
    console.log('\nLighthouse, mobile settings (apps/web/bench/lighthouse.mjs)');
    console.table(lighthouse);
  }
  if (liveLatency) {
    console.log("\nA handler's drop seen on other browser pages, ms (apps/web/bench/live-latency.mjs)");
    console.table([liveLatency]);
  }
}
