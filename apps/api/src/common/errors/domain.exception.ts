import { HttpException, type HttpStatus } from '@nestjs/common';

/**
 * A refusal with a stable code and a sentence a person understands. Each feature subclasses it
 * (e.g. LineupConflictException); the global filter turns it into the ApiError body.
 */
export class DomainException extends HttpException {
  constructor(
    status: HttpStatus,
    readonly code: string,
    message: string,
    readonly details?: string[],
  ) {
    super({ statusCode: status, code, message, ...(details ? { details } : {}) }, status);
  }
}
