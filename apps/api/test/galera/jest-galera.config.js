import { swcEsmPreset } from '../../../../scripts/jest/swc-esm.js';

// API processes on a Galera cluster of three MariaDB nodes on loopback, started by the spec itself
// (Debian's mariadb-server and galera-4), with a Redis of its own. The test:galera script builds first.
export default {
  ...swcEsmPreset,
  rootDir: '../..',
  roots: ['<rootDir>/test/galera'],
  testRegex: '\\.galera-spec\\.ts$',
  testTimeout: 300_000,
};
