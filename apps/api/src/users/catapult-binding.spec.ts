import { CATAPULT_ROLES, ROLES, isCatapultRole } from '@catline/contracts';
import { catapultBindingProblem } from './catapult-binding.js';

describe('catapultBindingProblem', () => {
  it.each(CATAPULT_ROLES)('accepts a %s bound to a catapult', (role) => {
    expect(catapultBindingProblem(role, 3)).toBeNull();
  });

  it('refuses a catapult officer or deck edge operator without a catapult', () => {
    expect(catapultBindingProblem('catapult_officer', null)).toMatch(/catapult officer must be given the catapult/);
    expect(catapultBindingProblem('deck_edge_operator', null)).toMatch(/deck edge operator must be given the catapult/);
  });

  it.each(ROLES.filter((role) => !isCatapultRole(role)))('refuses binding a %s to a catapult', (role) => {
    expect(catapultBindingProblem(role, 2)).toMatch(/Only a catapult officer or a deck edge operator/);
    expect(catapultBindingProblem(role, null)).toBeNull();
  });
});
