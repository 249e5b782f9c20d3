import type { LandingAreaState } from './deck.js';

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
  /** While the landing area is in use the waist catapults are closed. */
  landingAreaInUse: boolean;
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
  /** Set by the air boss (or air operations) or the handler; `landingAreaInUse` is true unless clear. */
  landingArea: LandingAreaState;
  /** Why the landing area is fouled, or a note on the recovery; null when none. */
  landingAreaReason: string | null;
  /** Bumped by one with every accepted change; orders the change log and broadcasts. */
  version: number;
  slotCount: number;
  launchedCount: number;
}

export interface CreateCycleRequest extends CycleConditions {
  shipId: number;
  number: number;
  plannedLaunchAt: string;
  windowStartAt: string;
  windowEndAt: string;
}

export type UpdateCycleConditionsRequest = Partial<CycleConditions> & {
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
