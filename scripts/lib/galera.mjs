import { spawn } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { ensureDebianPackages } from './debian.mjs';
import { binary, isMariaDBRunning, queryValue, stopMariaDB } from './mariadb.mjs';
import { read, run, sleep, step } from './run.mjs';

const PROVIDER = '/usr/lib/galera/libgalera_smm.so';
const isRoot = process.getuid?.() === 0;
// Run as root, the rsync state transfer drops to `nobody` and a joiner cannot write its files: the nodes
// run as the `mysql` user of Debian's package instead, in folders it owns under the system temp folder.
const runAs = isRoot ? 'mysql' : null;

function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

function ownerIds() {
  if (!runAs) return null;
  return { uid: Number(read('id', ['-u', runAs])), gid: Number(read('id', ['-g', runAs])) };
}

function chownTree(dir, owner) {
  if (!owner) return;
  chownSync(dir, owner.uid, owner.gid);
  for (const name of readdirSync(dir)) {
    const file = path.join(dir, name);
    if (statSync(file).isDirectory()) chownTree(file, owner);
    else chownSync(file, owner.uid, owner.gid);
  }
}

/** The folder of a cluster by name, and its description (ports, folders) once started. */
export function galeraFolder(name) {
  return path.join(tmpdir(), `catline-galera-${name}`);
}

function describeNode(dir, index, ports) {
  const nodeDir = path.join(dir, `node${index + 1}`);
  return {
    name: `node${index + 1}`,
    dir: nodeDir,
    dataDir: path.join(nodeDir, 'data'),
    socket: path.join(nodeDir, 'mysqld.sock'),
    pidFile: path.join(nodeDir, 'mariadbd.pid'),
    logFile: path.join(nodeDir, 'mariadbd.err'),
    ...ports,
  };
}

function nodeArgs(cluster, node, { bootstrap }) {
  const peers = cluster.nodes.map((peer) => `127.0.0.1:${peer.groupPort}`).join(',');
  return [
    '--no-defaults',
    ...(runAs ? [`--user=${runAs}`] : []),
    `--datadir=${node.dataDir}`,
    `--socket=${node.socket}`,
    `--port=${node.port}`,
    `--pid-file=${node.pidFile}`,
    `--log-error=${node.logFile}`,
    '--bind-address=127.0.0.1',
    '--skip-name-resolve',
    '--character-set-server=utf8mb4',
    '--collation-server=utf8mb4_unicode_ci',
    '--innodb-buffer-pool-size=128M',
    // A small redo log: a joiner's full state transfer copies it.
    '--innodb-log-file-size=16M',
    '--innodb-flush-log-at-trx-commit=1',
    '--max-connections=400',
    '--binlog-format=ROW',
    // The audit trail's append-only triggers (see catline.cnf): a Galera node refuses them to a user without
    // SUPER otherwise.
    '--log-bin-trust-function-creators=ON',
    '--innodb-autoinc-lock-mode=2',
    '--wsrep-on=ON',
    `--wsrep-provider=${PROVIDER}`,
    `--wsrep-cluster-name=catline-${cluster.name}`,
    `--wsrep-cluster-address=gcomm://${bootstrap ? '' : peers}`,
    `--wsrep-node-name=${node.name}`,
    `--wsrep-node-address=127.0.0.1:${node.groupPort}`,
    `--wsrep-provider-options=gmcast.listen_addr=tcp://127.0.0.1:${node.groupPort};ist.recv_addr=127.0.0.1:${node.istPort}`,
    `--wsrep-sst-receive-address=127.0.0.1:${node.sstPort}`,
    '--wsrep-sst-method=rsync',
    // A read waits until the node has applied what the cluster committed before it (read-your-writes
    // across nodes: a join on one node sees a change committed through another).
    '--wsrep-sync-wait=1',
  ];
}

async function startNode(cluster, node, options) {
  const child = spawn(binary('mariadbd'), nodeArgs(cluster, node, options), { detached: true, stdio: 'ignore' });
  child.unref();
  for (
    let waited = 0;
    !(
      isMariaDBRunning(node) &&
      queryValue(
        node,
        "SELECT VARIABLE_VALUE FROM information_schema.GLOBAL_STATUS WHERE VARIABLE_NAME = 'wsrep_ready'",
      ) === 'ON'
    );
    waited += 250
  ) {
    if (waited > 120_000) throw new Error(`Galera ${node.name} did not join; see ${node.logFile}`);
    if (child.exitCode !== null)
      throw new Error(`Galera ${node.name} exited; see ${node.logFile}:\n${tail(node.logFile)}`);
    await sleep(250);
  }
}

function tail(file) {
  return existsSync(file) ? readFileSync(file, 'utf8').split('\n').slice(-15).join('\n') : '';
}

/**
 * A Galera cluster of `size` MariaDB nodes on loopback (Debian's mariadb-server and galera-4), each with
 * its own folder under the system temp folder and its own ports: the first node starts the cluster,
 * the others join it by state transfer. The description is written to cluster.json in its folder.
 */
export async function startGaleraCluster({ name = 'dev', size = 3 } = {}) {
  ensureDebianPackages(['mariadb-server', 'galera-4', 'rsync']);
  const dir = galeraFolder(name);
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  const nodes = [];
  for (let index = 0; index < size; index += 1) {
    const [port, groupPort, istPort, sstPort] = [
      await freePort(),
      await freePort(),
      await freePort(),
      await freePort(),
    ];
    nodes.push(describeNode(dir, index, { port, groupPort, istPort, sstPort }));
  }
  const cluster = { name, dir, nodes };
  const owner = ownerIds();
  for (const node of nodes) {
    mkdirSync(node.dataDir, { recursive: true });
    run(
      binary('mariadb-install-db'),
      [
        '--no-defaults',
        ...(runAs ? [`--user=${runAs}`] : []),
        `--datadir=${node.dataDir}`,
        '--auth-root-authentication-method=normal',
        '--skip-test-db',
      ],
      { stdio: ['ignore', 'ignore', 'inherit'] },
    );
  }
  chownTree(dir, owner);
  writeFileSync(path.join(dir, 'cluster.json'), `${JSON.stringify(cluster, null, 2)}\n`);
  for (const [index, node] of nodes.entries()) {
    step(`Starting Galera ${node.name} on 127.0.0.1:${node.port}${index === 0 ? ' (new cluster)' : ''}`);
    await startNode(cluster, node, { bootstrap: index === 0 });
  }
  return cluster;
}

/** Starts a stopped node again: it rejoins the running nodes (incremental or full state transfer). */
export async function restartGaleraNode(cluster, node) {
  await startNode(cluster, node, { bootstrap: false });
}

export function stopGaleraNode(node) {
  if (isMariaDBRunning(node)) stopMariaDB(node);
}

/** Stops every node (the last one last) and removes the cluster's folder. */
export function stopGaleraCluster(cluster) {
  for (const node of [...cluster.nodes].reverse()) stopGaleraNode(node);
  rmSync(cluster.dir, { recursive: true, force: true });
}

export function readGaleraCluster(name = 'dev') {
  const file = path.join(galeraFolder(name), 'cluster.json');
  return existsSync(file) ? JSON.parse(readFileSync(file, 'utf8')) : null;
}

/** A wsrep status value of a node (wsrep_cluster_size, wsrep_local_cert_failures, …). */
export function galeraStatus(node, variable) {
  return queryValue(
    node,
    `SELECT VARIABLE_VALUE FROM information_schema.GLOBAL_STATUS WHERE VARIABLE_NAME = '${variable}'`,
  );
}
