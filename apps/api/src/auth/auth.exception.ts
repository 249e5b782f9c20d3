import type { AuthRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<AuthRefusalCode, HttpStatus> = {
  invalid_credentials: HttpStatus.UNAUTHORIZED,
  unauthenticated: HttpStatus.UNAUTHORIZED,
  session_invalid: HttpStatus.UNAUTHORIZED,
  session_ended: HttpStatus.UNAUTHORIZED,
  forbidden_role: HttpStatus.FORBIDDEN,
  // The caller is signed in; a 401 here would read as "session over" to the web app.
  wrong_password: HttpStatus.BAD_REQUEST,
  password_unchanged: HttpStatus.BAD_REQUEST,
  too_many_attempts: HttpStatus.TOO_MANY_REQUESTS,
  refresh_refused: HttpStatus.FORBIDDEN,
};

/** Every refusal of sign-in, session or role checks. */
export class AuthException extends DomainException {
  constructor(code: AuthRefusalCode, message: string) {
    super(STATUS[code], code, message);
  }
}
