import type { LineupRefusalCode } from '@catline/contracts';
import { LaunchMathInputError } from '@catline/launch-math';
import { HttpStatus } from '@nestjs/common';
import { DomainException } from '../common/errors/domain.exception.js';

const STATUS: Record<LineupRefusalCode, HttpStatus> = {
  not_found: HttpStatus.NOT_FOUND,
  invalid_lineup: HttpStatus.BAD_REQUEST,
  stale_basis: HttpStatus.CONFLICT,
  no_change: HttpStatus.CONFLICT,
  cycle_closed: HttpStatus.CONFLICT,
  cycle_not_executing: HttpStatus.CONFLICT,
  slot_not_movable: HttpStatus.CONFLICT,
  spare_unavailable: HttpStatus.CONFLICT,
  spare_held: HttpStatus.CONFLICT,
  invalid_pilot: HttpStatus.BAD_REQUEST,
  pilot_missing: HttpStatus.CONFLICT,
  agreement_required: HttpStatus.FORBIDDEN,
  reason_required: HttpStatus.UNPROCESSABLE_ENTITY,
  stores_not_in_catalogue: HttpStatus.BAD_REQUEST,
  operating_weight_missing: HttpStatus.CONFLICT,
  not_your_catapult: HttpStatus.FORBIDDEN,
  not_your_slot: HttpStatus.FORBIDDEN,
  not_current_aircraft: HttpStatus.CONFLICT,
  wrong_step: HttpStatus.CONFLICT,
  weight_not_agreed: HttpStatus.CONFLICT,
  weight_mismatch: HttpStatus.CONFLICT,
  setting_not_read_back: HttpStatus.CONFLICT,
  setting_mismatch: HttpStatus.CONFLICT,
  aircraft_on_catapult: HttpStatus.CONFLICT,
  catapult_down: HttpStatus.CONFLICT,
  catapult_closed: HttpStatus.CONFLICT,
  deck_not_clear: HttpStatus.CONFLICT,
  reverify_required: HttpStatus.CONFLICT,
  over_max_gross_weight: HttpStatus.CONFLICT,
  crosswind_over_limit: HttpStatus.CONFLICT,
  outside_launch_table: HttpStatus.CONFLICT,
  approved_setting_missing: HttpStatus.CONFLICT,
  end_speed_below_minimum: HttpStatus.CONFLICT,
  end_speed_over_max: HttpStatus.CONFLICT,
  excess_below_recommended: HttpStatus.CONFLICT,
  wind_reading_stale: HttpStatus.CONFLICT,
  nothing_to_undo: HttpStatus.CONFLICT,
  not_your_step: HttpStatus.FORBIDDEN,
  undo_expired: HttpStatus.CONFLICT,
  nothing_to_waive: HttpStatus.CONFLICT,
  already_launched: HttpStatus.CONFLICT,
  idempotency_key_reused: HttpStatus.CONFLICT,
  launch_data_invalid: HttpStatus.UNPROCESSABLE_ENTITY,
  position_occupied: HttpStatus.CONFLICT,
  path_blocked: HttpStatus.CONFLICT,
  unknown_position: HttpStatus.BAD_REQUEST,
  launches_pending: HttpStatus.CONFLICT,
  invalid_respot: HttpStatus.BAD_REQUEST,
  respot_out_of_order: HttpStatus.CONFLICT,
  respot_out_of_date: HttpStatus.CONFLICT,
};

/** Every refusal of a lineup or cycle command, with a code the client can act on. */
export class LineupException extends DomainException {
  constructor(code: LineupRefusalCode, message: string) {
    super(STATUS[code], code, message);
  }
}

/**
 * launch-math refuses stored data that cannot describe a real launch (a malformed table, a catapult
 * without an energy range): say so, instead of failing as a server error.
 */
export function asLaunchDataRefusal(error: unknown): unknown {
  return error instanceof LaunchMathInputError
    ? new LineupException(
        'launch_data_invalid',
        `The launch figures cannot be computed from the stored data: ${error.message}.`,
      )
    : error;
}
