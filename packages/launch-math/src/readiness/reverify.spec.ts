import { reverifyDropBack } from './reverify.js';

// The rule is the (figures changed after the weight was agreed or the aircraft tensioned go back
// to the step before the setting read-back); the step order follows the trade's launch sequence,
// NAVEDTRA 14310 (ABE 3 & 2), catapult launching procedures: deflectors raised, tension, full-power turn-up.
const steps = ['taxiing', 'on_catapult', 'weight_agreed', 'setting_set', 'deflector_up', 'tensioned', 'run_up'];

describe('reverifyDropBack', () => {
  it('takes a tensioned aircraft back to weight agreed when the wind changes', () => {
    expect(reverifyDropBack(steps, 'tensioned', 'wind')).toEqual({ to: 'weight_agreed', weightAgreementVoid: false });
    expect(reverifyDropBack(steps, 'run_up', 'launch_data')).toEqual({
      to: 'weight_agreed',
      weightAgreementVoid: false,
    });
  });

  it('marks an aircraft at weight agreed for re-verify without moving it', () => {
    expect(reverifyDropBack(steps, 'weight_agreed', 'ship_speed')).toEqual({
      to: 'weight_agreed',
      weightAgreementVoid: false,
    });
  });

  it('takes an aircraft back before the weight agreement when the weight itself changes', () => {
    expect(reverifyDropBack(steps, 'tensioned', 'weight')).toEqual({ to: 'on_catapult', weightAgreementVoid: true });
  });

  it('leaves aircraft alone before the weight is agreed, and those no longer in the steps', () => {
    for (const status of ['planned', 'taxiing', 'on_catapult', 'suspended', 'launched'])
      expect(reverifyDropBack(steps, status, 'wind')).toBeNull();
  });
});
