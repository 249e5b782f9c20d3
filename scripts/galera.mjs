// `npm run galera:start` / `npm run galera:stop`: a three-node Galera cluster of MariaDB on loopback
// (Debian's mariadb-server and galera-4), in folders of its own under the system temp folder, with the
// application's user and database, for trying Catline's API processes on it (README § Running several
// processes). The shared private MariaDB is not touched.
import { ensureEnvFile } from './lib/env-file.mjs';
import { readGaleraCluster, startGaleraCluster, stopGaleraCluster } from './lib/galera.mjs';
import { grantAppUser } from './lib/mariadb.mjs';

const NAME = `dev-${ensureEnvFile().DB_PORT}`;
const command = process.argv[2];
if (command === 'start') {
  const env = ensureEnvFile();
  const running = readGaleraCluster(NAME);
  if (running) stopGaleraCluster(running);
  const cluster = await startGaleraCluster({ name: NAME, size: 3 });
  grantAppUser(cluster.nodes[0], env);
  console.log(`\nGalera cluster ${cluster.name} in ${cluster.dir}:`);
  for (const node of cluster.nodes) console.log(`  ${node.name}: 127.0.0.1:${node.port} (socket ${node.socket})`);
  console.log(
    `\nPoint each API process at a node, e.g.\n` +
      `  DB_PORT=${cluster.nodes[0].port} pnpm --filter @catline/api db:migrate && DB_PORT=${cluster.nodes[0].port} pnpm --filter @catline/api db:seed\n` +
      cluster.nodes
        .map(
          (node, i) =>
            `  DB_PORT=${node.port} PORT=${3101 + i} REDIS_URL=redis://127.0.0.1:6380 node apps/api/dist/main.js`,
        )
        .join('\n') +
      '\nStop it with npm run galera:stop.',
  );
} else if (command === 'stop') {
  const cluster = readGaleraCluster(NAME);
  if (cluster) stopGaleraCluster(cluster);
  console.log(cluster ? 'The Galera cluster has stopped and its folder is removed.' : 'No Galera cluster is running.');
} else {
  console.error('usage: node scripts/galera.mjs start|stop');
  process.exitCode = 2;
}
