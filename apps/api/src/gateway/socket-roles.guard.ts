import { ROLE_LABELS, type Role } from '@catline/contracts';
import { type CanActivate, type ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ROLES_KEY } from '../common/decorators/roles.decorator.js';
import { SocketRefusal } from './socket-refusal.js';
import type { CatlineSocket } from './socket.types.js';

/**
 * Every socket event names its roles with @Roles(); an event without them is refused, so a new event
 * cannot be open by omission. The session must not have run out.
 */
@Injectable()
export class SocketRolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const roles = this.reflector.get<Role[] | undefined>(ROLES_KEY, context.getHandler());
    const { user, expiresAt } = context.switchToWs().getClient<CatlineSocket>().data;
    if (!user || !expiresAt || expiresAt.getTime() <= Date.now()) {
      throw new SocketRefusal('session_invalid', 'Your session has expired. Sign in again.');
    }
    if (!roles?.includes(user.role)) {
      throw new SocketRefusal('forbidden_role', `${ROLE_LABELS[user.role]} may not do this.`);
    }
    return true;
  }
}
