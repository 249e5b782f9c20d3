import type { LaunchFigures } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import { crossCheckWarning } from './launch-setting-model.js';

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
