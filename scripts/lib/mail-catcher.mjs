import { spawn } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { connect } from 'node:net';
import path from 'node:path';
import { root, sleep, step } from './run.mjs';

const maildev = path.join(root, 'apps/api/node_modules/maildev/dist/bin/maildev.js');
const MAIL_INBOX_PORT = 1080;

function listening(port) {
  return new Promise((resolve) => {
    const socket = connect({ port, host: '127.0.0.1' });
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });
}

/**
 * The local mail catcher (maildev) the app's SMTP settings point at by default: SMTP on
 * 127.0.0.1:SMTP_PORT, caught mail on http://127.0.0.1:1080. Reused when something already listens
 * there; skipped when SMTP_HOST names another server. Returns the child it started (null if none)
 * and the address of the caught mail (null when mail goes to another server).
 */
export async function ensureMailCatcher(env) {
  const host = env.SMTP_HOST ?? '127.0.0.1';
  const port = Number(env.SMTP_PORT ?? 1025);
  if (host !== '127.0.0.1' && host !== 'localhost') return { child: null, inbox: null };
  const inbox = `http://127.0.0.1:${MAIL_INBOX_PORT}`;
  if (await listening(port)) {
    step(`Reusing the mail catcher on 127.0.0.1:${port}`);
    return { child: null, inbox };
  }
  step(`Starting the local mail catcher: SMTP on 127.0.0.1:${port}, caught mail at ${inbox}`);
  const folder = path.join(root, '.data/maildev');
  mkdirSync(folder, { recursive: true });
  const args = [
    '--smtp',
    port,
    '--ip',
    '127.0.0.1',
    '--web',
    MAIL_INBOX_PORT,
    '--web-ip',
    '127.0.0.1',
    '--mail-directory',
    folder,
    '--silent',
  ];
  const child = spawn(process.execPath, [maildev, ...args.map(String)], { cwd: root, stdio: 'ignore' });
  for (let waited = 0; !(await listening(port)); waited += 200) {
    if (child.exitCode !== null || waited > 15_000) {
      child.kill();
      console.warn(
        'The mail catcher did not start; the app keeps its mail in the outbox until an SMTP server answers.',
      );
      return { child: null, inbox: null };
    }
    await sleep(200);
  }
  return { child, inbox };
}
