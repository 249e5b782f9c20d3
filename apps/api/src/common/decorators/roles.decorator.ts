import type { Role } from '@catline/contracts';
import { SetMetadata } from '@nestjs/common';

export const ROLES_KEY = 'catline:roles';

/** The roles that may call a route or socket event; without it any signed-in person may. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
