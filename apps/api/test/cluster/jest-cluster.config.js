import { swcEsmPreset } from '../../../../scripts/jest/swc-esm.js';

// Several API processes and a Redis, started by the spec itself on a database of its own.
export default {
  ...swcEsmPreset,
  rootDir: '../..',
  roots: ['<rootDir>/test/cluster'],
  testRegex: '\\.spec\\.ts$',
  globalSetup: '<rootDir>/test/cluster/global-setup.mjs',
  testTimeout: 120_000,
};
