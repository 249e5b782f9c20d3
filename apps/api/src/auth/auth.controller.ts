import { REFRESH_HEADER, type SessionResponse, type SessionUser } from '@catline/contracts';
import { Body, Controller, Get, Header, HttpCode, HttpStatus, Post, Req, Res } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import type { AuthenticatedUser } from '../common/authenticated-user.js';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Public } from '../common/decorators/public.decorator.js';
import { type Environment, webOrigins } from '../config/environment.js';
import { AuthException } from './auth.exception.js';
import type { SignedInRequest } from './auth.guard.js';
import { AuthService, type SignedIn } from './auth.service.js';
import { ChangePasswordDto } from './dto/change-password.dto.js';
import { LoginDto } from './dto/login.dto.js';
import { clearRefreshCookie, readRefreshCookie, setRefreshCookie } from './refresh-cookie.js';
import { toSessionUser } from './session.mapper.js';
import { ApiDoc } from '../common/openapi/api-doc.decorator.js';
import { SessionResponseDto, SessionUserDto } from '../common/openapi/views/auth.view.js';

// Answers holding an access token: no browser or proxy cache may keep them.
const NO_STORE = 'no-store';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  private readonly origins: string[];

  constructor(
    private readonly auth: AuthService,
    config: ConfigService<Environment, true>,
  ) {
    this.origins = webOrigins({ WEB_ORIGINS: config.get('WEB_ORIGINS') });
  }

  @ApiDoc('Sign in', {
    response: SessionResponseDto,
    description: 'Answers an access token and sets the refresh cookie.',
    refuses: { 401: ['invalid_credentials'], 429: ['too_many_attempts'] },
  })
  @Public()
  @Post('login')
  @HttpCode(HttpStatus.OK)
  @Header('Cache-Control', NO_STORE)
  async login(
    @Body() body: LoginDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionResponse> {
    return this.answer(await this.auth.login(body.email, body.password, request.ip ?? ''), request, response);
  }

  @ApiDoc('Renew the session', {
    response: SessionResponseDto,
    description: `Spends the refresh cookie for a new access token; only from a Catline page, with the ${REFRESH_HEADER} header.`,
    refuses: { 401: ['session_invalid', 'session_ended'], 403: ['refresh_refused'] },
  })
  @Public()
  @Post('refresh')
  @HttpCode(HttpStatus.OK)
  @Header('Cache-Control', NO_STORE)
  async refresh(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<SessionResponse> {
    const origin = request.headers.origin;
    if (request.get(REFRESH_HEADER) !== '1' || (origin !== undefined && !this.origins.includes(origin))) {
      throw new AuthException(
        'refresh_refused',
        `A session is renewed only by the Catline page itself (origin and ${REFRESH_HEADER} header).`,
      );
    }
    try {
      return this.answer(await this.auth.refresh(readRefreshCookie(request)), request, response);
    } catch (error) {
      clearRefreshCookie(request, response);
      throw error;
    }
  }

  @ApiDoc('Sign out', { description: 'Ends this session and clears the refresh cookie.' })
  @Post('logout')
  @HttpCode(HttpStatus.NO_CONTENT)
  async logout(
    @CurrentUser() user: AuthenticatedUser,
    @Req() request: SignedInRequest,
    @Res({ passthrough: true }) response: Response,
  ): Promise<void> {
    await this.auth.logout(request.sessionId!, readRefreshCookie(request), user);
    clearRefreshCookie(request, response);
  }

  @ApiDoc('Read the signed-in person', { response: SessionUserDto })
  @Get('me')
  me(@CurrentUser() user: AuthenticatedUser): SessionUser {
    return toSessionUser(user);
  }

  /** Other sessions end; this one gets a fresh refresh cookie, so POST /auth/refresh continues it. */
  @ApiDoc('Change your password', {
    description: 'Ends your other sessions; this one continues with a fresh refresh cookie.',
    refuses: { 400: ['wrong_password', 'password_unchanged', 'weak_password'] },
  })
  @Post('password')
  @HttpCode(HttpStatus.NO_CONTENT)
  async changePassword(
    @CurrentUser() user: AuthenticatedUser,
    @Body() body: ChangePasswordDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<void> {
    const refresh = await this.auth.changePassword(user, body.currentPassword, body.newPassword);
    setRefreshCookie(request, response, refresh);
  }

  private answer({ session, refresh }: SignedIn, request: Request, response: Response): SessionResponse {
    setRefreshCookie(request, response, refresh);
    return session;
  }
}
