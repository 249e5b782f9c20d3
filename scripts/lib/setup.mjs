import { ensureDebianPackages } from './debian.mjs';
import { ensureEnvFile } from './env-file.mjs';
import { ensurePrivateMariaDB } from './mariadb.mjs';
import { ensurePnpm, installWorkspace } from './pnpm.mjs';

/**
 * The set-up shared by `npm start`, `npm test` and `npm run dev`: pnpm, the workspace,
 * the .env file and the private MariaDB (unless DB_PRIVATE=off points at another server).
 */
export async function setUp({ browser = false } = {}) {
  const pnpm = ensurePnpm();
  installWorkspace(pnpm);
  if (browser) ensureDebianPackages(['chromium']);
  const env = ensureEnvFile();
  const startedDatabase = env.DB_PRIVATE === 'off' ? false : await ensurePrivateMariaDB(env);
  return { pnpm, env, startedDatabase };
}
