import type { LaunchCatapult, LaunchPriority } from '../schedule/launch-projection.js';
import type { SuggestionInput } from '../schedule/lineup-suggestion.js';
import { seededRandom } from '../schedule/seeded-random.js';
import { epochMs, seconds } from '../units/units.js';

// Built into dist (not a *.fixture.ts) because the fixture script and the bench regenerate the
// same cycles from their seeds with plain Node.

const CYCLE_START = epochMs(Date.UTC(2026, 5, 1, 9, 0, 0));

/**
 * A random cycle of `aircraftCount` aircraft on four catapults, the same for the same seed: reset
 * intervals 60-105 s, pair gap 0-30 s, now and then a catapult down or the waist closed by the
 * landing area, about one aircraft in ten launching first and one in ten a spare, taxi times
 * 30-600 s with one in twenty catapults out of an aircraft's reach, and a window of 10-30 minutes so
 * that some cycles miss it. Ranges are common practice, no source: they only need to be varied.
 */
export function seededCycle(seed: number, aircraftCount: number): SuggestionInput {
  const random = seededRandom(seed);
  const between = (low: number, high: number): number => low + Math.floor(random() * (high - low + 1));
  const landingAreaInUse = random() < 0.1;
  const catapults: LaunchCatapult[] = [1, 2, 3, 4].map((number) => ({
    id: `cat${number}`,
    number,
    position: number <= 2 ? 'bow' : 'waist',
    pairId: number <= 2 ? 'bow' : 'waist',
    resetInterval: seconds(between(60, 105)),
    up: random() >= 0.08,
  }));
  const pairMinimumGap = seconds(between(0, 30));
  const aircraft = Array.from({ length: aircraftCount }, (_, index) => {
    const draw = random();
    const priority: LaunchPriority = draw < 0.1 ? 'first' : draw < 0.2 ? 'last' : 'normal';
    return { id: `ac${index + 1}`, priority };
  });
  const taxiTimes = Object.fromEntries(
    aircraft.map((entry) => [
      entry.id,
      Object.fromEntries(
        catapults.flatMap((catapult) => (random() < 0.05 ? [] : [[catapult.id, seconds(between(30, 600))]])),
      ),
    ]),
  );
  const windowMinutes = between(10, 30);
  return {
    cycleStart: CYCLE_START,
    window: { start: CYCLE_START, end: epochMs(CYCLE_START + windowMinutes * 60_000) },
    catapults,
    landingAreaInUse,
    pairMinimumGap,
    aircraft,
    taxiTimes,
  };
}
