import { randomBytes, randomUUID } from 'node:crypto';
import type { SessionResponse } from '@catline/contracts';
import { Injectable, Logger } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { AuditTrail } from '../audit/audit-trail.service.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { User } from '../database/entities/user.entity.js';
import { ACCESS_TOKEN_ALGORITHM, ACCESS_TOKEN_LIFETIME_S, type AccessTokenClaims } from './access-token.js';
import { AuthException } from './auth.exception.js';
import { AttemptLimits } from './attempt-limits.service.js';
import { emailIdentity } from './normalize-email.js';
import { hashPassword, verifyPassword } from './password.js';
import { assertStrongPassword } from './password-strength.js';
import { type IssuedRefreshToken, RefreshTokens } from './refresh-tokens.service.js';
import { SessionEnds } from './session-ends.service.js';
import { toAuthenticatedUser, toSessionUser } from './session.mapper.js';

export interface SignedIn {
  session: SessionResponse;
  refresh: IssuedRefreshToken;
}

const BAD_CREDENTIALS = 'The e-mail or password is not right.';

@Injectable()
export class AuthService {
  private readonly logger = new Logger(AuthService.name);
  // Checked against when the e-mail is unknown, so both refusals take as long as a real check.
  private readonly decoyHash = hashPassword(randomBytes(16).toString('hex'));

  constructor(
    private readonly jwt: JwtService,
    private readonly refreshTokens: RefreshTokens,
    private readonly attempts: AttemptLimits,
    private readonly audit: AuditTrail,
    private readonly sessionEnds: SessionEnds,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  /** Attempts count per client address and per person found (per e-mail when nobody is), the right password included. */
  async login(email: string, password: string, clientAddress: string): Promise<SignedIn> {
    await this.attempts.count('sign_in_from', clientAddress);
    const identity = emailIdentity(email);
    const user = await this.dataSource.manager.findOneBy(User, { email: identity });
    await this.attempts.count('sign_in', user ? `person:${user.id}` : `email:${identity}`);
    const matches = await verifyPassword(user?.passwordHash ?? (await this.decoyHash), password);
    if (!user?.passwordHash || !matches || !user.active) {
      await this.audit.record(this.dataSource.manager, {
        action: 'sign_in.failed',
        subject: { type: 'person', id: user?.id ?? null },
        shipId: user?.shipId ?? null,
        summary: !user ? 'No person signs in with this e-mail' : !user.active ? 'Removed person' : 'Wrong password',
        actor: { email: identity },
      });
      throw new AuthException('invalid_credentials', BAD_CREDENTIALS);
    }
    await this.audit.record(this.dataSource.manager, {
      action: 'sign_in.succeeded',
      subject: { type: 'person', id: user.id },
      shipId: user.shipId,
      summary: `${user.name} signed in`,
      actor: { id: user.id, email: user.email, role: user.role },
    });
    this.logger.log(`User ${user.id} signed in`);
    const sessionId = randomUUID();
    const session = await this.sessionFor(user, sessionId);
    return { session, refresh: await this.refreshTokens.issue(user.id, undefined, sessionId) };
  }

  async refresh(token: string | undefined): Promise<SignedIn> {
    const result = token ? await this.refreshTokens.rotate(token) : undefined;
    if (result?.outcome !== 'rotated') {
      if (result?.reason === 'reused') this.sessionEnds.tell({ personId: result.userId });
      throw new AuthException('session_ended', 'Your session has ended. Sign in again.');
    }
    return { session: await this.sessionFor(result.user, result.next.sessionId), refresh: result.next };
  }

  /** Ends the access token's session, and the refresh cookie's when that is another one (a later sign-in in this browser). */
  async logout(sessionId: string, token: string | undefined, user: AuthenticatedUser): Promise<void> {
    const cookieSession = token ? await this.refreshTokens.sessionOf(token, user.id) : undefined;
    for (const ended of new Set([sessionId, cookieSession])) {
      if (ended === undefined) continue;
      await this.refreshTokens.endSession(ended, user.id);
      this.sessionEnds.tell({ sessionId: ended });
    }
  }

  /** Sets a new password and signs out every other session; returns this device's new refresh token. */
  async changePassword(
    who: AuthenticatedUser,
    currentPassword: string,
    newPassword: string,
  ): Promise<IssuedRefreshToken> {
    const user = await this.dataSource.manager.findOneByOrFail(User, { id: who.id });
    if (!user.passwordHash || !(await verifyPassword(user.passwordHash, currentPassword))) {
      throw new AuthException('wrong_password', 'The current password is not right; the password was not changed.');
    }
    if (currentPassword === newPassword) {
      throw new AuthException('password_unchanged', 'The new password must differ from the current one.');
    }
    assertStrongPassword(newPassword, user);
    const passwordHash = await hashPassword(newPassword);
    const refresh = await this.dataSource.transaction(async (manager) => {
      await manager.update(User, { id: user.id }, { passwordHash, tokenVersion: () => 'token_version + 1' });
      await this.refreshTokens.revokeAllFor(user.id, manager);
      await this.audit.record(manager, {
        action: 'password.changed',
        subject: { type: 'person', id: user.id },
        shipId: user.shipId,
        summary: `${user.name} changed their password; other sessions ended`,
      });
      this.logger.log(`User ${user.id} changed their password; other sessions ended`);
      return this.refreshTokens.issue(user.id, manager);
    });
    this.sessionEnds.tell({ personId: user.id });
    return refresh;
  }

  private async sessionFor(user: User, sessionId: string): Promise<SessionResponse> {
    const claims: AccessTokenClaims = { sub: user.id, role: user.role, tv: user.tokenVersion, sid: sessionId };
    const accessToken = await this.jwt.signAsync(claims, {
      algorithm: ACCESS_TOKEN_ALGORITHM,
      expiresIn: ACCESS_TOKEN_LIFETIME_S,
    });
    const { exp } = this.jwt.decode<{ exp: number }>(accessToken);
    return {
      accessToken,
      expiresAt: new Date(exp * 1000).toISOString(),
      user: toSessionUser(toAuthenticatedUser(user)),
    };
  }
}
