// `npm run db:start` / `npm run db:stop`: the private MariaDB on its own.
import { ensureEnvFile } from './lib/env-file.mjs';
import { ensurePrivateMariaDB, stopPrivateMariaDB } from './lib/mariadb.mjs';

const command = process.argv[2];
if (command === 'start') await ensurePrivateMariaDB(ensureEnvFile());
else if (command === 'stop') stopPrivateMariaDB();
else {
  console.error('usage: node scripts/db.mjs start|stop');
  process.exitCode = 2;
}
