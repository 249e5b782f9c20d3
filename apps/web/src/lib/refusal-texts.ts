import type { RefusalCode } from '@catline/contracts';

export interface RefusalText {
  title: string;
  message: string;
}

// Refusals of a command based on something another person changed meanwhile, with what to do next (the
// screen re-reads after them). Only these say that something changed first: a no-go is not a race.
const CHANGED_FIRST: Partial<Record<RefusalCode, string>> = {
  stale_basis: 'The screen now shows the latest lineup.',
  import_out_of_date: 'Check the file again against the cycle as it is now.',
};

// The server could not act (rather than refusing what was asked): nothing changed, and trying again may work.
const NOT_DONE = new Set<RefusalCode>([
  'unavailable',
  'error',
  'database_unavailable',
  'database_busy',
  'internal_error',
]);

/** Why, in a few words, after "<action> refused:". Typed by every code, so a new code needs its words here. */
const REASONS: Record<RefusalCode, string> = {
  // lineup
  not_found: 'not found',
  invalid_lineup: 'not a valid lineup',
  stale_basis: 'the lineup changed first',
  no_change: 'nothing to change',
  cycle_closed: 'the cycle is closed',
  cycle_not_executing: 'the cycle is not executing',
  slot_not_movable: 'the aircraft cannot be moved now',
  spare_unavailable: 'no spare can take its place',
  spare_held: 'the spare is held until called',
  pilot_missing: 'the aircraft has no pilot',
  agreement_required: "the catapult officer's agreement is needed",
  reason_required: 'a reason in a few words is needed',
  stores_not_in_catalogue: 'the stores are not in the type’s catalogue',
  operating_weight_missing: 'the type has no operating weight in the launch data',
  not_your_catapult: 'not your catapult',
  not_your_slot: 'not your aircraft',
  not_current_aircraft: 'not the aircraft on the catapult',
  wrong_step: 'not the next readiness step',
  aircraft_on_catapult: 'an aircraft is on the catapult',
  weight_not_agreed: 'gross weight not agreed',
  weight_mismatch: 'the gross weights do not match',
  setting_not_read_back: 'the setting was not read back',
  setting_mismatch: 'the console’s setting is not the approved one',
  catapult_down: 'the catapult is down',
  catapult_closed: 'the catapult is closed while the landing area is in use',
  deck_not_clear: 'the deck is not clear for this catapult',
  reverify_required: 'figures changed — re-verify the setting',
  over_max_gross_weight: 'over the type’s maximum catapult weight',
  crosswind_over_limit: 'crosswind over the type’s limit',
  outside_launch_table: 'the weight is outside the launch data',
  approved_setting_missing: 'no approved catapult setting in the launch data',
  end_speed_below_minimum: 'end speed below the minimum',
  end_speed_over_max: 'end speed over the type’s maximum',
  excess_below_recommended: 'excess wind over deck below the recommended value',
  wind_reading_stale: 'the wind reading is too old',
  nothing_to_undo: 'no step to undo',
  not_your_step: 'only the person who took the step may undo it',
  undo_expired: 'too late to undo: more than 10 seconds',
  nothing_to_waive: 'nothing to waive',
  already_launched: 'already launched',
  idempotency_key_reused: 'the launch request was sent twice with different contents',
  launch_data_invalid: 'the stored launch data cannot give figures',
  position_occupied: 'another aircraft is there',
  path_blocked: 'aircraft in the way must move first',
  unknown_position: 'the ship has no such position',
  launches_pending: 'aircraft are still to launch',
  invalid_respot: 'an aircraft has two targets',
  respot_out_of_order: 'an earlier tow comes first',
  respot_out_of_date: 'the aircraft has been towed since',
  // cycles
  cycle_number_taken: 'the cycle number is taken',
  invalid_window: 'the launch window is not valid',
  wrong_state: 'not possible in the cycle’s present state',
  invalid_pilot: 'that person cannot fly it',
  aircraft_already_in_cycle: 'the aircraft is already in the cycle',
  aircraft_unserviceable: 'the aircraft is unserviceable',
  pilot_already_assigned: 'the pilot already has an aircraft in the cycle',
  ship_already_launching: 'another cycle of the ship is launching',
  outside_window: 'now is outside the launch window',
  prerequisites_not_ticked: 'a launch prerequisite is not ticked',
  invalid_wind_reading: 'the wind reading does not add up',
  night_needs_case_iii: 'a night cycle flies Case III',
  night_by_position: 'the sun at the ship’s position says otherwise',
  // imports
  file_missing: 'no file was sent',
  file_too_large: 'the file is too large',
  not_csv: 'not a CSV file',
  header_too_wide: 'the header row is too wide',
  target_not_found: 'nothing to import into',
  upload_not_found: 'the upload is no longer kept',
  upload_not_importable: 'the file has problems to fix first',
  import_out_of_date: 'the cycle changed first',
  // auth
  invalid_credentials: 'wrong e-mail or password',
  unauthenticated: 'not signed in',
  session_invalid: 'the session has expired',
  session_ended: 'the session was ended',
  forbidden_role: 'not allowed for your role',
  wrong_password: 'the current password is wrong',
  password_unchanged: 'the new password is the old one',
  weak_password: 'the password is too easy to guess',
  too_many_attempts: 'too many attempts',
  refresh_refused: 'the session was not renewed',
  // users
  user_not_found: 'person not found',
  email_taken: 'the e-mail address is taken',
  invalid_binding: 'the role does not fit the squadron or catapult given',
  unknown_reference: 'it names something that does not exist',
  self_change: 'you cannot do this to your own account',
  cannot_invite: 'the person has already chosen a password',
  // password links
  link_invalid: 'the link is not valid',
  // fleet
  ship_not_found: 'ship not found',
  ship_required: 'choose a ship',
  catapult_not_found: 'catapult not found',
  invalid_configuration: 'not a valid ship layout',
  readiness_step_in_use: 'an aircraft stands at a step the list leaves out',
  spot_in_use: 'the spot is in use',
  deck_layout_invalid: 'the deck layout cannot be used',
  aircraft_not_found: 'aircraft not found',
  side_number_taken: 'the side number is taken',
  aircraft_in_use: 'the aircraft is in use',
  aircraft_type_not_found: 'aircraft type not found',
  designation_taken: 'the designation is taken',
  invalid_launch_data: 'the launch data is not valid',
  aircraft_type_in_use: 'the aircraft type is in use',
  squadron_not_found: 'squadron not found',
  code_taken: 'the squadron code is taken',
  squadron_in_use: 'the squadron is in use',
  // reports
  invalid_date_range: 'the dates are not a valid range',
  // socket
  origin_refused: 'this page may not connect to Catline',
  ack_required: 'the request was sent without waiting for an answer',
  // request form
  json_too_deep: 'the request is nested too deep',
  invalid_id: 'not a valid id',
  // any request
  validation_failed: 'some values are not valid',
  bad_request: 'the request is not valid',
  unauthorized: 'not signed in',
  forbidden: 'not allowed',
  conflict: 'it conflicts with what the server holds',
  payload_too_large: 'too large',
  method_not_allowed: 'the server does not take this request there',
  too_many_requests: 'too many requests',
  unavailable: 'the server is unavailable',
  error: 'the server could not do it',
  database_unavailable: 'the database is not answering',
  database_busy: 'the database was busy',
  internal_error: 'a server error',
};

const isRefusalCode = (code: string): code is RefusalCode => Object.hasOwn(REASONS, code);

/** Why, in a few words: the same words a refusal of that code gives. */
export const refusalReason = (code: RefusalCode): string => REASONS[code];

/**
 * The notice for a refused `action` (e.g. "Moving 104"), chosen by the server's code; `message` is the
 * server's own sentence, which names the figures. An unknown code (no answer at all) says only that it
 * did not go through.
 */
export function refusalText(action: string, refusal: { code: string; message: string }): RefusalText {
  const { code, message } = refusal;
  if (!isRefusalCode(code)) return { title: `${action} did not go through`, message };
  const next = CHANGED_FIRST[code];
  if (next) return { title: `${action} refused: ${REASONS[code]}`, message: `${message} ${next}` };
  if (NOT_DONE.has(code)) return { title: `${action} did not go through: ${REASONS[code]}`, message };
  return { title: `${action} refused: ${REASONS[code]}`, message };
}
