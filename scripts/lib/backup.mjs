import { spawn } from 'node:child_process';
import {
  closeSync,
  existsSync,
  mkdirSync,
  openSync,
  readFileSync,
  readSync,
  renameSync,
  rmSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import path from 'node:path';
import { ensureDebianPackages } from './debian.mjs';
import { adminArgs, binary, isMariaDBRunning, queryValue, startMariaDB, stopMariaDB } from './mariadb.mjs';
import { root, run, step } from './run.mjs';

/** Where `npm run backup` puts its backups unless BACKUP_DIR says otherwise: one folder per backup. */
export const defaultBackupsDir = path.join(root, '.data/backups');
const MANIFEST = 'catline-backup.json';
// Written by mariadb-backup: the binary log file and position the copy is consistent with.
const BINLOG_INFO = 'xtrabackup_binlog_info';
// The basename of the binary log in scripts/mariadb/catline.cnf.
const BINLOG_INDEX = 'catline-bin.index';

// The largest packet MariaDB takes: replayed row events come as one statement per event group.
const MAX_PACKET = '1G';
const stamp = (date) => date.toISOString().replace(/[:.]/g, '-');

/**
 * When a binary log file was begun: the timestamp of its first event (bytes 4–7 after the magic number,
 * little-endian seconds). A restore starts a new log whose files reuse the names, so this tells the
 * log a backup was taken against from a later one of the same name.
 */
function binlogCreatedAt(file) {
  if (!existsSync(file)) return null;
  const fd = openSync(file, 'r');
  try {
    const header = Buffer.alloc(8);
    readSync(fd, header, 0, 8, 0);
    return header.readUInt32LE(4);
  } finally {
    closeSync(fd);
  }
}

/** Runs mariadb-backup with its chatter (it writes its progress to stderr) kept in `logFile`. */
function mariadbBackup(args, logFile) {
  const log = openSync(logFile, 'a');
  try {
    run(binary('mariadb-backup'), ['--no-defaults', ...args], { stdio: ['ignore', log, log] });
  } catch (error) {
    throw new Error(`${error.message}; see ${logFile}`, { cause: error });
  } finally {
    closeSync(log);
  }
}

/**
 * A consistent physical copy of the running `server` (mariadb-backup, then prepared so that it can be
 * copied back as it is) in a new folder under `into`: `data/`, the binary log position it matches in
 * catline-backup.json, and mariadb-backup's own log.
 */
export function takeBackup(server, { into = defaultBackupsDir } = {}) {
  ensureDebianPackages(['mariadb-backup']);
  if (!isMariaDBRunning(server)) throw new Error('The server is not running; start it first (npm run db:start).');
  if (queryValue(server, 'SELECT @@log_bin') !== '1') {
    throw new Error(
      'Binary logging is off, so a restore could not roll the backup forward. Restart the server to pick up ' +
        'scripts/mariadb/catline.cnf: npm run db:stop && npm run db:start',
    );
  }
  const startedAt = new Date();
  const dir = path.join(into, stamp(startedAt));
  const data = path.join(dir, 'data');
  mkdirSync(dir, { recursive: true });
  const logFile = path.join(dir, 'mariadb-backup.log');
  mariadbBackup(['--backup', `--target-dir=${data}`, ...adminArgs(server).slice(1)], logFile);
  const finishedAt = new Date();
  mariadbBackup(['--prepare', `--target-dir=${data}`], logFile);
  const [file, position] = readFileSync(path.join(data, BINLOG_INFO), 'utf8').trim().split(/\s+/);
  const binlogFile = path.join(queryValue(server, 'SELECT @@datadir'), file);
  const manifest = {
    startedAt: startedAt.toISOString(),
    // The copy is consistent as of a moment before this: a restore to an earlier time needs an older backup.
    finishedAt: finishedAt.toISOString(),
    binlog: { file, position: Number(position), createdAt: binlogCreatedAt(binlogFile) },
    tookMs: Date.now() - startedAt.getTime(),
  };
  writeFileSync(path.join(dir, MANIFEST), `${JSON.stringify(manifest, null, 2)}\n`);
  return { dir, ...manifest };
}

/** The backup folder a command-line argument names: a path, or a folder name under the default place. */
export function findBackup(name, backupsDir = defaultBackupsDir) {
  const dir = [path.resolve(name), path.join(backupsDir, name)].find((candidate) =>
    existsSync(path.join(candidate, MANIFEST)),
  );
  if (!dir) throw new Error(`No backup at ${name} (a folder holding ${MANIFEST}).`);
  return { dir, ...JSON.parse(readFileSync(path.join(dir, MANIFEST), 'utf8')) };
}

/** mariadb-binlog takes its --stop-datetime in the time zone of its environment: we hand it UTC. */
const utcDateTime = (date) => date.toISOString().slice(0, 19).replace('T', ' ');

/** Pipes mariadb-binlog's output into the server, as root over its socket. */
function replay(server, binlogArgs) {
  const reader = spawn(binary('mariadb-binlog'), ['--no-defaults', ...binlogArgs], {
    cwd: root,
    env: { ...process.env, TZ: 'UTC' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const writer = spawn(
    binary('mariadb'),
    [...adminArgs(server), '--binary-mode', `--max-allowed-packet=${MAX_PACKET}`],
    { cwd: root, stdio: [reader.stdout, 'inherit', 'inherit'] },
  );
  const exit = (child, name) =>
    new Promise((resolve, reject) => {
      child.on('error', reject);
      child.on('exit', (code, signal) =>
        code === 0 ? resolve() : reject(new Error(`${name} exited with ${code ?? signal}`)),
      );
    });
  return Promise.all([exit(reader, 'mariadb-binlog'), exit(writer, 'mariadb')]);
}

/** The binary log files of a data folder from `first` on, in the order the server wrote them. */
function binlogFilesFrom(dataDir, first) {
  const index = path.join(dataDir, BINLOG_INDEX);
  if (!existsSync(index)) return [];
  const files = readFileSync(index, 'utf8')
    .split('\n')
    .filter(Boolean)
    .map((line) => path.join(dataDir, path.basename(line)));
  const from = files.findIndex((file) => path.basename(file) === first);
  return from < 0 ? [] : files.slice(from);
}

/** Replays `binlogs` from the backup's position up to `until` into the server, started for that alone. */
async function replayBinlog(server, port, backup, binlogs, until) {
  // No network while the log is replayed, so nothing but the replay writes; a row event of a large
  // transaction can be far bigger than the default packet.
  await startMariaDB(server, port, { extraArgs: ['--skip-networking', `--max-allowed-packet=${MAX_PACKET}`] });
  try {
    const stop = until ? [`--stop-datetime=${utcDateTime(until)}`] : [];
    step(
      `Replaying ${binlogs.length} binary log file(s) from ${backup.binlog.file}:${backup.binlog.position}${until ? ` up to ${until.toISOString()}` : ''}`,
    );
    await replay(server, [`--start-position=${backup.binlog.position}`, ...stop, ...binlogs]);
  } finally {
    stopMariaDB(server);
  }
}

/** Why the binary log files found cannot roll `backup` forward, or null when they can. */
function binlogMismatch(backup, files) {
  if (files.length === 0) return `no binary log from ${backup.binlog.file} on was found`;
  if (binlogCreatedAt(files[0]) !== backup.binlog.createdAt || statSync(files[0]).size < backup.binlog.position) {
    return `${backup.binlog.file} is not the binary log the backup was taken against (a restore since began a new one)`;
  }
  return null;
}

/**
 * Restores `backup` into the stopped `server`: its data folder is set aside (kept, never deleted), the
 * backup copied in, and the set-aside binary log replayed from the backup's position up to `until` (a
 * Date; the whole log when absent). The server is left stopped, as it was found.
 */
export async function restoreBackup(server, backup, { port, until } = {}) {
  ensureDebianPackages(['mariadb-backup']);
  if (isMariaDBRunning(server))
    throw new Error('Stop the server first (npm run db:stop): a restore replaces its data folder.');
  if (until && until < new Date(backup.finishedAt)) {
    throw new Error(`The backup finished at ${backup.finishedAt}, after ${until.toISOString()}; restore an older one.`);
  }
  const startedAt = Date.now();
  const mismatch = binlogMismatch(backup, binlogFilesFrom(server.dataDir, backup.binlog.file));
  if (mismatch && until)
    throw new Error(`Cannot restore up to ${until.toISOString()}: ${mismatch}. Nothing was changed.`);
  let setAside = null;
  if (existsSync(server.dataDir)) {
    setAside = `${server.dataDir}.replaced-${stamp(new Date())}`;
    step(`Setting the current data folder aside as ${path.relative(root, setAside)}/`);
    renameSync(server.dataDir, setAside);
  }
  try {
    step(`Copying ${path.relative(root, backup.dir)} in`);
    mkdirSync(server.dataDir, { recursive: true });
    mariadbBackup(
      ['--copy-back', `--target-dir=${path.join(backup.dir, 'data')}`, `--datadir=${server.dataDir}`],
      `${server.dataDir}.restore.log`,
    );
    if (mismatch) console.warn(`${mismatch}: the server holds the backup as it was taken.`);
    else await replayBinlog(server, port, backup, binlogFilesFrom(setAside, backup.binlog.file), until);
  } catch (error) {
    // All or nothing: the server gets its own data folder back, as it was before the restore.
    if (isMariaDBRunning(server)) stopMariaDB(server);
    rmSync(server.dataDir, { recursive: true, force: true });
    if (setAside) renameSync(setAside, server.dataDir);
    throw new Error(`The restore failed and the server's data folder is back as it was: ${error.message}`, {
      cause: error,
    });
  }
  return { setAside, replayed: !mismatch, tookMs: Date.now() - startedAt };
}
