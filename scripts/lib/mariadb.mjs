import { spawn } from 'node:child_process';
import { existsSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import { ensureDebianPackages } from './debian.mjs';
import { read, root, run, sleep, step } from './run.mjs';

const dataRoot = path.join(root, '.data');
const dataDir = path.join(dataRoot, 'mariadb');
const socket = path.join(dataRoot, 'mysqld.sock');
const configFile = path.join(root, 'scripts/mariadb/catline.cnf');
const isRoot = process.getuid?.() === 0;

function binary(name) {
  const found = ['/usr/sbin', '/usr/bin'].map((dir) => path.join(dir, name)).find((file) => existsSync(file));
  if (!found) throw new Error(`${name} not found; is mariadb-server installed?`);
  return found;
}

const adminArgs = ['--no-defaults', `--socket=${socket}`, '-uroot'];

function isRunning() {
  return existsSync(socket) && read(binary('mariadb-admin'), [...adminArgs, 'ping']) !== null;
}

function sql(statements) {
  run(binary('mariadb'), [...adminArgs, '-e', statements]);
}

const quote = (value) => `'${String(value).replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;

/**
 * Starts the project's private MariaDB on loopback (installing and initialising it when needed)
 * and makes sure the application database and user exist. Returns true if this call started it.
 */
export async function ensurePrivateMariaDB(env) {
  ensureDebianPackages(['mariadb-server', 'mariadb-client']);
  let started = false;
  if (!isRunning()) {
    if (!existsSync(path.join(dataDir, 'mysql'))) {
      step(`Initialising a private MariaDB in ${path.relative(root, dataDir)}/`);
      mkdirSync(dataDir, { recursive: true });
      run(binary('mariadb-install-db'), [
        '--no-defaults',
        ...(isRoot ? ['--user=root'] : []),
        `--datadir=${dataDir}`,
        '--auth-root-authentication-method=normal',
        '--skip-test-db',
      ], { stdio: ['ignore', 'ignore', 'inherit'] });
    }
    step(`Starting MariaDB on 127.0.0.1:${env.DB_PORT}`);
    const server = spawn(binary('mariadbd'), [
      `--defaults-file=${configFile}`,
      ...(isRoot ? ['--user=root'] : []),
      `--datadir=${dataDir}`,
      `--socket=${socket}`,
      `--port=${env.DB_PORT}`,
      `--pid-file=${path.join(dataRoot, 'mariadb.pid')}`,
      `--log-error=${path.join(dataRoot, 'mariadb.err')}`,
    ], { detached: true, stdio: 'ignore' });
    server.unref();
    started = true;
    for (let waited = 0; !isRunning(); waited += 200) {
      if (waited > 30_000) throw new Error(`MariaDB did not start; see ${path.join(dataRoot, 'mariadb.err')}`);
      await sleep(200);
    }
  } else {
    step(`Reusing the private MariaDB already running on 127.0.0.1:${env.DB_PORT}`);
  }
  const user = quote(env.DB_USER);
  const password = quote(env.DB_PASSWORD);
  // The app user owns every database named catline*, so tests can create fresh ones of their own.
  sql([
    `CREATE DATABASE IF NOT EXISTS \`${env.DB_NAME}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
    ...['localhost', '127.0.0.1'].flatMap((host) => [
      `CREATE USER IF NOT EXISTS ${user}@'${host}' IDENTIFIED BY ${password}`,
      `ALTER USER ${user}@'${host}' IDENTIFIED BY ${password}`,
      `GRANT ALL PRIVILEGES ON \`catline%\`.* TO ${user}@'${host}'`,
    ]),
  ].join(';\n'));
  return started;
}

export function stopPrivateMariaDB() {
  if (!isRunning()) {
    console.log('The private MariaDB is not running.');
    return;
  }
  run(binary('mariadb-admin'), [...adminArgs, 'shutdown']);
  console.log('The private MariaDB has stopped.');
}
