import type { LaunchFigures } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import { crossCheckWarning, excessTone, marginTone } from './launch-setting-model.js';

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

describe('the cross-check of the approved setting', () => {
  const figures = (extra: Partial<LaunchFigures>) =>
    ({ catapultSetting: 14, crossCheckSetting: 11, crossCheckFlagged: true, ...extra }) as LaunchFigures;

  it('warns with both settings when the energy model is further off than the tolerance', () => {
    expect(crossCheckWarning(figures({}))).toBe(
      'Catline’s energy model gives setting 11, further from the approved setting 14 than the ship allows. Check the launch data before the read-back.',
    );
  });

  it('warns when the energy model reaches no setting', () => {
    expect(crossCheckWarning(figures({ crossCheckSetting: null }))).toMatch(/reaches no setting for this shot/);
  });

  it('says nothing within the tolerance, or with no approved setting to check', () => {
    expect(crossCheckWarning(figures({ crossCheckFlagged: false }))).toBeNull();
    expect(crossCheckWarning(figures({ catapultSetting: null, crossCheckFlagged: null }))).toBeNull();
  });
});
