import type { RequestRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from './domain.exception.js';

/** A request refused for its form (a body nested too deep, an id not in digits), always a 400: nothing was read or changed. */
export class RequestException extends DomainException {
  constructor(code: RequestRefusalCode, message: string) {
    super(HttpStatus.BAD_REQUEST, code, message);
  }
}
