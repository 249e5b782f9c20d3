import { HttpStatus } from '@nestjs/common';
import { DomainException } from './domain.exception.js';

/** Refusals of a request's shape, before any feature reads it. */
export type RequestRefusalCode = 'json_too_deep' | 'invalid_id';

/** A request refused for its form (a body nested too deep, an id not in digits), always a 400: nothing was read or changed. */
export class RequestException extends DomainException {
  constructor(code: RequestRefusalCode, message: string) {
    super(HttpStatus.BAD_REQUEST, code, message);
  }
}
