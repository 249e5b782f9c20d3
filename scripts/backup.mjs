// `npm run backup`: a consistent copy of the private MariaDB while it runs, with its binary log position.
import path from 'node:path';
import { defaultBackupsDir, takeBackup } from './lib/backup.mjs';
import { ensureEnvFile } from './lib/env-file.mjs';
import { mariadbServer } from './lib/mariadb.mjs';
import { root, step } from './lib/run.mjs';

const env = ensureEnvFile();
const into = process.env.BACKUP_DIR ? path.resolve(process.env.BACKUP_DIR) : defaultBackupsDir;
step(`Backing up the private MariaDB (127.0.0.1:${env.DB_PORT}) into ${path.relative(root, into) || '.'}/`);
const backup = takeBackup(mariadbServer(), { into });
console.log(
  `Backup ${path.relative(root, backup.dir)}: consistent with ${backup.binlog.file}:${backup.binlog.position}, ` +
    `took ${(backup.tookMs / 1000).toFixed(1)} s.\nRestore it with: npm run restore -- ${path.basename(backup.dir)} [--until "<time>"]`,
);
