import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, openSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { type ClusterProxy, startClusterProxy } from '../../../../scripts/lib/cluster-proxy.mjs';
import { ensureRedisInstalled, startRedis, stopRedis } from '../../../../scripts/lib/redis.mjs';
import { environmentFromProcess } from '../../src/database/data-source.js';
import { recreateDatabase } from '../../src/database/recreate-database.js';

/** The Origin header the cluster's clients send; the processes allow only it. */
export const CLUSTER_ORIGIN = 'http://127.0.0.1:3000';

const apiDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const STARTUP_MS = 90_000;

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

const exited = (child: ChildProcess) =>
  child.exitCode !== null || child.signalCode !== null
    ? Promise.resolve()
    : new Promise<void>((resolve) => child.once('exit', () => resolve()));

/**
 * Two (or more) built API processes (`dist/main.js`) on loopback ports of their own, sharing socket.io
 * rooms through a Redis of their own, on the database `<DB_NAME>_cluster` created fresh with
 * migrations and the demo seed. Their logs go to files in a temporary folder, shown when one fails to start.
 */
export class ApiCluster {
  private readonly proxies: ClusterProxy[] = [];

  private constructor(
    readonly urls: string[],
    private readonly children: ChildProcess[],
    private readonly redisPort: number,
    private readonly dir: string,
  ) {}

  static async start(processes = 2): Promise<ApiCluster> {
    // Without Redis there is nothing to test: the spec fails with the installer's reason, never skips.
    ensureRedisInstalled();
    const environment = environmentFromProcess();
    const database = `${environment.DB_NAME}_cluster`;
    await recreateDatabase({ ...environment, DB_NAME: database });
    const dir = mkdtempSync(path.join(tmpdir(), 'catline-cluster-'));
    const redisPort = await freePort();
    const redis = await startRedis({ port: redisPort, dir });
    const ports = await Promise.all(Array.from({ length: processes }, () => freePort()));
    const children = ports.map((port) => {
      const log = openSync(path.join(dir, `api-${port}.log`), 'a');
      return spawn(process.execPath, ['dist/main.js'], {
        cwd: apiDir,
        stdio: ['ignore', log, log],
        env: {
          ...process.env,
          NODE_ENV: 'production',
          HOST: '127.0.0.1',
          PORT: String(port),
          DB_NAME: database,
          REDIS_URL: redis.url,
          WEB_ORIGINS: CLUSTER_ORIGIN,
          LOGIN_RATE_LIMIT: '10000',
          MAIL_SENDER: 'off',
        },
      });
    });
    const cluster = new ApiCluster(
      ports.map((port) => `http://127.0.0.1:${port}`),
      children,
      redisPort,
      dir,
    );
    try {
      await Promise.all(cluster.urls.map((url, index) => cluster.healthy(url, children[index])));
    } catch (error) {
      await cluster.stop();
      throw error;
    }
    return cluster;
  }

  /** Ends one process at once, as a crash would (no shutdown hooks, sockets cut). */
  async crash(index: number): Promise<void> {
    const child = this.children[index];
    child.kill('SIGKILL');
    await exited(child);
  }

  /** The proxy `npm run start:cluster` puts in front of the processes, on a port of its own; its address. */
  async frontDoor(): Promise<string> {
    const port = await freePort();
    const proxy = startClusterProxy({ port, targets: this.urls });
    this.proxies.push(proxy);
    await proxy.listening;
    return `http://127.0.0.1:${port}`;
  }

  async stop(): Promise<void> {
    for (const proxy of this.proxies.splice(0)) proxy.close();
    await Promise.all(
      this.children.map(async (child) => {
        child.kill('SIGTERM');
        const forced = setTimeout(() => child.kill('SIGKILL'), 10_000);
        await exited(child);
        clearTimeout(forced);
      }),
    );
    stopRedis(this.redisPort);
    rmSync(this.dir, { recursive: true, force: true });
  }

  private async healthy(url: string, child: ChildProcess): Promise<void> {
    const deadline = Date.now() + STARTUP_MS;
    while (
      !(await fetch(`${url}/api/health`).then(
        (response) => response.ok,
        () => false,
      ))
    ) {
      if (child.exitCode !== null || Date.now() > deadline) {
        const log = readFileSync(path.join(this.dir, `api-${new URL(url).port}.log`), 'utf8');
        throw new Error(`The API process at ${url} did not start:\n${log.slice(-3000)}`);
      }
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
  }
}
