// Times the projection and the suggested lineup at 40 and 80 aircraft on four catapults: on a fixed
// bench cycle and on the seeded random cycles of fixtures/suggestion-40.json (same seeds, any size).
// Run after `pnpm build`: `pnpm bench` (or with '{"json":true,"cycles":50}' for one JSON line).
// Timings depend on the machine, so each is also given as a ratio to a baseline measured in the same
// run (sorting 40 numbers), and each lineup's last launch as its distance above a lower bound that no
// lineup can beat.
import { readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { epochMs, projectLaunchTimes, seconds, suggestLineup } from '../dist/index.js';
import { seededRandom } from '../dist/schedule/seeded-random.js';
import { seededCycle } from '../dist/testing/seeded-cycles.js';

const options = { json: false, cycles: 50, ...(process.argv[2] ? JSON.parse(process.argv[2]) : {}) };
const RUNS = { 40: 15, 80: 5 };
const BASELINE_BATCH = 10_000;
const fixture = JSON.parse(readFileSync(new URL('../fixtures/suggestion-40.json', import.meta.url), 'utf8'));

/** A fixed scatter of whole numbers in [0, span): the same cycle on every run, no generator needed. */
const scatter = (index, span) => (index * 7919 + 104729) % span;

function benchCycle(size) {
  const start = epochMs(Date.UTC(2026, 5, 1, 9, 0, 0));
  const catapults = [1, 2, 3, 4].map((number) => ({
    id: `cat${number}`,
    number,
    position: number <= 2 ? 'bow' : 'waist',
    pairId: number <= 2 ? 'bow' : 'waist',
    resetInterval: seconds(60 + scatter(number, 46)),
    up: true,
  }));
  const aircraft = Array.from({ length: size }, (_, index) => ({
    id: `ac${index + 1}`,
    priority: index < 3 ? 'first' : index >= size - 4 ? 'last' : 'normal',
  }));
  const taxiTimes = Object.fromEntries(
    aircraft.map((entry, index) => [
      entry.id,
      Object.fromEntries(
        catapults.map((catapult) => [catapult.id, seconds(30 + scatter(index * 4 + catapult.number, 571))]),
      ),
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

/**
 * A last launch no lineup can beat (common practice, no source): every aircraft must reach its
 * nearest open catapult, and the open catapults together launch at most one aircraft per reset
 * interval each from the earliest time on. Priority holds and the pair gap only push it later.
 */
function lowerBound(input) {
  const earliest = Math.max(input.cycleStart, input.window.start);
  const open = input.catapults.filter(
    (catapult) => catapult.up && !(input.landingAreaInUse && catapult.position === 'waist'),
  );
  const nearest = input.aircraft
    .map((aircraft) => Math.min(...open.map((catapult) => input.taxiTimes[aircraft.id]?.[catapult.id] ?? Infinity)))
    .filter(Number.isFinite);
  if (nearest.length === 0) return earliest;
  const arrival = earliest + Math.max(0, ...nearest.map((taxi) => taxi * 1000 + input.cycleStart - earliest));
  const launchesBy = (time) =>
    open.reduce((sum, catapult) => sum + Math.floor((time - earliest) / (catapult.resetInterval * 1000)) + 1, 0);
  let capacity = earliest;
  for (let step = 2 ** 30; step >= 1; step /= 2) if (launchesBy(capacity + step - 1) < nearest.length) capacity += step;
  return Math.max(arrival, capacity);
}

/** Aircraft parked three to a row in the order listed: the second and third wait for those in front. */
const rowsOfThree = (ids) =>
  Object.fromEntries(
    ids.flatMap((id, index) => (index % 3 === 0 ? [] : [[id, ids.slice(index - (index % 3), index).reverse()]])),
  );

const median = (values) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

function timed(task) {
  const started = performance.now();
  const result = task();
  return { ms: performance.now() - started, result };
}

function timeRuns(task, runs) {
  task();
  return median(Array.from({ length: runs }, () => timed(task).ms));
}

const aboveBound = (input, suggestion) => {
  const bound = lowerBound(input);
  const last = suggestion.projection.lastLaunch ?? input.cycleStart;
  return bound === input.cycleStart ? 0 : (last - bound) / (bound - input.cycleStart);
};

const numbers = Array.from({ length: 40 }, (_, index) => (index * 7919) % 40);
const baseline =
  timeRuns(() => {
    for (let i = 0; i < BASELINE_BATCH; i += 1) [...numbers].sort((a, b) => a - b);
  }, 15) / BASELINE_BATCH;

const forty = benchCycle(40);
const fortySuggestion = suggestLineup(forty);
const projection = timeRuns(
  () =>
    projectLaunchTimes({
      ...forty,
      lanes: fortySuggestion.lanes,
      notBefore: fortySuggestion.notBefore,
      priorities: fortySuggestion.priorities,
    }),
  15,
);

const round = (value, places = 1) => Math.round(value * 10 ** places) / 10 ** places;
const rows = [
  { case: 'baseline: sort 40 numbers', medianMs: round(baseline, 4) },
  {
    case: 'projection, bench cycle, 40 aircraft',
    medianMs: round(projection, 3),
    ratioToBaseline: Math.round(projection / baseline),
  },
];
const seeds = fixture.cycles.slice(0, options.cycles).map((cycle) => cycle.seed);
const draw = seededRandom(1);
for (const size of [40, 80]) {
  const input = benchCycle(size);
  const suggestion = suggestLineup(input);
  const ms = timeRuns(() => suggestLineup(input), RUNS[size]);
  rows.push({
    case: `suggestion, bench cycle, ${size} aircraft`,
    medianMs: round(ms),
    maxMs: null,
    ratioToBaseline: Math.round(ms / baseline),
    lastLaunchMin: round((suggestion.projection.lastLaunch - input.cycleStart) / 60_000),
    aboveLowerBoundPct: round(aboveBound(input, suggestion) * 100),
  });
  // The same cycle parked in rows of three: each aircraft waits for the ones in front of it to taxi out.
  const rowed = { ...input, clearBefore: rowsOfThree(input.aircraft.map((aircraft) => aircraft.id)) };
  const rowedSuggestion = suggestLineup(rowed);
  const rowedMs = timeRuns(() => suggestLineup(rowed), RUNS[size]);
  rows.push({
    case: `suggestion, bench cycle in rows of three, ${size} aircraft`,
    medianMs: round(rowedMs),
    maxMs: null,
    ratioToBaseline: Math.round(rowedMs / baseline),
    lastLaunchMin: round((rowedSuggestion.projection.lastLaunch - input.cycleStart) / 60_000),
    aboveLowerBoundPct: round(aboveBound(rowed, rowedSuggestion) * 100),
  });
  // The seeded cycles in a shuffled order, each timed once, so no cycle is favoured by a warm cache.
  const runs = seeds
    .map((seed) => ({ seed, key: draw() }))
    .sort((a, b) => a.key - b.key)
    .map(({ seed }) => {
      const cycle = seededCycle(seed, size);
      const { ms: runMs, result } = timed(() => suggestLineup(cycle));
      return { ms: runMs, above: aboveBound(cycle, result) };
    });
  rows.push({
    case: `suggestion, ${runs.length} seeded cycles, ${size} aircraft`,
    medianMs: round(median(runs.map((run) => run.ms))),
    maxMs: round(Math.max(...runs.map((run) => run.ms))),
    ratioToBaseline: Math.round(median(runs.map((run) => run.ms)) / baseline),
    aboveLowerBoundPct: `median ${round(median(runs.map((run) => run.above)) * 100)}, worst ${round(Math.max(...runs.map((run) => run.above)) * 100)}`,
  });
}

if (options.json) {
  // The form `npm run bench` at the repository root collects.
  console.log(JSON.stringify({ runs: RUNS, rows }));
} else {
  console.log(
    `Projection and suggested lineup, four catapults (timings: median; ${options.cycles} seeded cycles each timed once)`,
  );
  console.table(rows);
}
