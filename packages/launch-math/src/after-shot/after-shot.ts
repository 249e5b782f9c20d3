import type { CatapultPosition } from '../catapult/end-speed.js';
import { degrees, type Degrees, type Feet, type Knots, type NauticalMiles } from '../units/units.js';
import type { WeatherCase } from './weather-case.js';

export type TurnDirection = 'left' | 'right' | 'none';

/** The kinds of aircraft a ship writes its departures for: a helicopter does not fly a jet's climb-out. */
export type AircraftClass = 'jet' | 'turboprop' | 'helicopter';

/** The turn the aircraft makes right after the shot to clear the ship's bow. */
export interface ClearingTurn {
  readonly direction: TurnDirection;
  /** Heading change, degrees; 0 with direction `none`. */
  readonly degrees: Degrees;
}

/** The departure a pilot flies after the clearing turn, as the ship's procedures write it. */
export interface DepartureInstruction {
  /** The instruction in words, shown to the pilot as written. */
  readonly summary: string;
  /** Altitude to hold after the clearing turn, feet; null when not restricted. */
  readonly altitude: Feet | null;
  /** Range from the ship (nautical miles) until which the altitude is held; null when not restricted. */
  readonly untilRange: NauticalMiles | null;
  /** Speed to hold, knots; null when not restricted. */
  readonly speed: Knots | null;
}

/** The ship's own after-the-shot rules: data entered by the user, not code. */
export interface ShipProfile {
  /** The turn off each kind of catapult in cases I and II; case III flies straight ahead. */
  readonly clearingTurns: Readonly<Record<CatapultPosition, ClearingTurn>>;
  readonly departures: Readonly<Record<WeatherCase, Readonly<Record<AircraftClass, DepartureInstruction>>>>;
}

/** What the pilot does after the shot. */
export interface AfterTheShot {
  readonly clearingTurn: ClearingTurn;
  readonly departure: DepartureInstruction;
}

export const NO_CLEARING_TURN: ClearingTurn = { direction: 'none', degrees: degrees(0) };

/**
 * The clearing turn off a catapult in this position: the ship profile's turn by catapult side in cases I
 * and II; none in case III, by day or by night, where the departure starts straight off the bow.
 */
export const clearingTurn = (ship: ShipProfile, position: CatapultPosition, weather: WeatherCase): ClearingTurn =>
  weather === 'III' ? NO_CLEARING_TURN : ship.clearingTurns[position];

/** The departure an aircraft of this class flies in the weather case, from the ship's profile. */
export const departureFor = (
  ship: ShipProfile,
  weather: WeatherCase,
  aircraftClass: AircraftClass,
): DepartureInstruction => ship.departures[weather][aircraftClass];

/** Clearing turn and departure together, as a pilot's launch card shows them. */
export function afterTheShot(
  ship: ShipProfile,
  launch: {
    readonly position: CatapultPosition;
    readonly weatherCase: WeatherCase;
    readonly aircraftClass: AircraftClass;
  },
): AfterTheShot {
  return {
    clearingTurn: clearingTurn(ship, launch.position, launch.weatherCase),
    departure: departureFor(ship, launch.weatherCase, launch.aircraftClass),
  };
}
