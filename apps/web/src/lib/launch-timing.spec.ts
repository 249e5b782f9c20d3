import { describe, expect, it } from 'vitest';
import { launchTimingSummary, planTimingText, windowTimingText } from './launch-timing.js';

describe('launch timing texts', () => {
  it('says how late an aircraft runs past the window, or on time', () => {
    expect(windowTimingText({ verdict: 'late', minutes: 3 })).toBe('3 min late');
    expect(windowTimingText({ verdict: 'on_time', minutes: 12 })).toBe('on time');
  });

  it('says how it runs against the plan', () => {
    expect(planTimingText({ verdict: 'late', minutes: 2 })).toBe('2 min behind plan');
    expect(planTimingText({ verdict: 'early', minutes: 1 })).toBe('1 min ahead of plan');
    expect(planTimingText({ verdict: 'on_time', minutes: 0 })).toBe('on plan');
  });

  it('sums both up with the minutes to spare', () => {
    expect(launchTimingSummary({ window: { verdict: 'on_time', minutes: 12 }, plan: null })).toBe(
      '12 min before the window ends',
    );
    expect(
      launchTimingSummary({ window: { verdict: 'late', minutes: 3 }, plan: { verdict: 'late', minutes: 5 } }),
    ).toBe('3 min after the window ends; 5 min behind plan');
  });
});
