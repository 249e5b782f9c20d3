import { ROLES } from '@catline/contracts';
import { catapultBindingProblem } from './catapult-binding.js';

describe('catapultBindingProblem', () => {
  it('accepts a catapult officer bound to a catapult', () => {
    expect(catapultBindingProblem('catapult_officer', 3)).toBeNull();
  });

  it('refuses a catapult officer without a catapult', () => {
    expect(catapultBindingProblem('catapult_officer', null)).toMatch(/must be given the catapult/);
  });

  it.each(ROLES.filter((role) => role !== 'catapult_officer'))('refuses binding a %s to a catapult', (role) => {
    expect(catapultBindingProblem(role, 2)).toMatch(/Only a catapult officer/);
    expect(catapultBindingProblem(role, null)).toBeNull();
  });
});
