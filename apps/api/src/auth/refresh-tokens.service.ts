import { createHash, createHmac, randomBytes, randomUUID } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, LessThan } from 'typeorm';
import { RefreshToken } from '../database/entities/refresh-token.entity.js';
import type { Environment } from '../config/environment.js';
import { User } from '../database/entities/user.entity.js';

export const REFRESH_TOKEN_LIFETIME_MS = 12 * 60 * 60 * 1000;
// A token replaced this recently is answered with the same successor: tabs (or a retry after a lost answer)
// that sent one cookie at the same moment all go on. Long enough for a slow network, short for a thief.
export const REPLACED_TOKEN_GRACE_MS = 10_000;

export interface IssuedRefreshToken {
  token: string;
  sessionId: string;
  expiresAt: Date;
}

export type RotationResult =
  | { outcome: 'rotated'; user: User; next: IssuedRefreshToken }
  | { outcome: 'refused'; reason: 'unknown' | 'expired' | 'inactive' }
  | { outcome: 'refused'; reason: 'reused'; userId: number };

/** Only a token's SHA-256 is stored, so a copy of the table cannot be replayed. */
function digest(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/**
 * Refresh tokens: random at sign-in, replaced on every use. A replaced token keeps its row with
 * `revokedAt` set; used again within REPLACED_TOKEN_GRACE_MS it gets the same successor, later its
 * return means a copy exists and every session of the person ends. Sessions
 * ended on purpose (logout, password change, removal) delete their rows instead: a stale cookie from
 * such a session is merely unknown and cannot end the sessions that followed.
 */
@Injectable()
export class RefreshTokens {
  private readonly logger = new Logger(RefreshTokens.name);

  private readonly successorKey: Buffer;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    config: ConfigService<Environment, true>,
  ) {
    this.successorKey = createHash('sha256')
      .update(`refresh-successor:${config.get<string>('JWT_SECRET')}`)
      .digest();
  }

  /**
   * The token that replaces `token`: derived from it with a key of ours, so the same successor can be
   * answered again within the grace without keeping any token in clear, by any API process.
   */
  private successorOf(token: string): string {
    return createHmac('sha256', this.successorKey).update(token).digest('base64url');
  }

  /** A token of a new session, or the next token of `sessionId`. */
  async issue(
    userId: number,
    manager: EntityManager = this.dataSource.manager,
    sessionId: string = randomUUID(),
    token: string = randomBytes(32).toString('base64url'),
  ): Promise<IssuedRefreshToken> {
    await manager.delete(RefreshToken, { userId, expiresAt: LessThan(new Date()) });
    const expiresAt = new Date(Date.now() + REFRESH_TOKEN_LIFETIME_MS);
    await manager.insert(RefreshToken, { userId, sessionId, tokenHash: digest(token), expiresAt, revokedAt: null });
    return { token, sessionId, expiresAt };
  }

  /** Swaps a live token for a new one in one transaction; the row lock makes two racing uses see each other. */
  rotate(token: string): Promise<RotationResult> {
    return this.dataSource.transaction(async (manager) => {
      const stored = await manager.findOne(RefreshToken, {
        where: { tokenHash: digest(token) },
        lock: { mode: 'pessimistic_write' },
      });
      if (!stored) return { outcome: 'refused', reason: 'unknown' };
      const again = stored.revokedAt ? await this.successorWithinGrace(stored, token, manager) : undefined;
      if (again) return again;
      if (stored.revokedAt) {
        this.logger.warn(`Replaced refresh token of user ${stored.userId} used again; ending all their sessions`);
        await this.revokeAllFor(stored.userId, manager);
        await manager.increment(User, { id: stored.userId }, 'tokenVersion', 1);
        return { outcome: 'refused', reason: 'reused', userId: stored.userId };
      }
      if (stored.expiresAt.getTime() <= Date.now()) return { outcome: 'refused', reason: 'expired' };
      const user = await manager.findOneBy(User, { id: stored.userId });
      if (!user?.active) return { outcome: 'refused', reason: 'inactive' };
      await manager.update(RefreshToken, { id: stored.id }, { revokedAt: new Date() });
      const next = await this.issue(user.id, manager, stored.sessionId, this.successorOf(token));
      return { outcome: 'rotated', user, next };
    });
  }

  /** The live successor of a token replaced within the grace, answered again; undefined past it. */
  private async successorWithinGrace(
    stored: RefreshToken,
    token: string,
    manager: EntityManager,
  ): Promise<RotationResult | undefined> {
    if (!stored.revokedAt || Date.now() - stored.revokedAt.getTime() > REPLACED_TOKEN_GRACE_MS) return undefined;
    const next = this.successorOf(token);
    const successor = await manager.findOneBy(RefreshToken, { tokenHash: digest(next), sessionId: stored.sessionId });
    if (!successor || successor.revokedAt || successor.expiresAt.getTime() <= Date.now()) return undefined;
    const user = await manager.findOneBy(User, { id: stored.userId });
    if (!user?.active) return { outcome: 'refused', reason: 'inactive' };
    return {
      outcome: 'rotated',
      user,
      next: { token: next, sessionId: successor.sessionId, expiresAt: successor.expiresAt },
    };
  }

  /** The session a token of the person belongs to (undefined for someone else's or an unknown token). */
  async sessionOf(token: string, userId: number): Promise<string | undefined> {
    return (await this.dataSource.manager.findOneBy(RefreshToken, { tokenHash: digest(token), userId }))?.sessionId;
  }

  /** Ends one session of the person: every token of it goes, so none can be refreshed or count as reuse. */
  async endSession(sessionId: string, userId: number): Promise<void> {
    await this.dataSource.manager.delete(RefreshToken, { sessionId, userId });
  }

  async revokeAllFor(userId: number, manager: EntityManager = this.dataSource.manager): Promise<void> {
    await manager.delete(RefreshToken, { userId });
  }
}
