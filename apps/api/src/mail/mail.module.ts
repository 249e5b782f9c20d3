import { Module } from '@nestjs/common';
import { MailOutbox } from './mail-outbox.service.js';
import { MailSender } from './mail-sender.service.js';
import { MailTransport } from './mail-transport.js';

@Module({ providers: [MailOutbox, MailSender, MailTransport], exports: [MailOutbox] })
export class MailModule {}
