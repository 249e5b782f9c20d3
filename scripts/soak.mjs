// `npm run soak`: the same set-up as `npm test`, then the reliability suite with the long counts:
// 16 handlers sending 10,000 lineup commands at one cycle, 300 clients through an API kill -9, the
// SIGTERM and MariaDB-restart runs, and 150 bad inputs per write route. Runs on databases of its own
// (<DB_NAME>_soak_test*), so it can run beside everyone else's tests. Counts can be overridden with
// RELIABILITY_COMMANDS, RELIABILITY_CLIENTS, RELIABILITY_FUZZ_RUNS; RELIABILITY_SEED repeats a run.
import { performance } from 'node:perf_hooks';
import { run, step } from './lib/run.mjs';
import { setUp } from './lib/setup.mjs';

const { pnpm, env } = await setUp();
const soakEnv = {
  ...process.env,
  ...env,
  DB_NAME: `${env.DB_NAME}_soak`,
  RELIABILITY_COMMANDS: process.env.RELIABILITY_COMMANDS ?? '10000',
  RELIABILITY_CLIENTS: process.env.RELIABILITY_CLIENTS ?? '300',
  RELIABILITY_FUZZ_RUNS: process.env.RELIABILITY_FUZZ_RUNS ?? '150',
  NODE_OPTIONS: '--experimental-vm-modules',
};

const timings = [];
function timed(name, command, args) {
  step(name);
  const started = performance.now();
  try {
    run(command, args, { env: soakEnv });
  } finally {
    timings.push(`${name}: ${((performance.now() - started) / 1000).toFixed(0)} s`);
  }
}

timed('Build', pnpm, ['-r', 'build']);
const jest = (config, ...patterns) => [
  '--filter',
  '@catline/api',
  'exec',
  'jest',
  '--config',
  config,
  '--runInBand',
  ...patterns,
];
try {
  timed(
    'Concurrent writers and bad input',
    pnpm,
    jest('test/jest-integration.config.js', 'concurrent-writers', 'bad-input'),
  );
  timed('Crash, stop and database restart', pnpm, jest('test/reliability/jest-reliability.config.js'));
} finally {
  console.log(`\nSoak durations:\n  ${timings.join('\n  ')}`);
}
