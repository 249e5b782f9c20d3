import type { AircraftTypeRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<AircraftTypeRefusalCode, HttpStatus> = {
  aircraft_type_not_found: HttpStatus.NOT_FOUND,
  designation_taken: HttpStatus.CONFLICT,
  invalid_launch_data: HttpStatus.BAD_REQUEST,
  aircraft_type_in_use: HttpStatus.CONFLICT,
};

export class AircraftTypesException extends DomainException {
  constructor(code: AircraftTypeRefusalCode, message: string, details?: string[]) {
    super(STATUS[code], code, message, details);
  }
}
