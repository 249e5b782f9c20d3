/** The roles of the brief. A person has exactly one. */
export const ROLES = [
  'admin',
  'air_operations',
  'air_boss',
  'handler',
  'catapult_officer',
  'deck_edge_operator',
  'pilot',
  'observer',
] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  air_operations: 'Air operations',
  air_boss: 'Air boss',
  handler: 'Handler',
  catapult_officer: 'Catapult officer',
  deck_edge_operator: 'Deck edge operator',
  pilot: 'Pilot',
  observer: 'Observer',
};

/** Roles whose person works at one catapult and is bound to it. */
export const CATAPULT_ROLES = ['catapult_officer', 'deck_edge_operator'] as const satisfies readonly Role[];

export const isCatapultRole = (role: Role): boolean => (CATAPULT_ROLES as readonly Role[]).includes(role);
