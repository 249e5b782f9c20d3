// `npm run start:cluster`: as `npm start`, but two API processes (127.0.0.1:3001 and :3002) serve one
// board, sharing socket.io rooms through a private Redis (127.0.0.1:6380), behind a proxy on PORT
// (3000) that spreads connections over them. Ctrl-C stops everything it started.
import path from 'node:path';
import { startClusterProxy } from './lib/cluster-proxy.mjs';
import { printBanner } from './lib/demo.mjs';
import { ensureMailCatcher } from './lib/mail-catcher.mjs';
import { ensureRedisInstalled, startRedis, stopRedis } from './lib/redis.mjs';
import { root, run, runAsync, sleep, step } from './lib/run.mjs';
import { setUp } from './lib/setup.mjs';

const API_PORTS = [3001, 3002];
const REDIS_PORT = 6380;

const { pnpm, env } = await setUp();
step('Building the packages, the API and the web app');
run(pnpm, ['-r', 'build']);
step('Applying database migrations and the demo seed');
run(pnpm, ['--filter', '@catline/api', 'db:migrate']);
run(pnpm, ['--filter', '@catline/api', 'db:seed']);

const mail = await ensureMailCatcher({ ...process.env, ...env });
ensureRedisInstalled();
const redis = await startRedis({ port: REDIS_PORT, dir: path.join(root, '.data/redis') });

step(`Starting the API on ${API_PORTS.map((port) => `127.0.0.1:${port}`).join(' and ')}`);
const apis = API_PORTS.map((port) =>
  runAsync('node', ['apps/api/dist/main.js'], {
    env: { ...process.env, NODE_ENV: 'production', HOST: '127.0.0.1', PORT: String(port), REDIS_URL: redis.url },
  }),
);
const targets = API_PORTS.map((port) => `http://127.0.0.1:${port}`);
const proxy = startClusterProxy({ port: Number(env.PORT), targets });
await proxy.listening;

let stopped = false;
async function answering(target) {
  while (
    !(await fetch(`${target}/api/health`).then(
      (response) => response.ok,
      () => false,
    ))
  ) {
    if (stopped) throw new Error(`The API at ${target} stopped before it answered`);
    await sleep(250);
  }
}

function stopAll() {
  proxy.close();
  for (const api of apis) api.child.kill('SIGTERM');
  mail.child?.kill('SIGTERM');
}
// Ctrl-C reaches the API processes too (same process group); wait for their clean shutdown.
process.on('SIGINT', () => proxy.close());
process.on('SIGTERM', stopAll);
void Promise.all(targets.map(answering)).then(
  async () => {
    await printBanner(env.PORT);
    console.log(
      `Two API processes (${API_PORTS.join(', ')}) behind the proxy on ${env.PORT}; Redis on 127.0.0.1:${REDIS_PORT}.`,
    );
    if (mail.inbox) console.log(`Mail the app sends is caught at ${mail.inbox}`);
    console.log('');
  },
  (error) => console.error(error.message),
);

const codes = await Promise.all(apis.map((api) => api.exited));
stopped = true;
proxy.close();
mail.child?.kill('SIGTERM');
if (redis.started) stopRedis(REDIS_PORT);
process.exitCode = Math.max(...codes);
