import type { AcceptedResponse } from '@catline/contracts';
import { Body, Controller, HttpCode, HttpStatus, Post, Req } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../common/decorators/public.decorator.js';
import { PasswordResetRequestDto } from './dto/password-reset-request.dto.js';
import { SetPasswordWithTokenDto } from './dto/set-password-with-token.dto.js';
import { PasswordLinks } from './password-links.service.js';

// The same answer for every e-mail, so the route tells nobody who has an account.
const RESET_ACCEPTED =
  'If an active account signs in with that e-mail, a link to set a new password is on its way. It works once, within 60 minutes.';

@ApiTags('auth')
@Controller('auth')
export class PasswordLinksController {
  constructor(private readonly links: PasswordLinks) {}

  @Public()
  @Post('password-reset')
  @HttpCode(HttpStatus.ACCEPTED)
  async requestReset(@Body() body: PasswordResetRequestDto, @Req() request: Request): Promise<AcceptedResponse> {
    await this.links.requestReset(body.email, request.ip ?? '');
    return { message: RESET_ACCEPTED };
  }

  @Public()
  @Post('password-reset/confirm')
  @HttpCode(HttpStatus.NO_CONTENT)
  confirmReset(@Body() body: SetPasswordWithTokenDto): Promise<void> {
    return this.links.redeem('reset', body.token, body.newPassword);
  }

  @Public()
  @Post('invitations/accept')
  @HttpCode(HttpStatus.NO_CONTENT)
  acceptInvitation(@Body() body: SetPasswordWithTokenDto): Promise<void> {
    return this.links.redeem('invitation', body.token, body.newPassword);
  }
}
