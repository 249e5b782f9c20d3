import { describe, expect, it } from 'vitest';
import { excessTone, marginTone } from './figure-tones.js';

describe('the excess wind over deck beside the recommended excess', () => {
  it('is no-go below zero, a caution short of the recommended excess, go at or above it', () => {
    expect(excessTone(-0.1, 12)).toBe('nogo');
    expect(excessTone(0, 12)).toBe('caution');
    expect(excessTone(11.9, 12)).toBe('caution');
    expect(excessTone(12, 12)).toBe('go');
    expect(excessTone(null, 12)).toBeUndefined();
  });
});

describe('the margin', () => {
  it('is go at or above zero whatever else holds the shot, a caution below it, no-go once the excess is too', () => {
    expect(marginTone(0, 12)).toBe('go');
    expect(marginTone(7.4, 19.4)).toBe('go');
    expect(marginTone(-0.5, 11.5)).toBe('caution');
    expect(marginTone(-12.5, -0.5)).toBe('nogo');
    expect(marginTone(null, null)).toBeUndefined();
  });
});
