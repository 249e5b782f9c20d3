import { createHash, randomBytes } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, IsNull, MoreThan } from 'typeorm';
import { AuditTrail } from '../audit/audit-trail.service.js';
import { AttemptLimits } from '../auth/attempt-limits.service.js';
import { emailIdentity } from '../auth/normalize-email.js';
import { hashPassword } from '../auth/password.js';
import { assertStrongPassword } from '../auth/password-strength.js';
import { RefreshTokens } from '../auth/refresh-tokens.service.js';
import { SessionEnds } from '../auth/session-ends.service.js';
import type { Environment } from '../config/environment.js';
import { MailOutbox } from '../mail/mail-outbox.service.js';
import { User } from '../database/entities/user.entity.js';
import { type LinkPurpose, PasswordLink } from '../database/entities/password-link.entity.js';
import { invitationMail, LINK_PATHS, resetMail } from './password-link-mails.js';
import { PasswordLinksException } from './password-links.exception.js';

const HOUR_MS = 3_600_000;

const LIFETIME: Record<LinkPurpose, { ms: number; text: string }> = {
  invitation: { ms: 72 * HOUR_MS, text: '72 hours' },
  // Short: the link alone is enough to take over the account.
  reset: { ms: HOUR_MS, text: '60 minutes' },
};

/** At most one reset mail per person in this time, so the public route cannot flood a mailbox. */
export const RESET_MAIL_INTERVAL_MS = 60_000;

const INVALID: Record<LinkPurpose, string> = {
  invitation:
    'This invitation link is not valid any more: it has expired or was already used. Ask an admin to send a new invitation.',
  reset:
    'This password link is not valid any more: it has expired or was already used. Ask for a new one from the sign-in page.',
};

const digest = (token: string) => createHash('sha256').update(token).digest('hex');

/**
 * One-time links that set a password: the invitation of a person added without one, and the password
 * reset. The token is random and mailed; only its SHA-256 is stored, and a link works once, before
 * its expiry, for an active person. Using one signs the person out everywhere.
 */
@Injectable()
export class PasswordLinks {
  private readonly logger = new Logger(PasswordLinks.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly outbox: MailOutbox,
    private readonly refreshTokens: RefreshTokens,
    private readonly attempts: AttemptLimits,
    private readonly config: ConfigService<Environment, true>,
    private readonly audit: AuditTrail,
    private readonly sessionEnds: SessionEnds,
  ) {}

  /** Mails a fresh invitation (earlier unused ones stop working); call inside the transaction that adds or re-invites the person. */
  async invite(manager: EntityManager, user: User): Promise<void> {
    await manager.delete(PasswordLink, { userId: user.id, purpose: 'invitation', usedAt: IsNull() });
    await this.issue(manager, user, 'invitation');
    this.logger.log(`Invitation queued for user ${user.id}`);
  }

  /**
   * Counts the request (per client address and per e-mail, 429 past the limits), then returns at once:
   * the link is issued afterwards, so neither the answer's time nor a lock on a person's row tells
   * whether the address has an account.
   */
  async requestReset(email: string, clientAddress: string): Promise<void> {
    const identity = emailIdentity(email);
    await this.attempts.count('reset_from', clientAddress);
    await this.attempts.count('reset', identity);
    void this.issueReset(identity).catch((error: unknown) =>
      this.logger.error(
        `A password reset request could not be handled: ${error instanceof Error ? error.message : String(error)}`,
      ),
    );
  }

  /** Mails a reset link to an active person with this e-mail; does nothing otherwise. */
  private async issueReset(identity: string): Promise<void> {
    const found = await this.dataSource.manager.findOneBy(User, { email: identity });
    if (!found?.active) return;
    await this.dataSource.transaction(async (manager) => {
      // The person's row lock makes two simultaneous requests queue one mail.
      const user = await manager.findOneOrFail(User, { where: { id: found.id }, lock: { mode: 'pessimistic_write' } });
      const since = new Date(Date.now() - RESET_MAIL_INTERVAL_MS);
      if (await manager.existsBy(PasswordLink, { userId: user.id, purpose: 'reset', createdAt: MoreThan(since) }))
        return;
      await manager.delete(PasswordLink, { userId: user.id, purpose: 'reset', usedAt: IsNull() });
      await this.issue(manager, user, 'reset');
      this.logger.log(`Password reset link queued for user ${user.id}`);
    });
  }

  /** Sets the password of the link's person and uses the link up; refuses an unknown, used or expired link. */
  async redeem(purpose: LinkPurpose, token: string, newPassword: string): Promise<void> {
    const link = await this.dataSource.manager.findOneBy(PasswordLink, { tokenHash: digest(token), purpose });
    // Checked before hashing, so made-up tokens cost the server no password hash.
    if (!link || link.usedAt || link.expiresAt.getTime() <= Date.now()) throw this.invalid(purpose);
    const owner = await this.dataSource.manager.findOneBy(User, { id: link.userId });
    if (owner) assertStrongPassword(newPassword, owner);
    const passwordHash = await hashPassword(newPassword);
    await this.dataSource.transaction(async (manager) => {
      const claimed = await manager
        .createQueryBuilder()
        .update(PasswordLink)
        .set({ usedAt: new Date() })
        .where('id = :id AND used_at IS NULL AND expires_at > :now', { id: link.id, now: new Date() })
        .execute();
      const user = await manager.findOneBy(User, { id: link.userId });
      if (claimed.affected !== 1 || !user?.active) throw this.invalid(purpose);
      await manager.update(User, { id: user.id }, { passwordHash, tokenVersion: () => 'token_version + 1' });
      await manager.delete(PasswordLink, { userId: user.id, usedAt: IsNull() });
      await this.refreshTokens.revokeAllFor(user.id, manager);
      await this.audit.record(manager, {
        action: 'password.set_by_link',
        subject: { type: 'person', id: user.id },
        shipId: user.shipId,
        summary: `${user.name} set a password through a${purpose === 'invitation' ? 'n invitation' : ' reset'} link`,
        actor: { id: user.id, email: user.email, role: user.role },
      });
    });
    this.sessionEnds.tell({ personId: link.userId });
    this.logger.log(
      `User ${link.userId} set a password through a${purpose === 'invitation' ? 'n invitation' : ' reset'} link`,
    );
  }

  private async issue(manager: EntityManager, user: User, purpose: LinkPurpose): Promise<void> {
    const token = randomBytes(32).toString('base64url');
    const now = new Date();
    const { identifiers } = await manager.insert(PasswordLink, {
      userId: user.id,
      purpose,
      tokenHash: digest(token),
      createdAt: now,
      expiresAt: new Date(now.getTime() + LIFETIME[purpose].ms),
      usedAt: null,
    });
    const input = {
      name: user.name,
      email: user.email,
      role: user.role,
      link: `${this.config.get('APP_URL').replace(/\/+$/, '')}${LINK_PATHS[purpose]}#token=${token}`,
      lifetimeText: LIFETIME[purpose].text,
    };
    const mail = purpose === 'invitation' ? invitationMail(input) : resetMail(input);
    await this.outbox.enqueue(manager, {
      kind: purpose === 'invitation' ? 'invitation' : 'password_reset',
      to: user.email,
      ...mail,
      dedupeKey: `password-link:${identifiers[0].id}`,
    });
  }

  private invalid(purpose: LinkPurpose): PasswordLinksException {
    return new PasswordLinksException('link_invalid', INVALID[purpose]);
  }
}
