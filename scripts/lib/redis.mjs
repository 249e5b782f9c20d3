import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { ensureDebianPackages } from './debian.mjs';
import { read, run, sleep, step } from './run.mjs';

const ping = (port) => read('redis-cli', ['-p', String(port), 'ping']) === 'PONG';

/** Installs Debian's redis-server when it is missing; throws with the command to run where it cannot. */
export function ensureRedisInstalled() {
  ensureDebianPackages(['redis-server']);
}

/**
 * Starts a throwaway Redis on 127.0.0.1:`port` (no snapshots, no append-only file; pidfile, log and
 * working files in `dir`), or reuses the one already answering there. Returns its URL and whether
 * this call started it.
 */
export async function startRedis({ port, dir }) {
  const url = `redis://127.0.0.1:${port}`;
  if (ping(port)) {
    step(`Reusing Redis on 127.0.0.1:${port}`);
    return { url, started: false };
  }
  step(`Starting Redis on 127.0.0.1:${port}`);
  mkdirSync(dir, { recursive: true });
  run('redis-server', [
    '--port',
    String(port),
    '--bind',
    '127.0.0.1',
    '--daemonize',
    'yes',
    '--save',
    '',
    '--appendonly',
    'no',
    '--dir',
    dir,
    '--pidfile',
    path.join(dir, 'redis.pid'),
    '--logfile',
    path.join(dir, 'redis.log'),
  ]);
  for (let waited = 0; !ping(port); waited += 100) {
    if (waited > 10_000) throw new Error(`Redis did not start on port ${port}; see ${path.join(dir, 'redis.log')}`);
    await sleep(100);
  }
  return { url, started: true };
}

export function stopRedis(port) {
  read('redis-cli', ['-p', String(port), 'shutdown', 'nosave']);
}
