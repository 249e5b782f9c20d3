import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { ensureDebianPackages } from './debian.mjs';
import { read, root, run, sleep, step } from './run.mjs';

const dataRoot = path.join(root, '.data');
const configFile = path.join(root, 'scripts/mariadb/catline.cnf');
const isRoot = process.getuid?.() === 0;

/**
 * The files of one MariaDB server of the project's, all under .data/: the private one that `npm start`
 * and `npm test` share is `mariadbServer()`; the reliability tests stop and start one of their own.
 */
export function mariadbServer(name = 'mariadb') {
  const suffix = name === 'mariadb' ? '' : name.replace(/^mariadb/, '');
  return {
    dataDir: path.join(dataRoot, name),
    socket: path.join(dataRoot, `mysqld${suffix}.sock`),
    pidFile: path.join(dataRoot, `${name}.pid`),
    logFile: path.join(dataRoot, `${name}.err`),
  };
}

const privateServer = mariadbServer();

export function binary(name) {
  const found = ['/usr/sbin', '/usr/bin'].map((dir) => path.join(dir, name)).find((file) => existsSync(file));
  if (!found) throw new Error(`${name} not found; is mariadb-server installed?`);
  return found;
}

export const adminArgs = (server) => ['--no-defaults', `--socket=${server.socket}`, '-uroot'];

export function isMariaDBRunning(server = privateServer) {
  return existsSync(server.socket) && read(binary('mariadb-admin'), [...adminArgs(server), 'ping']) !== null;
}

/** Runs statements as root over the server's socket; throws when one fails. */
export function sql(server, statements) {
  run(binary('mariadb'), [...adminArgs(server), '-e', statements]);
}

/** What a query run as root prints (rows on lines, columns split by tabs), or null when it fails. */
export function queryValue(server, statement) {
  return read(binary('mariadb'), [...adminArgs(server), '--batch', '--skip-column-names', '-e', statement]);
}

const quote = (value) => `'${String(value).replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;

/**
 * Starts a server on 127.0.0.1:`port` (initialising its data folder when needed) and waits until it answers;
 * `extraArgs` are added to the server's command line.
 */
export async function startMariaDB(server, port, { extraArgs = [] } = {}) {
  if (!existsSync(path.join(server.dataDir, 'mysql'))) {
    step(`Initialising a private MariaDB in ${path.relative(root, server.dataDir)}/`);
    mkdirSync(server.dataDir, { recursive: true });
    run(
      binary('mariadb-install-db'),
      [
        '--no-defaults',
        ...(isRoot ? ['--user=root'] : []),
        `--datadir=${server.dataDir}`,
        '--auth-root-authentication-method=normal',
        '--skip-test-db',
      ],
      { stdio: ['ignore', 'ignore', 'inherit'] },
    );
  }
  step(`Starting MariaDB on 127.0.0.1:${port}`);
  const logStart = existsSync(server.logFile) ? statSync(server.logFile).size : 0;
  const child = spawn(
    binary('mariadbd'),
    [
      `--defaults-file=${configFile}`,
      ...(isRoot ? ['--user=root'] : []),
      `--datadir=${server.dataDir}`,
      `--socket=${server.socket}`,
      `--port=${port}`,
      `--pid-file=${server.pidFile}`,
      `--log-error=${server.logFile}`,
      ...extraArgs,
    ],
    { detached: true, stdio: 'ignore' },
  );
  child.unref();
  let exited = false;
  child.once('exit', () => (exited = true));
  for (let waited = 0; !isMariaDBRunning(server); waited += 200) {
    if (exited || waited > 30_000) throw new Error(notStarted(server, port, logStart));
    await sleep(200);
  }
}

/** Why the server did not start, from the errors its log got since `logStart`: most often another server holds the port. */
function notStarted(server, port, logStart) {
  const log = existsSync(server.logFile) ? readFileSync(server.logFile).subarray(logStart).toString('utf8') : '';
  const errors = log
    .split('\n')
    .filter((line) => line.includes('[ERROR]'))
    .slice(-3);
  const portTaken = errors.some((line) => line.includes('Address already in use'))
    ? `\nPort ${port} on 127.0.0.1 is taken (another checkout's MariaDB?): stop it, or set DB_PORT in .env to a free port.`
    : '';
  return `MariaDB did not start; see ${server.logFile}${errors.length ? `:\n  ${errors.join('\n  ')}` : ''}${portTaken}`;
}

/** Makes sure the application database and user exist on the server. */
export function grantAppUser(server, env) {
  const user = quote(env.DB_USER);
  const password = quote(env.DB_PASSWORD);
  // The app user owns every database named catline*, so tests can create fresh ones of their own.
  sql(
    server,
    [
      `CREATE DATABASE IF NOT EXISTS \`${env.DB_NAME}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
      ...['localhost', '127.0.0.1'].flatMap((host) => [
        `CREATE USER IF NOT EXISTS ${user}@'${host}' IDENTIFIED BY ${password}`,
        `ALTER USER ${user}@'${host}' IDENTIFIED BY ${password}`,
        `GRANT ALL PRIVILEGES ON \`catline%\`.* TO ${user}@'${host}'`,
      ]),
    ].join(';\n'),
  );
}

/** A clean shutdown; waits until the server has stopped. */
export function stopMariaDB(server) {
  run(binary('mariadb-admin'), [...adminArgs(server), 'shutdown']);
}

/**
 * Starts the project's private MariaDB on loopback (installing and initialising it when needed)
 * and makes sure the application database and user exist. Returns true if this call started it.
 */
export async function ensurePrivateMariaDB(env) {
  ensureDebianPackages(['mariadb-server', 'mariadb-client']);
  let started = false;
  if (!isMariaDBRunning()) {
    await startMariaDB(privateServer, env.DB_PORT);
    started = true;
  } else {
    step(`Reusing the private MariaDB already running on 127.0.0.1:${env.DB_PORT}`);
    // A server started before catline.cnf had this setting gets it too (the append-only audit migration needs it).
    sql(privateServer, 'SET GLOBAL log_bin_trust_function_creators = ON');
  }
  grantAppUser(privateServer, env);
  return started;
}

export function stopPrivateMariaDB() {
  if (!isMariaDBRunning()) {
    console.log('The private MariaDB is not running.');
    return;
  }
  stopMariaDB(privateServer);
  console.log('The private MariaDB has stopped.');
}
