import type { SquadronRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<SquadronRefusalCode, HttpStatus> = {
  squadron_not_found: HttpStatus.NOT_FOUND,
  code_taken: HttpStatus.CONFLICT,
  squadron_in_use: HttpStatus.CONFLICT,
};

export class SquadronsException extends DomainException {
  constructor(code: SquadronRefusalCode, message: string) {
    super(STATUS[code], code, message);
  }
}
