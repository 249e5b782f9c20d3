import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { ACCESS_TOKEN_ALGORITHM, type AccessTokenClaims } from './access-token.js';
import { AuthException } from './auth.exception.js';
import { PersonLookup } from './person-lookup.service.js';
import { toAuthenticatedUser } from './session.mapper.js';

export interface VerifiedSession {
  user: AuthenticatedUser;
  expiresAt: Date;
}

const INVALID = 'Your session has expired or is no longer valid. Sign in again.';

/**
 * The one check of an access token, shared by the HTTP guard and the socket handshake: a valid HS256
 * signature with our key, not expired, and a person who still exists, is active and has not had their
 * tokens withdrawn since (token version).
 */
@Injectable()
export class TokenVerifier {
  constructor(
    private readonly jwt: JwtService,
    private readonly people: PersonLookup,
  ) {}

  /** The signed-in person; throws AuthException (401, code session_invalid) otherwise. */
  async verify(token: string): Promise<AuthenticatedUser> {
    return (await this.verifySession(token)).user;
  }

  /** As verify, plus when the token expires (for a socket that must end the session then). */
  async verifySession(token: string): Promise<VerifiedSession> {
    const claims = await this.readClaims(token);
    const user = await this.people.byId(claims.sub);
    if (!user || !user.active || user.tokenVersion !== claims.tv) {
      throw new AuthException('session_invalid', INVALID);
    }
    return { user: toAuthenticatedUser(user), expiresAt: new Date(claims.exp * 1000) };
  }

  private async readClaims(token: string): Promise<AccessTokenClaims & { exp: number }> {
    try {
      const claims = await this.jwt.verifyAsync<AccessTokenClaims & { exp: number }>(token, {
        algorithms: [ACCESS_TOKEN_ALGORITHM],
      });
      if (!Number.isInteger(claims.sub) || !Number.isInteger(claims.tv) || !Number.isFinite(claims.exp)) {
        throw new Error('missing claims');
      }
      return claims;
    } catch {
      throw new AuthException('session_invalid', INVALID);
    }
  }
}
