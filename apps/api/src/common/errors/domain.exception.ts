import type { RefusalCode } from '@catline/contracts';
import { HttpException, type HttpStatus } from '@nestjs/common';

/**
 * A refusal with a stable code and a sentence a person understands. Each feature subclasses it with
 * its family of codes from `packages/contracts/src/refusals.ts` (e.g. LineupException with
 * LineupRefusalCode); the global filter turns it into the ApiError body.
 */
export class DomainException extends HttpException {
  constructor(
    status: HttpStatus,
    readonly code: RefusalCode,
    message: string,
    readonly details?: string[],
  ) {
    super({ statusCode: status, code, message, ...(details ? { details } : {}) }, status);
  }
}
