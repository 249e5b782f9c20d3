import type { AcceptedResponse } from '@catline/contracts';
import { Body, Controller, HttpCode, HttpStatus, Post, Req } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../common/decorators/public.decorator.js';
import { PasswordResetRequestDto } from './dto/password-reset-request.dto.js';
import { SetPasswordWithTokenDto } from './dto/set-password-with-token.dto.js';
import { PasswordLinks } from './password-links.service.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { AcceptedResponseDto } from '../common/openapi/views/auth.view.js';

// The same answer for every e-mail, so the route tells nobody who has an account.
const RESET_ACCEPTED =
  'If an active account signs in with that e-mail, a link to set a new password is on its way. It works once, within 60 minutes.';

@ApiTags('auth')
@Controller('auth')
export class PasswordLinksController {
  constructor(private readonly links: PasswordLinks) {}

  @ApiDoc('Ask for a password reset link', {
    response: AcceptedResponseDto,
    description: 'Answered the same whether or not the e-mail is known.',
    refuses: { 429: ['too_many_attempts'] },
  })
  @Public()
  @Post('password-reset')
  @HttpCode(HttpStatus.ACCEPTED)
  async requestReset(@Body() body: PasswordResetRequestDto, @Req() request: Request): Promise<AcceptedResponse> {
    await this.links.requestReset(body.email, request.ip ?? '');
    return { message: RESET_ACCEPTED };
  }

  @ApiDoc('Set a new password with a reset link', { refuses: { 400: ['link_invalid', 'weak_password'] } })
  @Public()
  @Post('password-reset/confirm')
  @HttpCode(HttpStatus.NO_CONTENT)
  confirmReset(@Body() body: SetPasswordWithTokenDto): Promise<void> {
    return this.links.redeem('reset', body.token, body.newPassword);
  }

  @ApiDoc('Accept an invitation and choose a password', {
    refuses: { 400: ['link_invalid', 'weak_password'] },
  })
  @Public()
  @Post('invitations/accept')
  @HttpCode(HttpStatus.NO_CONTENT)
  acceptInvitation(@Body() body: SetPasswordWithTokenDto): Promise<void> {
    return this.links.redeem('invitation', body.token, body.newPassword);
  }
}
