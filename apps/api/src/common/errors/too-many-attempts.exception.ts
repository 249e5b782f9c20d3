import { HttpStatus } from '@nestjs/common';
import { DomainException } from './domain.exception.js';

/** A 429 with the seconds to wait, which the error filter also sends as Retry-After. */
export class TooManyAttemptsException extends DomainException {
  constructor(
    message: string,
    readonly retryAfterS: number,
  ) {
    super(HttpStatus.TOO_MANY_REQUESTS, 'too_many_attempts', message);
  }
}
