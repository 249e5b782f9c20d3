// How long a suggested lineup holds the API's event loop: the longest gap between a 1 ms timer's turns while
// suggestions for a 40- and an 80-aircraft seeded cycle run (a) on the calling thread, as before,
// and (b) through the API's SuggestionPool (a worker thread), beside the same timer left idle. Run after `pnpm -r build`:
// `node apps/api/bench/suggestion-loop.mjs` (or with '{"json":true}').
import { performance } from 'node:perf_hooks';
import { suggestLineup } from '@catline/launch-math';
import { seededCycle } from '../../../packages/launch-math/dist/testing/seeded-cycles.js';
import { SuggestionPool } from '../dist/lineup/suggestion-pool.js';

const options = { json: false, ...(process.argv[2] ? JSON.parse(process.argv[2]) : {}) };
const SEED = 3755296786; // the first cycle of packages/launch-math/fixtures/suggestion-40.json

/** The run's time and the longest gap between the turns of a 1 ms timer meanwhile, as requests and broadcasts would see it. */
async function measure(run) {
  let last = performance.now();
  let longest = 0;
  const ticker = setInterval(() => {
    const now = performance.now();
    longest = Math.max(longest, now - last);
    last = now;
  }, 1);
  await new Promise((resolve) => setTimeout(resolve, 20));
  const started = performance.now();
  await run();
  const elapsed = performance.now() - started;
  await new Promise((resolve) => setTimeout(resolve, 20));
  clearInterval(ticker);
  return { elapsedMs: Math.round(elapsed), longestLoopDelayMs: Math.round(longest) };
}

const pool = new SuggestionPool();
await pool.suggest(seededCycle(SEED, 10)); // start the worker thread before timing
const rows = [];
// Baseline of the same run: the same timer with nothing to do for a second (the machine's own jitter).
rows.push({
  case: 'baseline: idle for 1 s',
  ...(await measure(() => new Promise((resolve) => setTimeout(resolve, 1000)))),
});
for (const size of [40, 80]) {
  const input = seededCycle(SEED, size);
  rows.push({
    case: `${size} aircraft on the API's thread (before)`,
    ...(await measure(async () => suggestLineup(input))),
  });
  rows.push({
    case: `${size} aircraft through SuggestionPool (worker)`,
    ...(await measure(() => pool.suggest(input))),
  });
}
await pool.onModuleDestroy();

if (options.json) console.log(JSON.stringify({ rows }));
else console.table(rows);
