import type { LandingAreaState, RespotView } from './deck.js';

export const CYCLE_STATES = ['planning', 'executing', 'closed'] as const;
export type CycleState = (typeof CYCLE_STATES)[number];

export const WEATHER_CASES = ['I', 'II', 'III'] as const;
export type WeatherCase = (typeof WEATHER_CASES)[number];

/** What air operations sets for a cycle; every launch figure depends on it. */
export interface CycleConditions {
  shipCourseDeg: number;
  shipSpeedKt: number;
  /** Direction the true wind blows from, degrees true. */
  trueWindFromDeg: number;
  trueWindSpeedKt: number;
  temperatureC: number;
  pressureHpa: number;
  weatherCase: WeatherCase;
  night: boolean;
}

export interface CycleView extends CycleConditions {
  id: number;
  shipId: number;
  number: number;
  /** ISO 8601 instants. */
  plannedLaunchAt: string;
  windowStartAt: string;
  windowEndAt: string;
  state: CycleState;
  /** Set by the air boss or the handler; the catapults inside it pause unless clear (`isLandingAreaInUse`). */
  landingArea: LandingAreaState;
  /** Why the landing area is fouled, or a note on the recovery; null when none. */
  landingAreaReason: string | null;
  /** The respot for the coming recovery, once the handler has built one after the last launch. */
  respot: RespotView | null;
  /** Bumped by one with every accepted change; orders the change log and broadcasts. */
  version: number;
  slotCount: number;
  launchedCount: number;
  /** The gust and the lull of the wind reading in force, as true winds; the lull is what the headwind rests on. */
  windGustFromDeg: number;
  windGustKt: number;
  windLullFromDeg: number;
  windLullKt: number;
  /** When the wind reading in force was taken (ISO 8601). */
  windReadAt: string;
  /** When that reading turns stale by the ship profile's age (ISO 8601); every station flags it from then. */
  windStaleAt: string;
  /** The ship's position for the cycle, degrees north and east; null when not given (night is then as entered). */
  latitudeDeg: number | null;
  longitudeDeg: number | null;
  /** The ship's time zone (IANA name) every time of the cycle is shown in. */
  timeZone: string;
  /** The ship profile's launch prerequisites in its order, each with the air boss's tick for this cycle. */
  launchPrerequisites: LaunchPrerequisiteView[];
}

/** A tick the air boss gave a launch prerequisite of a cycle: who and when (ISO 8601). */
export interface LaunchPrerequisiteTick {
  name: string;
  tickedBy: string;
  tickedAt: string;
}

/** One launch prerequisite of a cycle; `tickedBy` and `tickedAt` are null while it is not ticked. */
export interface LaunchPrerequisiteView {
  name: string;
  ticked: boolean;
  tickedBy: string | null;
  tickedAt: string | null;
}

/** The air boss ticks (or unticks) one launch prerequisite of a cycle in planning. */
export interface SetLaunchPrerequisiteRequest extends CycleCommandRequest {
  ticked: boolean;
}

/**
 * The cycle a person's screens open on when the address names none (GET /cycles/landing): a pilot's
 * cycle holds their slot, a catapult crew's launches their catapult, everyone else's is the ship's
 * launching cycle, else the next planned. Null when the ship has no cycle.
 */
export interface CycleLanding {
  cycleId: number | null;
}

/** The wind reading is older than the ship allows: flagged on every station, a waivable launch gate. */
export const isWindReadingStale = (cycle: Pick<CycleView, 'windStaleAt'>, now: Date): boolean =>
  now.getTime() >= Date.parse(cycle.windStaleAt);

/**
 * A new wind reading with a change of conditions: either across the deck (relative bearing and speed)
 * or the true wind (`trueWindFromDeg`, `trueWindSpeedKt`), with an optional gust and lull in the same
 * frame (left out, the steady speed). The other frame is computed with the ship's course and speed.
 */
export interface WindReadingFields {
  /** Where the wind blows from off the bow, degrees, negative to port. */
  relativeWindBearingDeg?: number;
  relativeWindSpeedKt?: number;
  windGustKt?: number;
  windLullKt?: number;
  /** When the reading was taken (ISO 8601), if before it is entered; left out, now. Never in the future. */
  windReadAt?: string;
}

/** The ship's position; with it, night is worked out from the sun at the planned launch. */
export interface SeaPositionFields {
  latitudeDeg?: number;
  longitudeDeg?: number;
}

export interface CreateCycleRequest extends CycleConditions, SeaPositionFields {
  shipId: number;
  number: number;
  plannedLaunchAt: string;
  windowStartAt: string;
  windowEndAt: string;
}

export type UpdateCycleConditionsRequest = Partial<CycleConditions> &
  WindReadingFields &
  SeaPositionFields & {
    plannedLaunchAt?: string;
    windowStartAt?: string;
    windowEndAt?: string;
    /** The cycle version the change was based on. */
    basisVersion: number;
  };

/** Stopping or closing a cycle: the cycle version the command was based on. */
export interface CycleCommandRequest {
  basisVersion: number;
}

/** The air boss starts launching; outside the launch window only once confirmed. */
export interface StartCycleRequest extends CycleCommandRequest {
  /** Start although now is outside the launch window (asked again after the `outside_window` warning). */
  confirmOutsideWindow?: boolean;
}

/** Adds an aircraft to a cycle's deck pool. */
export interface AddSlotRequest {
  aircraftId: number;
  pilotId?: number | null;
  mission: string;
  fuelLb: number;
  stores: string;
  grossWeightLb: number;
  tanker: boolean;
  earlyWarning: boolean;
  spare: boolean;
}
