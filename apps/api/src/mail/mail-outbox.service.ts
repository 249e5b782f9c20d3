import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import type { MailKind } from '../database/entities/outbox-mail.entity.js';

export interface MailDraft {
  kind: MailKind;
  to: string;
  subject: string;
  text: string;
  /** What the mail is about; queuing the same key again changes nothing. */
  dedupeKey: string;
}

/**
 * Queues mail in the caller's transaction: the mail exists exactly when the change that caused it
 * committed. The sender (MailSender) delivers it later.
 */
@Injectable()
export class MailOutbox {
  async enqueue(manager: EntityManager, draft: MailDraft): Promise<void> {
    // The instant comes from this process, like the sender's "due" check, whatever the server's time zone.
    await manager.query(
      `INSERT INTO mail_outbox (kind, to_address, subject, body_text, dedupe_key, next_attempt_at)
       VALUES (?, ?, ?, ?, ?, ?)
       ON DUPLICATE KEY UPDATE dedupe_key = dedupe_key`,
      [draft.kind, draft.to, draft.subject.slice(0, 200), draft.text, draft.dedupeKey, new Date()],
    );
  }
}
