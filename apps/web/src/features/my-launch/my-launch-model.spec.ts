import { describe, expect, it } from 'vitest';
import type { SlotView } from '@catline/contracts';
import { onTheCatapult, weightAnswer } from './my-launch-model.js';

describe('weightAnswer', () => {
  it('reads whole pounds, with or without thousands separators', () => {
    expect(weightAnswer('45,500')).toEqual({ weight: 45_500 });
    expect(weightAnswer(' 44000 ')).toEqual({ weight: 44_000 });
  });

  it('refuses a figure that is not whole pounds or out of the limits', () => {
    expect(weightAnswer('45.5k')).toEqual({ problem: 'Type the gross weight in whole pounds.' });
    expect(weightAnswer('')).toEqual({ problem: 'Type the gross weight in whole pounds.' });
    expect(weightAnswer('250000')).toEqual({ problem: 'Between 1 and 200,000 lb.' });
  });
});

describe('onTheCatapult', () => {
  it('offers the pilot a suspend from taxiing to pilot ready, not before nor after', () => {
    const at = (status: SlotView['status']) => onTheCatapult({ status } as SlotView);
    expect([at('planned'), at('taxiing'), at('pilot_ready'), at('suspended'), at('launched')]).toEqual([
      false,
      true,
      true,
      false,
      false,
    ]);
  });
});
