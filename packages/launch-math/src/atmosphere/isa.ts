import { LaunchMathInputError, requirePositive } from '../errors.js';
import {
  kelvin,
  kilogramsPerCubicMetre,
  knots,
  pascals,
  STANDARD_GRAVITY,
  type Kelvin,
  type KilogramsPerCubicMetre,
  metresPerSecond,
  type Knots,
  type Metres,
  type MetresPerSecond,
  type Pascals,
} from '../units/units.js';

/** Specific gas constant of dry air in J/(kg K), as the ICAO standard atmosphere fixes it. */
export const DRY_AIR_GAS_CONSTANT = 287.05287;

/** Ratio of specific heats of dry air (cp / cv), as the ICAO standard atmosphere fixes it. */
export const AIR_HEAT_CAPACITY_RATIO = 1.4;

/** ICAO standard atmosphere at mean sea level. */
export const ISA_SEA_LEVEL = {
  temperature: kelvin(288.15),
  pressure: pascals(101325),
  density: kilogramsPerCubicMetre(1.225),
} as const;

/** Temperature lapse rate of the ISA troposphere, K per metre of geopotential altitude. */
const TROPOSPHERE_LAPSE_RATE = 0.0065;
/** Top of the ISA troposphere, geopotential metres. */
const TROPOPAUSE_ALTITUDE = 11000;

/** Air density from temperature and pressure by the ideal gas law for dry air: rho = p / (R T). */
export function airDensity(temperature: Kelvin, pressure: Pascals): KilogramsPerCubicMetre {
  requirePositive(temperature, 'Temperature (K)');
  requirePositive(pressure, 'Pressure (Pa)');
  return kilogramsPerCubicMetre(pressure / (DRY_AIR_GAS_CONSTANT * temperature));
}

/** Density ratio sigma = rho / rho0, rho0 being the ISA sea-level density (dimensionless). */
export function densityRatio(density: KilogramsPerCubicMetre): number {
  requirePositive(density, 'Air density');
  return density / ISA_SEA_LEVEL.density;
}

/** The ISA troposphere at a geopotential altitude from 0 to 11,000 m: temperature, pressure, density. */
export function isaTroposphere(altitude: Metres): {
  readonly temperature: Kelvin;
  readonly pressure: Pascals;
  readonly density: KilogramsPerCubicMetre;
} {
  if (!(altitude >= 0 && altitude <= TROPOPAUSE_ALTITUDE)) {
    throw new LaunchMathInputError(
      `Altitude must be within the troposphere (0 to ${TROPOPAUSE_ALTITUDE} m), got ${altitude}`,
    );
  }
  const temperature = kelvin(ISA_SEA_LEVEL.temperature - TROPOSPHERE_LAPSE_RATE * altitude);
  const exponent = STANDARD_GRAVITY / (DRY_AIR_GAS_CONSTANT * TROPOSPHERE_LAPSE_RATE);
  const pressure = pascals(ISA_SEA_LEVEL.pressure * (temperature / ISA_SEA_LEVEL.temperature) ** exponent);
  return { temperature, pressure, density: airDensity(temperature, pressure) };
}

/** Speed of sound (m/s) in dry air at a temperature (K): a = sqrt(gamma R T); pressure does not enter. */
export function speedOfSound(temperature: Kelvin): MetresPerSecond {
  requirePositive(temperature, 'Temperature (K)');
  return metresPerSecond(Math.sqrt(AIR_HEAT_CAPACITY_RATIO * DRY_AIR_GAS_CONSTANT * temperature));
}

/** Speed of sound (m/s) in the ISA troposphere at a geopotential altitude from 0 to 11,000 m. */
export const isaSpeedOfSound = (altitude: Metres): MetresPerSecond =>
  speedOfSound(isaTroposphere(altitude).temperature);

/**
 * Hot-day correction of a minimum launch airspeed: the launch data gives an equivalent airspeed;
 * in thinner air the aircraft needs the true airspeed EAS / sqrt(sigma). Knots in, knots out.
 */
export function hotDayMinimumLaunchAirspeed(equivalentAirspeed: Knots, ratio: number): Knots {
  requirePositive(ratio, 'Density ratio');
  return knots(equivalentAirspeed / Math.sqrt(ratio));
}
