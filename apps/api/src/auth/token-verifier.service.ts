import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { ACCESS_TOKEN_ALGORITHM, type AccessTokenClaims } from './access-token.js';
import { AuthException } from './auth.exception.js';
import { PersonLookup } from './person-lookup.service.js';
import { toAuthenticatedUser } from './session.mapper.js';

/** What a token said about its session, kept by a socket to check again on each event. */
export type SessionClaims = Pick<AccessTokenClaims, 'sub' | 'tv' | 'sid'>;

export interface VerifiedSession {
  user: AuthenticatedUser;
  claims: SessionClaims;
  expiresAt: Date;
}

const INVALID = 'Your session has expired or is no longer valid. Sign in again.';

/**
 * The one check of an access token, shared by the HTTP guard and the socket gateway: a valid HS256
 * signature with our key, not expired, a person who still exists, is active and has not had their
 * tokens withdrawn since (token version), and a session not ended since (logout).
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

  /** As verify, plus the session's claims and when the token expires (for a socket, which checks again). */
  async verifySession(token: string): Promise<VerifiedSession> {
    const claims = await this.readClaims(token);
    return { user: await this.recheck(claims), claims, expiresAt: new Date(claims.exp * 1000) };
  }

  /** The person as they are now, if the session still holds; throws AuthException otherwise. */
  async recheck(claims: SessionClaims): Promise<AuthenticatedUser> {
    const user = await this.people.byId(claims.sub);
    if (!user || !user.active || user.tokenVersion !== claims.tv || !(await this.people.sessionLive(claims.sid))) {
      throw new AuthException('session_invalid', INVALID);
    }
    return toAuthenticatedUser(user);
  }

  private async readClaims(token: string): Promise<AccessTokenClaims & { exp: number }> {
    try {
      const claims = await this.jwt.verifyAsync<AccessTokenClaims & { exp: number }>(token, {
        algorithms: [ACCESS_TOKEN_ALGORITHM],
      });
      if (
        !Number.isInteger(claims.sub) ||
        !Number.isInteger(claims.tv) ||
        typeof claims.sid !== 'string' ||
        !Number.isFinite(claims.exp)
      ) {
        throw new Error('missing claims');
      }
      return claims;
    } catch {
      throw new AuthException('session_invalid', INVALID);
    }
  }
}
