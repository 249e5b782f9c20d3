import type { Role } from '@catline/contracts';

/** A catapult officer runs exactly one catapult; nobody else is bound to one. Null when the pair is valid. */
export function catapultBindingProblem(role: Role, catapultId: number | null): string | null {
  if (role === 'catapult_officer' && catapultId === null) {
    return 'A catapult officer must be given the catapult they run (catapultId).';
  }
  if (role !== 'catapult_officer' && catapultId !== null) {
    return 'Only a catapult officer is bound to a catapult; leave catapultId empty for this role.';
  }
  return null;
}
