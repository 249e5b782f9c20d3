// Writes fixtures/suggestion-40.json: the suggested lineup's last launch and window misses on 50
// seeded random 40-aircraft cycles, so that a new suggestion can be held to at least the same
// quality on each (lineup-suggestion-fixture.spec.ts). Run after `pnpm build`:
// `node scripts/suggestion-fixture.mjs`. The seeds come from one master seed, so the file is the
// same every time for the same algorithm.
import { writeFileSync } from 'node:fs';
import { execFileSync } from 'node:child_process';
import { suggestLineup } from '../dist/index.js';
import { seededRandom } from '../dist/schedule/seeded-random.js';
import { seededCycle } from '../dist/testing/seeded-cycles.js';

const MASTER_SEED = 20261202;
const CYCLES = 50;
const AIRCRAFT = 40;

const draw = seededRandom(MASTER_SEED);
const seeds = Array.from({ length: CYCLES }, () => Math.floor(draw() * 2 ** 32));
const commit = execFileSync('git', ['rev-parse', '--short', 'HEAD'], { encoding: 'utf8' }).trim();

const cycles = seeds.map((seed) => {
  const input = seededCycle(seed, AIRCRAFT);
  const suggestion = suggestLineup(input);
  return {
    seed,
    lastLaunchAfterStartMs:
      suggestion.projection.lastLaunch === null ? null : suggestion.projection.lastLaunch - input.cycleStart,
    windowMisses: suggestion.projection.missingWindow.length,
    unplaced: suggestion.unplaced.length,
  };
});

const fixture = {
  about: `suggestLineup at ${commit} on seededCycle(seed, ${AIRCRAFT}) (src/testing/seeded-cycles.ts); written by scripts/suggestion-fixture.mjs`,
  masterSeed: MASTER_SEED,
  aircraft: AIRCRAFT,
  cycles,
};
writeFileSync(new URL('../fixtures/suggestion-40.json', import.meta.url), `${JSON.stringify(fixture, null, 2)}\n`);
console.log(`wrote ${cycles.length} cycles`);
