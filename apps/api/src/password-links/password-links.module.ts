import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module.js';
import { MailModule } from '../mail/mail.module.js';
import { PasswordLinksController } from './password-links.controller.js';
import { PasswordLinks } from './password-links.service.js';

@Module({
  imports: [AuthModule, MailModule],
  controllers: [PasswordLinksController],
  providers: [PasswordLinks],
  exports: [PasswordLinks],
})
export class PasswordLinksModule {}
