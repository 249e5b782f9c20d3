import { swcEsmPreset } from '../../../scripts/jest/swc-esm.js';

// Integration tests run against a real MariaDB database created fresh for the run.
export default {
  ...swcEsmPreset,
  rootDir: '..',
  roots: ['<rootDir>/test'],
  testRegex: '\\.e2e-spec\\.ts$',
  globalSetup: '<rootDir>/test/global-setup.mjs',
  testTimeout: 60_000,
};
