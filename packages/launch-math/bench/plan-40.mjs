// Times the projection and the suggested lineup on a fixed 40-aircraft cycle from four catapults.
// Run after `pnpm build`: `pnpm bench` (or with '{"json":true}' for one JSON line). Timings depend on the machine, so each figure is also given
// as a ratio to a baseline measured in the same run: sorting 40 numbers.
import { performance } from 'node:perf_hooks';
import { epochMs, projectLaunchTimes, seconds, suggestLineup } from '../dist/index.js';

const RUNS = 15;
const BASELINE_BATCH = 10_000;

/** A fixed scatter of whole numbers in [0, span): the same cycle on every run, no generator needed. */
const scatter = (index, span) => (index * 7919 + 104729) % span;

function cycle() {
  const start = epochMs(Date.UTC(2026, 5, 1, 9, 0, 0));
  const catapults = [1, 2, 3, 4].map((number) => ({
    id: `cat${number}`,
    number,
    position: number <= 2 ? 'bow' : 'waist',
    pairId: number <= 2 ? 'bow' : 'waist',
    resetInterval: seconds(60 + scatter(number, 46)),
    up: true,
  }));
  const aircraft = Array.from({ length: 40 }, (_, index) => ({
    id: `ac${index + 1}`,
    priority: index < 3 ? 'first' : index >= 36 ? 'last' : 'normal',
  }));
  const taxiTimes = Object.fromEntries(
    aircraft.map((entry, index) => [
      entry.id,
      Object.fromEntries(catapults.map((catapult) => [catapult.id, seconds(30 + scatter(index * 4 + catapult.number, 571))])),
    ]),
  );
  return {
    cycleStart: start,
    window: { start, end: epochMs(start + 45 * 60_000) },
    catapults,
    landingAreaInUse: false,
    pairMinimumGap: seconds(15),
    aircraft,
    taxiTimes,
  };
}

function median(values) {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function timeRuns(task, runs = RUNS) {
  task();
  return median(Array.from({ length: runs }, () => {
    const started = performance.now();
    task();
    return performance.now() - started;
  }));
}

const input = cycle();
const suggestion = suggestLineup(input);
const lineup = { ...input, lanes: suggestion.lanes, notBefore: suggestion.notBefore, priorities: suggestion.priorities };
const numbers = Array.from({ length: 40 }, (_, index) => (index * 7919) % 40);

const baseline = timeRuns(() => {
  for (let i = 0; i < BASELINE_BATCH; i += 1) [...numbers].sort((a, b) => a - b);
}) / BASELINE_BATCH;
const projection = timeRuns(() => projectLaunchTimes(lineup));
const suggest = timeRuns(() => suggestLineup(input));

const minutes = (suggestion.projection.lastLaunch - input.cycleStart) / 60_000;
if (process.argv[2] && JSON.parse(process.argv[2]).json) {
  // The form `npm run bench` at the repository root collects.
  const round = (ms) => Math.round(ms * 1000) / 1000;
  console.log(JSON.stringify({
    runs: RUNS,
    baselineMs: round(baseline),
    projectionMs: round(projection),
    suggestionMs: round(suggest),
    projectionPlusSuggestionMs: round(projection + suggest),
    ratioToBaseline: Math.round((projection + suggest) / baseline),
    lastLaunchMinutes: Math.round(minutes * 10) / 10,
  }));
  process.exit(0);
}
const format = (ms) => `${ms.toFixed(3)} ms`;
console.log(`40 aircraft, 4 catapults; suggested lineup's last launch ${minutes.toFixed(1)} min after the start`);
console.log(`median of ${RUNS} runs`);
console.log(`  baseline (sort 40 numbers)  ${format(baseline)}`);
console.log(`  projection                  ${format(projection)}  (${Math.round(projection / baseline)}x baseline)`);
console.log(`  suggestion                  ${format(suggest)}  (${Math.round(suggest / baseline)}x baseline)`);
