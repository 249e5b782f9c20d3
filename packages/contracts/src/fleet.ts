import type { Role } from './roles.js';

export type CatapultPosition = 'bow' | 'waist';
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
}

export interface DeckSpot {
  name: string;
  /** Taxi time from this spot to each catapult, seconds, keyed by catapult number. */
  taxiS: Record<number, number>;
}

/** The ship's own after-the-shot profile: data the ship writes, not code. */
export interface ShipProfile {
  /** Clearing turn off a bow and a waist catapult by day, degrees; positive to starboard. */
  clearingTurnDeg: Record<CatapultPosition, number>;
  /** Departure instruction per weather case. */
  departures: Record<'I' | 'II' | 'III', string>;
}

export interface ShipView {
  id: number;
  name: string;
  hullCode: string;
  /** Minimum time between launches of the two catapults of a pair, seconds. */
  pairGapS: number;
  profile: ShipProfile;
  deckSpots: DeckSpot[];
  catapults: CatapultView[];
}

export interface SquadronView {
  id: number;
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

export interface AircraftTypeView {
  id: number;
  designation: string;
  name: string;
  maxGrossWeightLb: number;
  crosswindLimitKt: number;
  thrustLbf: number;
  requiredExcessKt: number;
  afterburnerFromLb: number | null;
  trimBands: TrimBand[];
  launchTable: LaunchTableRow[];
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
