import type { SessionUser } from '@catline/contracts';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import type { User } from '../database/entities/user.entity.js';

export function toAuthenticatedUser(user: User): AuthenticatedUser {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    catapultId: user.catapultId,
    shipId: user.shipId,
  };
}

export function toSessionUser(user: AuthenticatedUser): SessionUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role, catapultId: user.catapultId };
}
