import { LaunchMathInputError, requireNonNegative, requirePositive } from '../errors.js';
import { pounds, poundsToKilograms, type Kilograms, type Pounds } from '../units/units.js';

/** One line of an aircraft's stores: an item of its type's catalogue and how many are loaded. */
export interface StoresLine {
  /** The catalogue item's name, as the launch data gives it. */
  readonly name: string;
  /** Weight of one item, lb. */
  readonly weightEach: Pounds;
  /** Items loaded: a whole number, zero or more. */
  readonly count: number;
}

/** What an aircraft weighs as loaded, before the catapult crew and the pilot agree it. */
export interface LoadedAircraft {
  /** The type's operating weight with its crew (empty of fuel and stores), lb. */
  readonly operatingWeight: Pounds;
  /** Fuel on board, lb. */
  readonly fuel: Pounds;
  readonly stores: readonly StoresLine[];
}

/** A stores line with its weight. */
export interface StoresLineWeight extends StoresLine {
  /** `weightEach × count`, lb. */
  readonly weight: Pounds;
}

/** Gross weight and the parts it is made of, so a screen can show how it was reached. */
export interface GrossWeightBuildUp {
  readonly operatingWeight: Pounds;
  readonly fuel: Pounds;
  readonly stores: readonly StoresLineWeight[];
  /** Sum of the stores lines, lb. */
  readonly storesWeight: Pounds;
  /** Operating weight + fuel + stores, lb. */
  readonly grossWeight: Pounds;
  /** The gross weight in kilograms (1 lb = 0.45359237 kg). */
  readonly grossWeightKg: Kilograms;
}

/**
 * Gross weight = operating weight of the type (with crew) + fuel on board + every stores line
 * (weight each × count). The launch settings then take this figure as the planned weight.
 */
export function grossWeightBuildUp(aircraft: LoadedAircraft): GrossWeightBuildUp {
  requirePositive(aircraft.operatingWeight, 'operating weight');
  requireNonNegative(aircraft.fuel, 'fuel on board');
  const stores = aircraft.stores.map((line) => {
    requireNonNegative(line.weightEach, `weight of one ${line.name}`);
    if (!Number.isInteger(line.count) || line.count < 0) {
      throw new LaunchMathInputError(`the count of ${line.name} must be a whole number, got ${line.count}`);
    }
    return { ...line, weight: pounds(line.weightEach * line.count) };
  });
  const storesWeight = pounds(stores.reduce((sum, line) => sum + line.weight, 0));
  const grossWeight = pounds(aircraft.operatingWeight + aircraft.fuel + storesWeight);
  return {
    operatingWeight: aircraft.operatingWeight,
    fuel: aircraft.fuel,
    stores,
    storesWeight,
    grossWeight,
    grossWeightKg: poundsToKilograms(grossWeight),
  };
}
