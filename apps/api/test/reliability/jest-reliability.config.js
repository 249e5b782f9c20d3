import { swcEsmPreset } from '../../../../scripts/jest/swc-esm.js';

// Process-level tests: each spec starts its own API processes (node dist/main.js) on its own database,
// and kills, stops or cuts them off from MariaDB. The test:reliability script builds first.
export default {
  ...swcEsmPreset,
  rootDir: '../..',
  roots: ['<rootDir>/test/reliability'],
  testRegex: '\\.reliability-spec\\.ts$',
  testTimeout: 180_000,
};
