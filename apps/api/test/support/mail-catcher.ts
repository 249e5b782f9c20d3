import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

// maildev runs as its own process: its web UI loads ESM through require(), which Jest on Node 20 cannot.
const MAILDEV = fileURLToPath(new URL('../../node_modules/maildev/dist/bin/maildev.js', import.meta.url));

/** A mail as maildev's REST API lists it (the fields the specs read). */
export interface CaughtMail {
  subject: string;
  text: string;
  to: { address: string }[];
}

/** A free loopback port (closed again at once; the caller binds it next). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

/**
 * maildev on loopback, started and stopped by a spec: SMTP on `smtpPort`, its REST API on `webPort`.
 * Each start keeps its mail in a fresh folder, so a restart begins with an empty inbox.
 */
export class MailCatcher {
  private server: ChildProcess | undefined;
  private folder: string | undefined;

  private constructor(
    readonly smtpPort: number,
    private readonly webPort: number,
  ) {}

  static async onFreePorts(): Promise<MailCatcher> {
    return new MailCatcher(await freePort(), await freePort());
  }

  async start(): Promise<void> {
    this.folder = mkdtempSync(path.join(tmpdir(), 'catline-mail-'));
    const args = [
      '--smtp',
      this.smtpPort,
      '--ip',
      '127.0.0.1',
      '--web',
      this.webPort,
      '--web-ip',
      '127.0.0.1',
      '--mail-directory',
      this.folder,
      '--silent',
    ];
    this.server = spawn(process.execPath, [MAILDEV, ...args.map(String)], { stdio: 'ignore' });
    // A loaded 2-core machine has taken more than 15 s to start it.
    const deadline = Date.now() + 60_000;
    while (!(await this.answers())) {
      if (Date.now() > deadline || this.server.exitCode !== null)
        throw new Error(
          `maildev did not start on ${this.smtpPort}/${this.webPort} (${this.server.exitCode === null ? 'no answer in 60 s' : `exit code ${this.server.exitCode}`})`,
        );
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = undefined;
    if (server && server.exitCode === null) {
      const exited = new Promise((resolve) => server.once('exit', resolve));
      server.kill('SIGTERM');
      await exited;
    }
    if (this.folder) rmSync(this.folder, { recursive: true, force: true });
  }

  private async answers(): Promise<boolean> {
    try {
      return (await fetch(`http://127.0.0.1:${this.webPort}/api/email`)).ok;
    } catch {
      return false;
    }
  }

  async mails(): Promise<CaughtMail[]> {
    const response = await fetch(`http://127.0.0.1:${this.webPort}/api/email`);
    if (!response.ok) throw new Error(`maildev answered ${response.status}`);
    return (await response.json()) as CaughtMail[];
  }

  /** The mails to an address, once at least `count` have arrived (polling, up to `timeoutMs`). */
  async mailsTo(address: string, count = 1, timeoutMs = 15_000): Promise<CaughtMail[]> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const found = (await this.mails()).filter((mail) => mail.to.some((to) => to.address === address));
      if (found.length >= count || Date.now() > deadline) return found;
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
  }
}
