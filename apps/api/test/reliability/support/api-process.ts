import { type ChildProcess, spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { freePort } from '../../support/mail-catcher.js';
import { recreateOwnDatabase } from '../../support/own-database.js';

const API_DIR = fileURLToPath(new URL('../../..', import.meta.url));
const MAIN = fileURLToPath(new URL('../../../dist/main.js', import.meta.url));

export interface ApiSettings {
  url: string;
  origin: string;
  env: NodeJS.ProcessEnv;
}

/**
 * Settings for API processes of one spec: a fresh database of its own (`<DB_NAME>_test_<name>`, migrated
 * and seeded), a free loopback port, and the database server `dbPort` (the shared private one by default).
 */
export async function apiSettings(name: string, overrides: { DB_PORT?: number } = {}): Promise<ApiSettings> {
  const database = await recreateOwnDatabase(name, overrides);
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  return {
    url,
    origin: url,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      HOST: '127.0.0.1',
      PORT: String(port),
      DB_HOST: database.DB_HOST,
      DB_PORT: String(database.DB_PORT),
      DB_NAME: database.DB_NAME,
      DB_USER: database.DB_USER,
      DB_PASSWORD: database.DB_PASSWORD,
      JWT_SECRET: database.JWT_SECRET,
      WEB_ORIGINS: url,
      LOGIN_RATE_LIMIT: '100000',
      MAIL_SENDER: 'off',
      NODE_OPTIONS: '',
    },
  };
}

/** One `node dist/main.js`, with its output kept for a failure message. */
export class ApiProcess {
  readonly output: string[] = [];
  readonly exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
  private readonly child: ChildProcess;

  private constructor(private readonly settings: ApiSettings) {
    this.child = spawn(process.execPath, [MAIN], {
      cwd: API_DIR,
      env: settings.env,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    const keep = (chunk: Buffer) => {
      this.output.push(chunk.toString());
      if (this.output.length > 400) this.output.splice(0, 100);
    };
    this.child.stdout!.on('data', keep);
    this.child.stderr!.on('data', keep);
    this.exited = new Promise((resolve) => this.child.once('exit', (code, signal) => resolve({ code, signal })));
  }

  /** Starts the API and resolves once its health route answers 200 (within `timeoutMs`). */
  static async start(settings: ApiSettings, timeoutMs = 60_000): Promise<ApiProcess> {
    const api = new ApiProcess(settings);
    const deadline = Date.now() + timeoutMs;
    while (!(await api.healthy())) {
      if (api.child.exitCode !== null || api.child.signalCode !== null)
        throw new Error(`The API exited while starting:\n${api.log()}`);
      if (Date.now() > deadline) {
        api.kill();
        throw new Error(`The API did not answer within ${timeoutMs} ms:\n${api.log()}`);
      }
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    return api;
  }

  get running(): boolean {
    return this.child.exitCode === null && this.child.signalCode === null;
  }

  async health(): Promise<{ status: number; body: unknown }> {
    try {
      const response = await fetch(`${this.settings.url}/api/health`, { signal: AbortSignal.timeout(5_000) });
      return { status: response.status, body: await response.json() };
    } catch (error) {
      return { status: 0, body: String(error) };
    }
  }

  async healthy(): Promise<boolean> {
    return (await this.health()).status === 200;
  }

  /** kill -9: no shutdown hook runs. */
  kill(): void {
    if (this.running) this.child.kill('SIGKILL');
  }

  terminate(): void {
    this.child.kill('SIGTERM');
  }

  /** How the process exited, or 'still running' after `timeoutMs`. */
  async exitWithin(
    timeoutMs: number,
  ): Promise<{ code: number | null; signal: NodeJS.Signals | null } | 'still running'> {
    let timer: NodeJS.Timeout | undefined;
    const late = new Promise<'still running'>(
      (resolve) => (timer = setTimeout(() => resolve('still running'), timeoutMs)),
    );
    try {
      return await Promise.race([this.exited, late]);
    } finally {
      clearTimeout(timer);
    }
  }

  /** Kills the process if it still runs and waits for it; for afterAll. */
  async stop(): Promise<void> {
    this.kill();
    await this.exited;
  }

  log(): string {
    return this.output.join('').slice(-6_000);
  }
}
