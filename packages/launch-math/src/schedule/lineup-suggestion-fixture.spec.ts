import { readFileSync } from 'node:fs';
import { seededCycle } from '../testing/seeded-cycles.js';
import { suggestLineup } from './lineup-suggestion.js';

interface FixtureCycle {
  readonly seed: number;
  readonly lastLaunchAfterStartMs: number | null;
  readonly windowMisses: number;
}

// Written by scripts/suggestion-fixture.mjs from the suggestion as it was before the search was made
// faster: a new search must do at least as well on every cycle, not only on average.
const fixture = JSON.parse(readFileSync(new URL('../../fixtures/suggestion-40.json', import.meta.url), 'utf8')) as {
  aircraft: number;
  cycles: FixtureCycle[];
};

describe('suggested lineup against the stored results of 50 seeded 40-aircraft cycles', () => {
  it('has all 50 cycles', () => {
    expect(fixture.cycles).toHaveLength(50);
  });

  it.each(fixture.cycles)(
    'finishes no later, then misses the window no more, on the cycle of seed $seed',
    (stored) => {
      const input = seededCycle(stored.seed, fixture.aircraft);
      const { projection } = suggestLineup(input);
      const lastLaunch = projection.lastLaunch === null ? null : projection.lastLaunch - input.cycleStart;
      expect(lastLaunch === null).toBe(stored.lastLaunchAfterStartMs === null);
      expect(lastLaunch ?? 0).toBeLessThanOrEqual(stored.lastLaunchAfterStartMs ?? 0);
      if (lastLaunch === stored.lastLaunchAfterStartMs)
        expect(projection.missingWindow.length).toBeLessThanOrEqual(stored.windowMisses);
    },
    30_000,
  );
});
