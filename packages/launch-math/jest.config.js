import { swcEsmPreset } from '../../scripts/jest/swc-esm.js';

// Every run draws a fresh seed for the property tests and prints it; FC_SEED=<seed> repeats a run.
process.env.FC_SEED ??= String(Math.floor(Math.random() * 2 ** 31));
console.log(
  `launch-math property tests: fast-check seed ${process.env.FC_SEED} (repeat with FC_SEED=${process.env.FC_SEED})`,
);

export default {
  ...swcEsmPreset,
  roots: ['<rootDir>/src'],
  setupFilesAfterEnv: ['<rootDir>/src/testing/fast-check-seed.ts'],
};
