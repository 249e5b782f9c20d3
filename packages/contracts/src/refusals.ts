// Every code a refusal (ApiError.code, or a socket acknowledgement's `code`) can carry, by the part
// of Catline that refuses. The server's exceptions take their code types from here, and the web app
// picks a refusal's title by code, so a new code must be added here first.

/** Commands on a cycle's lineup and its readiness steps (HTTP and socket). */
export const LINEUP_REFUSAL_CODES = [
  'not_found',
  'invalid_lineup',
  /** The command was based on a version someone else changed first. */
  'stale_basis',
  'no_change',
  'cycle_closed',
  'cycle_not_executing',
  'slot_not_movable',
  'spare_unavailable',
  'spare_held',
  'invalid_pilot',
  /** An aircraft without a pilot cannot join a catapult's order: it would wait there for a pilot forever. */
  'pilot_missing',
  'agreement_required',
  'reason_required',
  /** A stores item the aircraft's type does not list in its catalogue, or one named twice. */
  'stores_not_in_catalogue',
  /** Fuel and stores set on an aircraft whose type has no operating weight in the launch data. */
  'operating_weight_missing',
  'not_your_catapult',
  'not_your_slot',
  'not_current_aircraft',
  'wrong_step',
  'weight_not_agreed',
  'weight_mismatch',
  /** The setting step without the figure read on the catapult's console. */
  'setting_not_read_back',
  /** The setting read back from the console is not the approved one for the agreed weight. */
  'setting_mismatch',
  /** Marking a catapult down under an aircraft: a warning the handler confirms by asking again. */
  'aircraft_on_catapult',
  // The launch gates (launch-math's launchGates): the launch command refuses with the first one closed.
  'catapult_down',
  'catapult_closed',
  'deck_not_clear',
  'reverify_required',
  'over_max_gross_weight',
  'crosswind_over_limit',
  'outside_launch_table',
  'approved_setting_missing',
  'end_speed_below_minimum',
  'end_speed_over_max',
  'excess_below_recommended',
  'wind_reading_stale',
  /** Undo of a readiness step: none to undo, someone else's step, or more than 10 s ago. */
  'nothing_to_undo',
  'not_your_step',
  'undo_expired',
  /** A waiver for a soft gate that is open: there is nothing to waive. */
  'nothing_to_waive',
  'already_launched',
  'idempotency_key_reused',
  'launch_data_invalid',
  /** A tow into a position another aircraft holds. */
  'position_occupied',
  /** A tow out of, or into, a spot behind aircraft that must move first. */
  'path_blocked',
  'unknown_position',
  /** A respot while aircraft are still to launch. */
  'launches_pending',
  /** A respot that gives one aircraft two targets. */
  'invalid_respot',
  /** A respot tow ticked off before an earlier one. */
  'respot_out_of_order',
  /** A respot tow whose aircraft was towed elsewhere since the respot was built. */
  'respot_out_of_date',
] as const;
export type LineupRefusalCode = (typeof LINEUP_REFUSAL_CODES)[number];

/** Creating, starting and closing cycles and adding aircraft to them. */
export const CYCLE_REFUSAL_CODES = [
  'not_found',
  'cycle_number_taken',
  'invalid_window',
  'wrong_state',
  'invalid_pilot',
  'aircraft_already_in_cycle',
  'aircraft_unserviceable',
  'pilot_already_assigned',
  /** Another cycle of the same ship is launching: one launching cycle per ship. */
  'ship_already_launching',
  /** Starting outside the launch window: a warning the air boss confirms by asking again. */
  'outside_window',
  /** Starting while a launch prerequisite of the ship profile is not ticked by the air boss. */
  'prerequisites_not_ticked',
  /** Half a wind reading, both frames at once, or a lull above the steady speed or a gust below it. */
  'invalid_wind_reading',
  /** Night by the sun at the cycle's position, or entered as night, with a case other than III. */
  'night_needs_case_iii',
  /** A night flag that the sun at the cycle's position contradicts. */
  'night_by_position',
] as const;
export type CycleRefusalCode = (typeof CYCLE_REFUSAL_CODES)[number];

/** Uploads and their confirmation. */
export const IMPORT_REFUSAL_CODES = [
  'file_missing',
  'file_too_large',
  'not_csv',
  'header_too_wide',
  'target_not_found',
  'upload_not_found',
  'upload_not_importable',
  /** The cycle changed between the preview and the confirm. */
  'import_out_of_date',
] as const;
export type ImportRefusalCode = (typeof IMPORT_REFUSAL_CODES)[number];

/** Sign-in, sessions, passwords and role checks. */
export const AUTH_REFUSAL_CODES = [
  'invalid_credentials',
  'unauthenticated',
  'session_invalid',
  'session_ended',
  'forbidden_role',
  'wrong_password',
  'password_unchanged',
  'too_many_attempts',
  'refresh_refused',
] as const;
export type AuthRefusalCode = (typeof AUTH_REFUSAL_CODES)[number];

/** People and their invitations. */
export const USER_REFUSAL_CODES = [
  'user_not_found',
  'email_taken',
  'invalid_binding',
  'unknown_reference',
  'self_change',
  'cannot_invite',
] as const;
export type UserRefusalCode = (typeof USER_REFUSAL_CODES)[number];

/** A new password (a person created with one, a change, a reset or invitation link). */
export const PASSWORD_REFUSAL_CODES = [
  /** Too easy to guess: a common password, a pattern, or made of the person's e-mail or name. */
  'weak_password',
] as const;
export type PasswordRefusalCode = (typeof PASSWORD_REFUSAL_CODES)[number];

/** Invitation and password-reset links. */
export const PASSWORD_LINK_REFUSAL_CODES = ['link_invalid'] as const;
export type PasswordLinkRefusalCode = (typeof PASSWORD_LINK_REFUSAL_CODES)[number];

/** The fleet: ships and catapults, aircraft, aircraft types, squadrons. */
export const SHIP_REFUSAL_CODES = [
  'ship_not_found',
  /** A fleet admin adding a ship's person, squadron or type must say which ship. */
  'ship_required',
  'catapult_not_found',
  'invalid_configuration',
  'spot_in_use',
  /** A new list of readiness steps leaves out the step an aircraft of an open cycle stands at. */
  'readiness_step_in_use',
  /** The deck layout breaks a rule of the deck (launch-math's deckLayoutProblems); `details` lists each. */
  'deck_layout_invalid',
] as const;
export type ShipRefusalCode = (typeof SHIP_REFUSAL_CODES)[number];

export const AIRCRAFT_REFUSAL_CODES = [
  'aircraft_not_found',
  'side_number_taken',
  'unknown_reference',
  'aircraft_in_use',
] as const;
export type AircraftRefusalCode = (typeof AIRCRAFT_REFUSAL_CODES)[number];

export const AIRCRAFT_TYPE_REFUSAL_CODES = [
  'aircraft_type_not_found',
  'designation_taken',
  'invalid_launch_data',
  'aircraft_type_in_use',
] as const;
export type AircraftTypeRefusalCode = (typeof AIRCRAFT_TYPE_REFUSAL_CODES)[number];

export const SQUADRON_REFUSAL_CODES = ['squadron_not_found', 'code_taken', 'squadron_in_use'] as const;
export type SquadronRefusalCode = (typeof SQUADRON_REFUSAL_CODES)[number];

/** Reports. */
export const REPORT_REFUSAL_CODES = ['invalid_date_range'] as const;
export type ReportRefusalCode = (typeof REPORT_REFUSAL_CODES)[number];

/** The socket connection and its events, before any feature's rules. */
export const GATEWAY_REFUSAL_CODES = [
  'origin_refused',
  'unauthenticated',
  'session_invalid',
  'forbidden_role',
  'ack_required',
] as const;
export type GatewayRefusalCode = (typeof GATEWAY_REFUSAL_CODES)[number];

/** A request refused for its form (a body nested too deep, an id not in digits) before any feature reads it. */
export const REQUEST_REFUSAL_CODES = ['json_too_deep', 'invalid_id'] as const;
export type RequestRefusalCode = (typeof REQUEST_REFUSAL_CODES)[number];

/** What the server's error filters answer for a request no feature refused by name. */
export const GENERIC_REFUSAL_CODES = [
  'validation_failed',
  'bad_request',
  'unauthorized',
  'forbidden',
  'not_found',
  'conflict',
  'payload_too_large',
  /** The path exists, but not with this method (the answer's Allow header lists the ones it takes). */
  'method_not_allowed',
  'too_many_requests',
  'unavailable',
  'error',
  'database_unavailable',
  'database_busy',
  'internal_error',
] as const;
export type GenericRefusalCode = (typeof GENERIC_REFUSAL_CODES)[number];

/** Every refusal code, by family. */
export const REFUSAL_CODE_FAMILIES = {
  lineup: LINEUP_REFUSAL_CODES,
  cycles: CYCLE_REFUSAL_CODES,
  imports: IMPORT_REFUSAL_CODES,
  auth: AUTH_REFUSAL_CODES,
  users: USER_REFUSAL_CODES,
  passwords: PASSWORD_REFUSAL_CODES,
  passwordLinks: PASSWORD_LINK_REFUSAL_CODES,
  ships: SHIP_REFUSAL_CODES,
  aircraft: AIRCRAFT_REFUSAL_CODES,
  aircraftTypes: AIRCRAFT_TYPE_REFUSAL_CODES,
  squadrons: SQUADRON_REFUSAL_CODES,
  reports: REPORT_REFUSAL_CODES,
  gateway: GATEWAY_REFUSAL_CODES,
  request: REQUEST_REFUSAL_CODES,
  generic: GENERIC_REFUSAL_CODES,
} as const;
export type RefusalFamily = keyof typeof REFUSAL_CODE_FAMILIES;
export type RefusalCode = (typeof REFUSAL_CODE_FAMILIES)[RefusalFamily][number];
