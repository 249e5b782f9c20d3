import type { WeatherCase } from './cycles.js';
import type { ReadinessStep } from './lineup.js';
import type { Role } from './roles.js';

export type CatapultPosition = 'bow' | 'waist';

/** The kinds of aircraft the ship's departures are written for: each flies its own after the launch. */
export const AIRCRAFT_CLASSES = ['jet', 'turboprop', 'helicopter'] as const;
export type AircraftClass = (typeof AIRCRAFT_CLASSES)[number];

/** The class a type has unless the admin says otherwise. */
export const DEFAULT_AIRCRAFT_CLASS: AircraftClass = 'jet';
export type CatapultStatus = 'up' | 'down';

export interface CatapultView {
  id: number;
  shipId: number;
  /** 1 to 4. */
  number: number;
  position: CatapultPosition;
  /** Axis angle relative to the ship's heading, degrees; negative to port. */
  axisAngleDeg: number;
  strokeM: number;
  /** Energy delivered at the lowest and highest setting, megajoules. */
  energyMinMj: number;
  energyMaxMj: number;
  /** Number of discrete settings between minimum and maximum energy. */
  settingCount: number;
  /** Launch to next launch on this catapult, seconds. */
  resetIntervalS: number;
  /** Catapults with the same pair number share the minimum pair gap. */
  pair: number;
  status: CatapultStatus;
  shotCount: number;
  /**
   * The readiness steps this catapult runs when they differ from the ship's (a waist catapult, say),
   * under the same rules as the ship's list; null when it runs the ship's.
   */
  readinessSteps: ReadinessStep[] | null;
}

export interface DeckSpot {
  name: string;
  /** The named deck area the spot belongs to; a spot without one stands alone. */
  area?: string;
  /** Spots in front of this one in its row, which must be clear before an aircraft here can taxi out. */
  clearBefore?: string[];
  /** Taxi time from this spot to each catapult, seconds, keyed by catapult number. */
  taxiS: Record<number, number>;
}

export interface ElevatorLayout {
  name: string;
  /** One trip between the hangar deck and the flight deck, seconds. */
  cycleS: number;
  /** Taxi time from the elevator at flight-deck level to each catapult, seconds, keyed by catapult number. */
  taxiS: Record<number, number>;
}

export interface HangarBayLayout {
  name: string;
  /** Names of the elevators that serve the bay. */
  elevators: string[];
}

/** The rest of the ship's deck besides its spots. */
export interface DeckLayout {
  elevators: ElevatorLayout[];
  hangarBays: HangarBayLayout[];
  /** Numbers of the catapults inside the landing area (the waist catapults by default). */
  landingAreaCatapults: number[];
}

/**
 * PUT /ships/:shipId/deck-layout: the whole deck, replacing the one held: the spots (grouped in areas, with
 * their clear-before order and taxi times) and the rest of the layout.
 */
export interface ReplaceDeckLayoutRequest extends DeckLayout {
  deckSpots: DeckSpot[];
}

/** The ship's own after-the-shot profile: data the ship writes, not code. */
export interface ShipProfile {
  /** Clearing turn off a bow and a waist catapult in cases I and II (none in case III), degrees; positive to starboard. */
  clearingTurnDeg: Record<CatapultPosition, number>;
  /** Departure instruction per weather case and aircraft class, as the ship writes it. */
  departures: Record<WeatherCase, Record<AircraftClass, string>>;
  /**
   * The readiness steps the ship runs, a subset of READINESS_STEPS in its order with on_catapult,
   * weight_agreed, setting_set and tensioned in; left out, every step.
   */
  readinessSteps?: ReadinessStep[];
  /** How old a wind reading may be before every station flags it stale, minutes; left out, 30. */
  windReadingMaxAgeMin?: number;
  /**
   * How many settings the energy model's estimate may differ from the approved setting before the Cat
   * station flags the difference; left out, DEFAULT_SETTING_CROSS_CHECK_TOLERANCE.
   */
  settingCrossCheckTolerance?: number;
  /** The time zone the ship keeps, an IANA name ("Pacific/Guam"); every time is shown in it. Left out, UTC. */
  timeZone?: string;
  /**
   * What must be done before a cycle starts launching, in the ship's short words ("Rescue helicopter
   * airborne"); the air boss ticks each per cycle. Left out, none.
   */
  launchPrerequisites?: string[];
}

/** A wind reading is stale this long after it was taken unless the ship profile says otherwise, minutes. */
export const DEFAULT_WIND_READING_MAX_AGE_MIN = 30;

/**
 * Settings the energy model's estimate may differ from the approved setting unflagged unless the ship
 * profile says otherwise: two steps, room for the model's rounding and a hot or cold day (our own choice).
 */
export const DEFAULT_SETTING_CROSS_CHECK_TOLERANCE = 2;

/** The zone times are shown in unless the ship profile names one. */
export const DEFAULT_SHIP_TIME_ZONE = 'UTC';

export interface ShipView {
  id: number;
  name: string;
  hullCode: string;
  /** Minimum time between launches of the two catapults of a pair, seconds. */
  pairGapS: number;
  profile: ShipProfile;
  deckSpots: DeckSpot[];
  deckLayout: DeckLayout;
  catapults: CatapultView[];
}

export interface SquadronView {
  id: number;
  /** The ship the squadron belongs to: a fleet admin's forms offer it only for that ship. */
  shipId: number;
  name: string;
  code: string;
  email: string;
}

export interface TrimBand {
  /** Upper gross-weight bound of the band, lb; null for the last band. */
  upToLb: number | null;
  trimDeg: number;
}

export interface LaunchTableRow {
  grossWeightLb: number;
  minLaunchAirspeedKt: number;
}

/** Which approved setting table a launch reads: an aircraft carrying no stores launches clean. */
export const LAUNCH_CONFIGURATIONS = ['clean', 'stores'] as const;
export type LaunchConfiguration = (typeof LAUNCH_CONFIGURATIONS)[number];

/** Every gross weight up to `upToLb` (inclusive) takes `setting`. */
export interface SettingTableRow {
  upToLb: number;
  setting: number;
}

/**
 * The ship's approved catapult settings for the type on one catapult in one configuration: the
 * setting the Cat station shows, which Catline's energy model only cross-checks.
 */
export interface SettingTable {
  catapultNumber: number;
  configuration: LaunchConfiguration;
  /** The excess wind over deck the launch data recommends, knots. */
  recommendedExcessKt: number;
  /** By strictly rising weight; a heavier weight than the last row has no approved setting. */
  rows: SettingTableRow[];
}

/** PUT /aircraft-types/:id/setting-tables: every table of the type, replacing those held. */
export interface ReplaceSettingTablesRequest {
  tables: SettingTable[];
}

/** An item of a type's stores catalogue: what the launch data says one of it weighs. */
export interface StoresItem {
  /** Unique within the type's catalogue (letter case aside). */
  name: string;
  /** Weight of one item, whole pounds. */
  weightEachLb: number;
}

export interface AircraftTypeView {
  id: number;
  /** The ship whose launch data this is: a fleet admin's forms offer it only for that ship. */
  shipId: number;
  designation: string;
  name: string;
  /** Which of the ship profile's departures its aircraft fly. */
  aircraftClass: AircraftClass;
  maxGrossWeightLb: number;
  /** Operating weight with crew, empty of fuel and stores, lb; null until the admin enters it. */
  operatingWeightLb: number | null;
  crosswindLimitKt: number;
  thrustLbf: number;
  requiredExcessKt: number;
  afterburnerFromLb: number | null;
  /**
   * The highest end speed the airframe takes (overstress), knots; a shot that gives more is refused. Null
   * only for a type entered before the field existed: its launches are refused until the admin enters it.
   */
  maxEndSpeedKt: number | null;
  /** The holdback release element the type is launched with; null until the admin enters it. */
  holdbackElement: string | null;
  trimBands: TrimBand[];
  launchTable: LaunchTableRow[];
  /** What an aircraft of the type can carry, ordered by name. */
  storesCatalogue: StoresItem[];
  /** Ordered by catapult number, then configuration. */
  settingTables: SettingTable[];
}

/** PUT /aircraft-types/:id/stores-catalogue: the whole catalogue, replacing the one held. */
export interface ReplaceStoresCatalogueRequest {
  items: StoresItem[];
}

export interface AircraftView {
  id: number;
  sideNumber: string;
  typeId: number;
  typeDesignation: string;
  squadronId: number;
  squadronCode: string;
  /** Where it is parked, a deck spot name such as `row2-4`. */
  parkedSpot: string;
  serviceable: boolean;
  catapultShots: number;
}

export interface UserView {
  id: number;
  email: string;
  name: string;
  role: Role;
  catapultId: number | null;
  squadronId: number | null;
  active: boolean;
}

// Requests. The API's DTOs implement these and add the validation rules.

/** Where a new ship-owned row goes: the caller's own ship, left out; a fleet admin must name one. */
export interface ShipChoice {
  shipId?: number;
}

export interface CreateSquadronRequest extends ShipChoice {
  name: string;
  code: string;
  /** Where the cycle summary goes. */
  email: string;
}

export interface CreateAircraftTypeRequest extends ShipChoice {
  designation: string;
  name: string;
  /** Left out, DEFAULT_AIRCRAFT_CLASS. */
  aircraftClass?: AircraftClass;
  maxGrossWeightLb: number;
  /** Operating weight with crew, lb; null or left out while not known. */
  operatingWeightLb?: number | null;
  crosswindLimitKt: number;
  thrustLbf: number;
  requiredExcessKt: number;
  /** Null or left out when the type never needs afterburner. */
  afterburnerFromLb?: number | null;
  /** The highest end speed the airframe takes (overstress), knots. */
  maxEndSpeedKt: number;
  /** The holdback release element the type is launched with; null or left out while not known. */
  holdbackElement?: string | null;
  /** Increasing upToLb; the last band has upToLb null. */
  trimBands: TrimBand[];
  /** Ordered by strictly increasing gross weight, two rows at least. */
  launchTable: LaunchTableRow[];
}

export interface CreateAircraftRequest {
  sideNumber: string;
  typeId: number;
  squadronId: number;
  /** One of the ship's deck spot names. */
  parkedSpot: string;
  /** True when left out. */
  serviceable?: boolean;
}

export interface CreateUserRequest {
  /** The person's ship, as ShipChoice; null (a fleet admin may send it) makes a fleet admin. */
  shipId?: number | null;
  email: string;
  name: string;
  role: Role;
  /** Left out, the person is mailed an invitation link to choose one. */
  password?: string;
  /** Required for a catapult officer. */
  catapultId?: number | null;
  squadronId?: number | null;
}

export interface UpdateUserRequest {
  name?: string;
  role?: Role;
  catapultId?: number | null;
  squadronId?: number | null;
  active?: boolean;
}
