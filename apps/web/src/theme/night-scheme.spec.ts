import { describe, expect, it } from 'vitest';
import { NIGHT_BRIGHTNESS, nightColours, nightVariable } from './night-scheme.js';

const channels = (hex: string) => [1, 3, 5].map((at) => parseInt(hex.slice(at, at + 2), 16));

describe('the night scheme’s brightness', () => {
  const dimmest = nightColours(NIGHT_BRIGHTNESS.dimmest);
  const brightest = nightColours(NIGHT_BRIGHTNESS.brightest);

  it('keeps the backgrounds and moves the text between its two ends', () => {
    expect(dimmest[nightVariable('bg')]).toBe(brightest[nightVariable('bg')]);
    expect(dimmest[nightVariable('fg')]).toBe('#c57a39');
    expect(brightest[nightVariable('fg')]).toBe('#d7a476');
    expect(nightColours(3)[nightVariable('fg')]).toBe('#ce8f58'); // halfway, channel by channel: common practice, no source
  });

  // The axe test measures the two ends; a level in between holds as long as no channel goes back down.
  it('never darkens a colour from one level to the next', () => {
    for (let level = NIGHT_BRIGHTNESS.dimmest; level < NIGHT_BRIGHTNESS.brightest; level++) {
      const [lower, higher] = [nightColours(level), nightColours(level + 1)];
      for (const variable of Object.keys(lower))
        channels(lower[variable]).forEach((value, i) =>
          expect(channels(higher[variable])[i]).toBeGreaterThanOrEqual(value),
        );
    }
  });
});
