import { RETRY_CAP_MS, retryDelayMs } from './retry-delay.js';

describe('retryDelayMs', () => {
  it('doubles the wait after each failure, from two seconds', () => {
    expect([1, 2, 3, 4, 5].map(retryDelayMs)).toEqual([2_000, 4_000, 8_000, 16_000, 32_000]);
  });

  it('never waits longer than fifteen minutes, however many failures', () => {
    expect(retryDelayMs(10)).toBe(RETRY_CAP_MS);
    expect(retryDelayMs(10_000)).toBe(15 * 60_000);
  });
});
