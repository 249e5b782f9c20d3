import { type CanActivate, type ExecutionContext, Injectable } from '@nestjs/common';
import type { Request, Response } from 'express';
import { AuthException } from './auth.exception.js';
import { normalizeEmail } from './normalize-email.js';
import { LoginAttempts } from './login-attempts.service.js';

/** Limits sign-in attempts per client address and e-mail, so one person's guesses lock out nobody else. */
@Injectable()
export class LoginRateLimitGuard implements CanActivate {
  constructor(private readonly attempts: LoginAttempts) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const http = context.switchToHttp();
    const request = http.getRequest<Request>();
    const body = request.body as { email?: unknown } | undefined;
    const email = typeof body?.email === 'string' ? normalizeEmail(body.email) : '';
    const verdict = await this.attempts.record(`${request.ip}|${email}`);
    if (verdict.allowed) return true;
    http.getResponse<Response>().setHeader('Retry-After', String(verdict.retryAfterS));
    throw new AuthException(
      'too_many_attempts',
      `Too many sign-in attempts for this e-mail. Wait ${verdict.retryAfterS} seconds, then try again.`,
    );
  }
}
