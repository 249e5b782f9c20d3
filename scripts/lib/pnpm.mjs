import { existsSync } from 'node:fs';
import path from 'node:path';
import { read, root, run, step } from './run.mjs';

export const PNPM_VERSION = '12.4.2';
const localPnpm = path.join(root, '.tools/node_modules/.bin/pnpm');

/** Returns a pnpm of the pinned version: the one on PATH if it matches, else a project-local copy. */
export function ensurePnpm() {
  if (read('pnpm', ['--version']) === PNPM_VERSION) return 'pnpm';
  if (!existsSync(localPnpm) || read(localPnpm, ['--version']) !== PNPM_VERSION) {
    step(`Installing pnpm ${PNPM_VERSION} into .tools/`);
    run('npm', ['install', '--prefix', '.tools', '--no-save', '--no-audit', '--no-fund', `pnpm@${PNPM_VERSION}`]);
  }
  return localPnpm;
}

export function installWorkspace(pnpm) {
  step('Installing the workspace');
  run(pnpm, ['install', '--frozen-lockfile', '--prefer-offline'], {
    env: { ...process.env, PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD: '1', CI: process.env.CI ?? '' },
  });
}
