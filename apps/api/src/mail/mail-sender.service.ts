import { Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, In } from 'typeorm';
import type { Environment } from '../config/environment.js';
import { OutboxMail } from '../database/entities/outbox-mail.entity.js';
import { MailTransport } from './mail-transport.js';
import { retryDelayMs } from './retry-delay.js';

const POLL_MS = 1_000;
const BATCH = 20;
/** A claimed mail is not due for anyone else this long: far past the transport's own timeouts. */
const LEASE_MS = 5 * 60_000;

const reasonOf = (error: unknown) => (error instanceof Error ? error.message : String(error)).slice(0, 500);

/**
 * Delivers the outbox: every second it claims the due mail (row locks skipped by other senders, then
 * leased by moving `next_attempt_at`), sends each, and marks it sent only after the SMTP server
 * accepted it. A failure waits twice as long as the one before (retry-delay.ts), so an outage loses
 * nothing and a server back up gets the backlog. The row's lease keeps two processes from sending
 * the same mail; only a crash between the server's acceptance and the mark can repeat one, and then
 * with the same Message-ID.
 */
@Injectable()
export class MailSender implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(MailSender.name);
  private timer: NodeJS.Timeout | undefined;
  private round: Promise<void> | undefined;
  private stopped = false;
  private databaseWasDown = false;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly transport: MailTransport,
    private readonly config: ConfigService<Environment, true>,
  ) {}

  onApplicationBootstrap(): void {
    if (this.config.get('MAIL_SENDER') === 'on') this.schedule(0);
  }

  async onApplicationShutdown(): Promise<void> {
    this.stopped = true;
    clearTimeout(this.timer);
    await this.round;
  }

  /** Sends what is due now; resolves with the number of mails the server accepted. */
  async sendDue(): Promise<number> {
    const claimed = await this.claim(new Date());
    let sent = 0;
    for (const mail of claimed) {
      if (await this.deliver(mail)) sent += 1;
    }
    return sent;
  }

  private schedule(delayMs: number): void {
    this.timer = setTimeout(() => {
      this.round = this.sendDue()
        .then(
          () => this.noteDatabase(true),
          (error: unknown) => this.noteDatabase(false, error),
        )
        .finally(() => {
          this.round = undefined;
          if (!this.stopped) this.schedule(POLL_MS);
        });
    }, delayMs);
  }

  private async claim(now: Date): Promise<OutboxMail[]> {
    const ids = await this.dataSource.transaction(async (manager) => {
      const due = await manager.query<{ id: number }[]>(
        `SELECT id FROM mail_outbox
         WHERE sent_at IS NULL AND next_attempt_at <= ?
         ORDER BY next_attempt_at, id
         LIMIT ${BATCH}
         FOR UPDATE SKIP LOCKED`,
        [now],
      );
      if (due.length === 0) return [];
      const ids = due.map((row) => row.id);
      await manager.update(
        OutboxMail,
        { id: In(ids) },
        { nextAttemptAt: new Date(now.getTime() + LEASE_MS), attempts: () => 'attempts + 1' },
      );
      return ids;
    });
    return ids.length === 0
      ? []
      : this.dataSource.manager.find(OutboxMail, { where: { id: In(ids) }, order: { id: 'ASC' } });
  }

  private async deliver(mail: OutboxMail): Promise<boolean> {
    try {
      await this.transport.send(mail);
    } catch (error) {
      const waitMs = retryDelayMs(mail.attempts);
      await this.dataSource.manager.update(
        OutboxMail,
        { id: mail.id },
        { nextAttemptAt: new Date(Date.now() + waitMs), lastError: reasonOf(error) },
      );
      this.logger.warn(
        `Mail ${mail.id} (${mail.kind} to ${mail.to}) not sent on attempt ${mail.attempts}: ${reasonOf(error)}; next try in ${Math.round(waitMs / 1000)} s`,
      );
      return false;
    }
    await this.dataSource.manager.update(OutboxMail, { id: mail.id }, { sentAt: new Date(), lastError: null });
    this.logger.log(`Mail ${mail.id} (${mail.kind}) sent to ${mail.to}`);
    return true;
  }

  // The database being away is said once, not every second.
  private noteDatabase(up: boolean, error?: unknown): void {
    if (!up && !this.databaseWasDown) this.logger.warn(`Mail outbox unreachable, will keep trying: ${reasonOf(error)}`);
    if (up && this.databaseWasDown) this.logger.log('Mail outbox reachable again');
    this.databaseWasDown = !up;
  }
}
