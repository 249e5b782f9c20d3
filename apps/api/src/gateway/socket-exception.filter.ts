import type { RefusalCode } from '@catline/contracts';
import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, Logger } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';
import { SocketRefusal } from './socket-refusal.js';

interface SocketFailure {
  ok: false;
  code: RefusalCode;
  message: string;
}

/** A refused socket event is answered through its acknowledgement, as `{ ok: false, code, message }`. */
@Catch()
export class SocketExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger(SocketExceptionFilter.name);

  catch(exception: unknown, host: ArgumentsHost): void {
    const ack: unknown = host.getArgByIndex(2);
    if (typeof ack === 'function') ack(this.failure(exception));
  }

  private failure(exception: unknown): SocketFailure {
    if (exception instanceof SocketRefusal || exception instanceof DomainException) {
      return { ok: false, code: exception.code, message: exception.message };
    }
    if (exception instanceof HttpException) {
      const response = exception.getResponse();
      const messages =
        typeof response === 'object' && response !== null ? (response as { message?: unknown }).message : response;
      return Array.isArray(messages)
        ? { ok: false, code: 'validation_failed', message: `Invalid request: ${messages.join('; ')}` }
        : { ok: false, code: 'bad_request', message: exception.message };
    }
    this.logger.error(exception instanceof Error ? exception.stack : String(exception));
    return { ok: false, code: 'internal_error', message: 'Something went wrong on the server; try again.' };
  }
}
