import type { CookieOptions, Request, Response } from 'express';
import type { IssuedRefreshToken } from './refresh-tokens.service.js';

export const REFRESH_COOKIE = 'catline_refresh';

// Sent only to the auth routes, never readable by scripts, never cross-site.
function cookieOptions(request: Request): CookieOptions {
  return { httpOnly: true, sameSite: 'strict', path: '/api/auth', secure: request.secure };
}

export function readRefreshCookie(request: Request): string | undefined {
  const value = (request.cookies as Record<string, unknown> | undefined)?.[REFRESH_COOKIE];
  return typeof value === 'string' && value.length > 0 ? value : undefined;
}

export function setRefreshCookie(request: Request, response: Response, issued: IssuedRefreshToken): void {
  response.cookie(REFRESH_COOKIE, issued.token, { ...cookieOptions(request), expires: issued.expiresAt });
}

export function clearRefreshCookie(request: Request, response: Response): void {
  response.clearCookie(REFRESH_COOKIE, cookieOptions(request));
}
