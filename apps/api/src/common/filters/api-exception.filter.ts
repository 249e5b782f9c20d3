import type { ApiError, GenericRefusalCode } from '@catline/contracts';
import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, HttpStatus, Logger } from '@nestjs/common';
import type { Response } from 'express';
import { QueryFailedError } from 'typeorm';
import { DomainException } from '../errors/domain.exception.js';
import { TooManyAttemptsException } from '../errors/too-many-attempts.exception.js';

const CODE_BY_STATUS: Record<number, GenericRefusalCode> = {
  400: 'bad_request',
  401: 'unauthorized',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
  413: 'payload_too_large',
  429: 'too_many_requests',
  503: 'unavailable',
};

// mysql2 error codes that mean the database is out of reach rather than the request being wrong. A server
// shutting down kills its connections (ER_SERVER_SHUTDOWN, ER_CONNECTION_KILLED), and a Galera node that
// is not in sync with its cluster refuses every statement (ER_UNKNOWN_COM_ERROR, "WSREP has not yet
// prepared node for application use").
const DATABASE_DOWN = new Set([
  'ECONNREFUSED',
  'PROTOCOL_CONNECTION_LOST',
  'ETIMEDOUT',
  'ER_CON_COUNT_ERROR',
  'EPIPE',
  'ER_SERVER_SHUTDOWN',
  'ER_CONNECTION_KILLED',
  'ER_UNKNOWN_COM_ERROR',
]);
// A transaction MariaDB rolled back to break a lock cycle (after the pipeline's own retries): nothing changed.
const DATABASE_BUSY = new Set(['ER_LOCK_DEADLOCK', 'ER_LOCK_WAIT_TIMEOUT']);

/** Every HTTP error leaves as an ApiError: a status, a stable code and a readable message. */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger(ApiExceptionFilter.name);

  catch(exception: unknown, host: ArgumentsHost): void {
    if (host.getType() !== 'http') throw exception;
    const body = this.toApiError(exception);
    const response = host.switchToHttp().getResponse<Response>();
    if (exception instanceof TooManyAttemptsException) response.setHeader('Retry-After', String(exception.retryAfterS));
    response.status(body.statusCode).json(body);
  }

  private toApiError(exception: unknown): ApiError {
    // The body parser's refusals (see json-depth.ts) reach here wrapped in an HttpException by Nest.
    if (exception instanceof HttpException && exception.cause instanceof DomainException) exception = exception.cause;
    if (exception instanceof DomainException) {
      return {
        statusCode: exception.getStatus(),
        code: exception.code,
        message: exception.message,
        ...(exception.details ? { details: exception.details } : {}),
      };
    }
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      const response = exception.getResponse();
      const raw =
        typeof response === 'object' && response !== null ? (response as { message?: unknown }).message : response;
      if (Array.isArray(raw)) {
        return {
          statusCode: status,
          code: 'validation_failed',
          message: `Invalid request: ${raw.join('; ')}`,
          details: raw.map(String),
        };
      }
      const message = typeof raw === 'string' ? raw : exception.message;
      return { statusCode: status, code: CODE_BY_STATUS[status] ?? 'error', message };
    }
    const code =
      (exception as { code?: string; driverError?: { code?: string } }).driverError?.code ??
      (exception as { code?: string }).code;
    if (code && DATABASE_DOWN.has(code)) {
      return {
        statusCode: HttpStatus.SERVICE_UNAVAILABLE,
        code: 'database_unavailable',
        message: 'The database is not answering; nothing was changed. Try again shortly.',
      };
    }
    if (code && DATABASE_BUSY.has(code)) {
      this.logger.warn(`Transaction rolled back by the database: ${code}`);
      return {
        statusCode: HttpStatus.SERVICE_UNAVAILABLE,
        code: 'database_busy',
        message: 'The database was busy and nothing was changed. Try again.',
      };
    }
    if (exception instanceof QueryFailedError) this.logger.error(`Query failed: ${exception.message}`);
    else this.logger.error(exception instanceof Error ? exception.stack : String(exception));
    return {
      statusCode: HttpStatus.INTERNAL_SERVER_ERROR,
      code: 'internal_error',
      message: 'Something went wrong on the server. The error is logged; please try again.',
    };
  }
}
