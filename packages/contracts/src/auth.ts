import type { Role } from './roles.js';

/**
 * The header every POST /auth/refresh must carry: a page of another site cannot add it without a CORS
 * preflight, which the API refuses, so it cannot spend the refresh cookie.
 */
export const REFRESH_HEADER = 'X-Catline-Refresh';

export interface LoginRequest {
  email: string;
  password: string;
}

/** The signed-in person as the client sees them. */
export interface SessionUser {
  id: number;
  email: string;
  name: string;
  role: Role;
  /** Set for a catapult officer: the catapult they run now. */
  catapultId: number | null;
}

/**
 * Returned by login and refresh. The access token (JWT, at most 15 minutes) goes in
 * `Authorization: Bearer`; the refresh token travels only in an httpOnly cookie.
 */
export interface SessionResponse {
  accessToken: string;
  /** ISO 8601 instant the access token expires. */
  expiresAt: string;
  user: SessionUser;
}

export interface ChangePasswordRequest {
  currentPassword: string;
  newPassword: string;
}

/** Asks for a mail with a one-time link to set a new password; answered the same whether or not the e-mail is known. */
export interface PasswordResetRequest {
  email: string;
}

/** Sets a password with the token of a one-time link (password reset or invitation). */
export interface SetPasswordWithTokenRequest {
  token: string;
  newPassword: string;
}

/** An accepted request whose effect follows later (e.g. a mail on its way). */
export interface AcceptedResponse {
  message: string;
}

/** The body of every 4xx/5xx answer. */
export interface ApiError {
  statusCode: number;
  /** A stable machine code from `refusals.ts`, e.g. `stale_basis`, `validation_failed`. */
  code: string;
  /** A sentence a person understands. */
  message: string;
  /** Field-level problems for validation failures. */
  details?: string[];
}
