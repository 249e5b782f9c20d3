import { ROLE_LABELS, type Role } from '@catline/contracts';
import { type CanActivate, type ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { TokenVerifier } from '../auth/token-verifier.service.js';
import { ROLES_KEY } from '../common/decorators/roles.decorator.js';
import { SocketRefusal } from './socket-refusal.js';
import type { CatlineSocket } from './socket.types.js';

/**
 * Every socket event names its roles with @Roles(); an event without them is refused, so a new event
 * cannot be open by omission. The session must not have run out, and is checked again as a request's
 * token is (person active, tokens not withdrawn, session not ended), against the person as they are now:
 * the role that counts is today's, not the one the socket opened with.
 */
@Injectable()
export class SocketRolesGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly verifier: TokenVerifier,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const roles = this.reflector.get<Role[] | undefined>(ROLES_KEY, context.getHandler());
    const socket = context.switchToWs().getClient<CatlineSocket>();
    const { claims, expiresAt } = socket.data;
    const user =
      claims && expiresAt && expiresAt.getTime() > Date.now()
        ? await this.verifier.recheck(claims).catch(() => undefined)
        : undefined;
    if (!user) throw new SocketRefusal('session_invalid', 'Your session has expired. Sign in again.');
    socket.data.user = user;
    if (!roles?.includes(user.role)) {
      throw new SocketRefusal('forbidden_role', `${ROLE_LABELS[user.role]} may not do this.`);
    }
    return true;
  }
}
