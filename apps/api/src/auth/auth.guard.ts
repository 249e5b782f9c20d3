import { ROLE_LABELS, type Role } from '@catline/contracts';
import { type CanActivate, type ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Request } from 'express';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { requestContext } from '../common/request-context.js';
import { IS_PUBLIC } from '../common/decorators/public.decorator.js';
import { ROLES_KEY } from '../common/decorators/roles.decorator.js';
import { isStrictId } from '../common/validation/strict-id.pipe.js';
import { AuthException } from './auth.exception.js';
import { CycleScope } from './cycle-scope.service.js';
import { TokenVerifier } from './token-verifier.service.js';

/** An HTTP request once the guard has let it through: the person and the session of their token. */
export type SignedInRequest = Request & { user?: AuthenticatedUser; sessionId?: string };

export function bearerToken(header: string | undefined): string | undefined {
  const match = /^Bearer\s+(\S+)$/i.exec(header ?? '');
  return match?.[1];
}

/**
 * Every HTTP route needs a valid access token unless marked @Public(), and a role from @Roles() when
 * it has one; a route under a cycle only reaches that cycle on the caller's ship (CycleScope). Socket events are checked by the gateway itself (its handshake and guard use TokenVerifier).
 */
@Injectable()
export class AuthGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly tokens: TokenVerifier,
    private readonly cycles: CycleScope,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    if (context.getType() !== 'http') return true;
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, targets)) return true;

    const request = context.switchToHttp().getRequest<SignedInRequest>();
    const token = bearerToken(request.headers.authorization);
    if (!token) throw new AuthException('unauthenticated', 'Sign in to continue.');
    const { user, claims } = await this.tokens.verifySession(token);
    request.user = user;
    request.sessionId = claims.sid;
    const requestState = requestContext();
    if (requestState) requestState.actor = user;

    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (roles && !roles.includes(user.role)) {
      const allowed = roles.map((role) => ROLE_LABELS[role]).join(' or ');
      throw new AuthException(
        'forbidden_role',
        `Only ${allowed} may do this; you are signed in as ${ROLE_LABELS[user.role]}.`,
      );
    }
    // A malformed id is left to the route's StrictIdPipe, which refuses it with a 400.
    const cycleId: unknown = request.params.cycleId;
    if (typeof cycleId === 'string' && isStrictId(cycleId)) await this.cycles.check(user, Number(cycleId));
    return true;
  }
}
