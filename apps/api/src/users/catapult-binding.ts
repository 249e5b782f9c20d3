import { ROLE_LABELS, isCatapultRole, type Role } from '@catline/contracts';

/** A catapult officer or deck edge operator works exactly one catapult; nobody else is bound to one. Null when the pair is valid. */
export function catapultBindingProblem(role: Role, catapultId: number | null): string | null {
  if (isCatapultRole(role) && catapultId === null) {
    return `A ${ROLE_LABELS[role].toLowerCase()} must be given the catapult they work (catapultId).`;
  }
  if (!isCatapultRole(role) && catapultId !== null) {
    return 'Only a catapult officer or a deck edge operator is bound to a catapult; leave catapultId empty for this role.';
  }
  return null;
}
