// The limits of request fields, defined once: the API's DTOs (class-validator) and imports enforce
// them, the web's form schemas (zod) check them before sending, so a form refuses what the server would.

/** Both ends included. */
export interface Range {
  min: number;
  max: number;
}

/** Painted on the aircraft: letters, digits or dashes. */
export const SIDE_NUMBER_MAX_LENGTH = 8;
export const SIDE_NUMBER_PATTERN = new RegExp(`^[A-Za-z0-9-]{1,${SIDE_NUMBER_MAX_LENGTH}}$`);

/** A squadron's short code: letters, digits or dashes. */
export const SQUADRON_CODE_MAX_LENGTH = 12;
export const SQUADRON_CODE_PATTERN = new RegExp(`^[A-Za-z0-9-]{1,${SQUADRON_CODE_MAX_LENGTH}}$`);

/** Names of people, squadrons and aircraft types. */
export const NAME_MAX_LENGTH = 120;
export const TYPE_DESIGNATION_MAX_LENGTH = 20;
/** A holdback release element's designation, as marked on it: letters, digits, dashes or dots. */
export const HOLDBACK_ELEMENT_MAX_LENGTH = 20;
export const HOLDBACK_ELEMENT_PATTERN = new RegExp(`^[A-Za-z0-9][A-Za-z0-9.-]{0,${HOLDBACK_ELEMENT_MAX_LENGTH - 1}}$`);
/** The longest address SMTP carries (RFC 5321 § 4.5.3.1.3, path of 256 less the angle brackets). */
export const EMAIL_MAX_LENGTH = 254;

// Length rules from the OWASP Authentication Cheat Sheet: at least 12 characters when there is no
// second factor, and a generous maximum so pass phrases fit.
export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 128;

/** A sortie of the air plan. */
export const MISSION_MAX_LENGTH = 60;
export const STORES_MAX_LENGTH = 120;
/** Whole pounds. */
export const FUEL_LB: Range = { min: 0, max: 100_000 };
/** Whole pounds; also the range of a weight the pilot and the catapult officer agree. */
export const GROSS_WEIGHT_LB: Range = { min: 1, max: 200_000 };

/** A type's stores catalogue: items, the name of one, and one item's weight in whole pounds. */
export const STORES_CATALOGUE_MAX_ITEMS = 40;
export const STORES_ITEM_NAME_MAX_LENGTH = 60;
export const STORES_ITEM_WEIGHT_LB: Range = { min: 1, max: 20_000 };
/** A slot's stores list: lines, and how many of one item a line loads. */
/** Tables per type: a few catapults times the configurations; rows per table. */
export const SETTING_TABLES_MAX = 24;
export const SETTING_TABLE_ROWS_MAX = 60;
/** A whole-number catapult setting, in an approved table or read back from the console. */
export const CATAPULT_SETTING: Range = { min: 0, max: 999 };

export const STORES_LINES_MAX = 20;
export const STORES_COUNT: Range = { min: 1, max: 99 };

/** A cycle's number in the ship's flying day. */
export const CYCLE_NUMBER: Range = { min: 1, max: 9999 };

/** What air operations may set for a cycle's conditions, with the unit each is in. */
export const CONDITION_RANGES = {
  shipCourseDeg: { min: 0, max: 360 },
  shipSpeedKt: { min: 0, max: 40 },
  trueWindFromDeg: { min: 0, max: 360 },
  trueWindSpeedKt: { min: 0, max: 80 },
  temperatureC: { min: -40, max: 55 },
  pressureHpa: { min: 870, max: 1085 },
  /** Where the relative wind blows from off the bow, negative to port. */
  relativeWindBearingDeg: { min: -180, max: 180 },
  relativeWindSpeedKt: { min: 0, max: 120 },
  windGustKt: { min: 0, max: 120 },
  windLullKt: { min: 0, max: 120 },
  latitudeDeg: { min: -90, max: 90 },
  longitudeDeg: { min: -180, max: 180 },
} as const satisfies Record<string, Range>;

/** An aircraft type's figures; the pound and pound-force figures are whole (a minimum of 1: positive). */
export const AIRCRAFT_TYPE_RANGES = {
  maxGrossWeightLb: { min: 1, max: 1_000_000 },
  operatingWeightLb: { min: 1, max: 1_000_000 },
  maxEndSpeedKt: { min: 1, max: 400 },
  crosswindLimitKt: { min: 0, max: 100 },
  thrustLbf: { min: 0, max: 1_000_000 },
  requiredExcessKt: { min: 0, max: 100 },
  afterburnerFromLb: { min: 1, max: 1_000_000 },
} as const satisfies Record<string, Range>;
