import type { UserRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<UserRefusalCode, HttpStatus> = {
  user_not_found: HttpStatus.NOT_FOUND,
  email_taken: HttpStatus.CONFLICT,
  invalid_binding: HttpStatus.BAD_REQUEST,
  unknown_reference: HttpStatus.BAD_REQUEST,
  self_change: HttpStatus.CONFLICT,
  cannot_invite: HttpStatus.CONFLICT,
};

export class UsersException extends DomainException {
  constructor(code: UserRefusalCode, message: string) {
    super(STATUS[code], code, message);
  }
}
