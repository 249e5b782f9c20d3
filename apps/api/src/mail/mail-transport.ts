import { Injectable, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createTransport } from 'nodemailer';
import type { Environment } from '../config/environment.js';
import type { OutboxMail } from '../database/entities/outbox-mail.entity.js';

/** The SMTP connection, through nodemailer; one message at a time, each on its own connection. */
@Injectable()
export class MailTransport implements OnApplicationShutdown {
  private readonly transporter;
  private readonly from: string;
  private readonly messageIdDomain: string;

  constructor(config: ConfigService<Environment, true>) {
    this.from = config.get('MAIL_FROM');
    this.messageIdDomain = /@([^>\s]+)/.exec(this.from)?.[1] ?? 'catline.invalid';
    this.transporter = createTransport({
      host: config.get('SMTP_HOST'),
      port: config.get('SMTP_PORT'),
      secure: false,
      // Short enough that an unreachable server fails an attempt well inside the sender's lease.
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 30_000,
    });
  }

  /** Resolves once the server has accepted the message; rejects otherwise. */
  async send(mail: OutboxMail): Promise<void> {
    await this.transporter.sendMail({
      from: this.from,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      ...(mail.html ? { html: mail.html } : {}),
      // The same id on every attempt, so a receiver can drop a copy if an accepted mail is ever sent again.
      messageId: `<outbox-${mail.id}.${mail.dedupeKey.replace(/[^\w.-]/g, '.')}@${this.messageIdDomain}>`,
    });
  }

  onApplicationShutdown(): void {
    this.transporter.close();
  }
}
