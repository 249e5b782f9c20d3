import type { PasswordLinkRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<PasswordLinkRefusalCode, HttpStatus> = {
  link_invalid: HttpStatus.BAD_REQUEST,
};

export class PasswordLinksException extends DomainException {
  constructor(code: PasswordLinkRefusalCode, message: string) {
    super(STATUS[code], code, message);
  }
}
