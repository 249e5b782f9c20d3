import type { CycleRefusalCode } from '@catline/contracts';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<CycleRefusalCode, HttpStatus> = {
  not_found: HttpStatus.NOT_FOUND,
  cycle_number_taken: HttpStatus.CONFLICT,
  invalid_window: HttpStatus.BAD_REQUEST,
  wrong_state: HttpStatus.CONFLICT,
  invalid_pilot: HttpStatus.BAD_REQUEST,
  aircraft_already_in_cycle: HttpStatus.CONFLICT,
  aircraft_unserviceable: HttpStatus.CONFLICT,
  pilot_already_assigned: HttpStatus.CONFLICT,
  ship_already_launching: HttpStatus.CONFLICT,
  outside_window: HttpStatus.CONFLICT,
  prerequisites_not_ticked: HttpStatus.CONFLICT,
  invalid_wind_reading: HttpStatus.BAD_REQUEST,
  night_needs_case_iii: HttpStatus.CONFLICT,
  night_by_position: HttpStatus.CONFLICT,
};

export class CyclesException extends DomainException {
  constructor(code: CycleRefusalCode, message: string) {
    super(STATUS[code], code, message);
  }
}
