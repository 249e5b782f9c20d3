import type { AircraftRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<AircraftRefusalCode, HttpStatus> = {
  aircraft_not_found: HttpStatus.NOT_FOUND,
  side_number_taken: HttpStatus.CONFLICT,
  unknown_reference: HttpStatus.BAD_REQUEST,
  aircraft_in_use: HttpStatus.CONFLICT,
};

export class AircraftException extends DomainException {
  constructor(code: AircraftRefusalCode, message: string) {
    super(STATUS[code], code, message);
  }
}
