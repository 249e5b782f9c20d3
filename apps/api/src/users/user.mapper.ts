import type { UserView } from '@catline/contracts';
import type { User } from '../database/entities/user.entity.js';

export function toUserView(user: User): UserView {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    catapultId: user.catapultId,
    squadronId: user.squadronId,
    active: user.active,
  };
}
