import { Column, Entity, Index, PrimaryGeneratedColumn, Unique } from 'typeorm';
import { CreatedAtColumn, InstantColumn } from '../columns.js';

export const MAIL_KINDS = ['invitation', 'password_reset', 'cycle_summary'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

/**
 * One mail to send, written in the transaction of the change that caused it, so a change that rolls
 * back sends nothing and one that commits is never without its mail. The sender marks it sent only
 * once the SMTP server has accepted it.
 */
@Entity('mail_outbox')
@Unique('uq_mail_outbox_dedupe_key', ['dedupeKey'])
@Index('ix_mail_outbox_due', ['sentAt', 'nextAttemptAt'])
export class OutboxMail {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'varchar', length: 20 })
  kind: MailKind;

  @Column({ name: 'to_address', length: 254 })
  to: string;

  @Column({ length: 200 })
  subject: string;

  @Column({ name: 'body_text', type: 'mediumtext' })
  text: string;

  @Column({ name: 'body_html', type: 'mediumtext', nullable: true })
  html: string | null;

  /** What the mail is about (e.g. `cycle-summary:12:3`): the same cause never queues a second mail. */
  @Column({ name: 'dedupe_key', length: 120 })
  dedupeKey: string;

  /** Sending attempts started, successful or not. */
  @Column({ default: 0 })
  attempts: number;

  /** Not sent before this instant: the retry back-off, or the lease of a sender working on it. */
  @InstantColumn({ name: 'next_attempt_at' })
  nextAttemptAt: Date;

  @InstantColumn({ name: 'sent_at', nullable: true })
  sentAt: Date | null;

  @Column({ name: 'last_error', type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @CreatedAtColumn()
  createdAt: Date;
}
