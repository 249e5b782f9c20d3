// `npm run restore -- <backup> [--until "<time>"]`: the private MariaDB as it was at <time> (or as late as
// its binary log goes), from a backup of `npm run backup`. The server must be stopped (npm run db:stop).
import path from 'node:path';
import { parseArgs } from 'node:util';
import { defaultBackupsDir, findBackup, restoreBackup } from './lib/backup.mjs';
import { ensureEnvFile } from './lib/env-file.mjs';
import { mariadbServer } from './lib/mariadb.mjs';
import { root } from './lib/run.mjs';

const usage = 'usage: npm run restore -- <backup folder or name> [--until "2026-12-02 06:30:00Z"]';
const { positionals, values } = parseArgs({ allowPositionals: true, options: { until: { type: 'string' } } });
if (positionals.length !== 1) {
  console.error(usage);
  process.exit(2);
}
const until = values.until === undefined ? undefined : new Date(values.until);
if (until && Number.isNaN(until.getTime())) {
  console.error(
    `Not a time: ${values.until} (an ISO time, e.g. 2026-12-02T06:30:00Z; without a zone it is local time).\n${usage}`,
  );
  process.exit(2);
}

const env = ensureEnvFile();
const backupsDir = process.env.BACKUP_DIR ? path.resolve(process.env.BACKUP_DIR) : defaultBackupsDir;
const backup = findBackup(positionals[0], backupsDir);
const result = await restoreBackup(mariadbServer(), backup, { port: env.DB_PORT, until });
console.log(
  `Restored ${path.relative(root, backup.dir)}${until ? ` up to ${until.toISOString()}` : ''} in ${(result.tookMs / 1000).toFixed(1)} s` +
    (result.replayed ? ' with its binary log replayed.' : ' as it was taken.') +
    (result.setAside
      ? `\nThe data folder it replaced is kept as ${path.relative(root, result.setAside)}/; delete it once you are satisfied.`
      : '') +
    '\nStart the server with npm run db:start (or npm start), then take a new backup: older backups do not know the new binary log.',
);
