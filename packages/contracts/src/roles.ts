/** The roles of the brief. A person has exactly one. */
export const ROLES = ['admin', 'air_operations', 'air_boss', 'handler', 'catapult_officer', 'pilot', 'observer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  air_operations: 'Air operations',
  air_boss: 'Air boss',
  handler: 'Handler',
  catapult_officer: 'Catapult officer',
  pilot: 'Pilot',
  observer: 'Observer',
};
