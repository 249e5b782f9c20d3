import type { ShipRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<ShipRefusalCode, HttpStatus> = {
  ship_not_found: HttpStatus.NOT_FOUND,
  ship_required: HttpStatus.BAD_REQUEST,
  catapult_not_found: HttpStatus.NOT_FOUND,
  invalid_configuration: HttpStatus.BAD_REQUEST,
  spot_in_use: HttpStatus.CONFLICT,
  readiness_step_in_use: HttpStatus.CONFLICT,
  deck_layout_invalid: HttpStatus.UNPROCESSABLE_ENTITY,
};

export class ShipsException extends DomainException {
  constructor(code: ShipRefusalCode, message: string, details?: string[]) {
    super(STATUS[code], code, message, details);
  }
}
