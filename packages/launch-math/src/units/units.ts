declare const unitBrand: unique symbol;

/**
 * A number that carries its unit in its type. Arithmetic on it gives a plain `number`, so a result
 * must be branded again on purpose: knots never meet metres per second by accident.
 */
export type Quantity<Unit extends string> = number & { readonly [unitBrand]: Unit };

/** Speed in international knots (1 kt = 1852 m/h). */
export type Knots = Quantity<'kt'>;
/** Speed in metres per second. */
export type MetresPerSecond = Quantity<'m/s'>;
/** Acceleration in metres per second squared. */
export type MetresPerSecondSquared = Quantity<'m/s2'>;
/** Mass in avoirdupois pounds (1 lb = 0.45359237 kg). */
export type Pounds = Quantity<'lb'>;
/** Mass in kilograms. */
export type Kilograms = Quantity<'kg'>;
/** Force in pounds-force (1 lbf = 4.4482216152605 N). */
export type PoundsForce = Quantity<'lbf'>;
/** Force in newtons. */
export type Newtons = Quantity<'N'>;
/** Length in international feet (1 ft = 0.3048 m). */
export type Feet = Quantity<'ft'>;
/** Length in metres. */
export type Metres = Quantity<'m'>;
/** Length in international nautical miles (1 nmi = 1852 m). */
export type NauticalMiles = Quantity<'nmi'>;
/** Energy in joules. */
export type Joules = Quantity<'J'>;
/** Plane angle in degrees. */
export type Degrees = Quantity<'deg'>;
/** Duration in seconds. */
export type Seconds = Quantity<'s'>;
/** An instant as milliseconds since 1970-01-01T00:00:00Z (what `Date.getTime()` returns). */
export type EpochMs = Quantity<'epoch-ms'>;
/** Thermodynamic temperature in kelvins. */
export type Kelvin = Quantity<'K'>;
/** Temperature in degrees Celsius. */
export type Celsius = Quantity<'degC'>;
/** Pressure in pascals. */
export type Pascals = Quantity<'Pa'>;
/** Density in kilograms per cubic metre. */
export type KilogramsPerCubicMetre = Quantity<'kg/m3'>;

export const knots = (value: number): Knots => value as Knots;
export const metresPerSecond = (value: number): MetresPerSecond => value as MetresPerSecond;
export const metresPerSecondSquared = (value: number): MetresPerSecondSquared => value as MetresPerSecondSquared;
export const pounds = (value: number): Pounds => value as Pounds;
export const kilograms = (value: number): Kilograms => value as Kilograms;
export const poundsForce = (value: number): PoundsForce => value as PoundsForce;
export const newtons = (value: number): Newtons => value as Newtons;
export const feet = (value: number): Feet => value as Feet;
export const metres = (value: number): Metres => value as Metres;
export const nauticalMiles = (value: number): NauticalMiles => value as NauticalMiles;
export const joules = (value: number): Joules => value as Joules;
export const degrees = (value: number): Degrees => value as Degrees;
export const seconds = (value: number): Seconds => value as Seconds;
export const epochMs = (value: number): EpochMs => value as EpochMs;
export const kelvin = (value: number): Kelvin => value as Kelvin;
export const celsius = (value: number): Celsius => value as Celsius;
export const pascals = (value: number): Pascals => value as Pascals;
export const kilogramsPerCubicMetre = (value: number): KilogramsPerCubicMetre => value as KilogramsPerCubicMetre;

/** Metres in one international nautical mile, exact by definition. */
export const METRES_PER_NAUTICAL_MILE = 1852;
/** Kilograms in one avoirdupois pound, exact by definition. */
export const KILOGRAMS_PER_POUND = 0.45359237;
/** Newtons in one pound-force: one pound under standard gravity, exact by definition. */
export const NEWTONS_PER_POUND_FORCE = 4.4482216152605;
/** Metres in one international foot, exact by definition. */
export const METRES_PER_FOOT = 0.3048;
/** Standard acceleration of gravity g0 in m/s2, exact by definition. */
export const STANDARD_GRAVITY = metresPerSecondSquared(9.80665);
/** Offset between the Celsius and kelvin scales, exact by definition. */
export const KELVIN_AT_ZERO_CELSIUS = 273.15;

const SECONDS_PER_HOUR = 3600;
const JOULES_PER_MEGAJOULE = 1e6;

/** kt to m/s (1 kt = 1852 m / 3600 s). */
export const knotsToMetresPerSecond = (speed: Knots): MetresPerSecond =>
  metresPerSecond((speed * METRES_PER_NAUTICAL_MILE) / SECONDS_PER_HOUR);
/** m/s to kt. */
export const metresPerSecondToKnots = (speed: MetresPerSecond): Knots =>
  knots((speed * SECONDS_PER_HOUR) / METRES_PER_NAUTICAL_MILE);
/** lb to kg. */
export const poundsToKilograms = (mass: Pounds): Kilograms => kilograms(mass * KILOGRAMS_PER_POUND);
/** kg to lb. */
export const kilogramsToPounds = (mass: Kilograms): Pounds => pounds(mass / KILOGRAMS_PER_POUND);
/** lbf to N. */
export const poundsForceToNewtons = (force: PoundsForce): Newtons => newtons(force * NEWTONS_PER_POUND_FORCE);
/** N to lbf. */
export const newtonsToPoundsForce = (force: Newtons): PoundsForce => poundsForce(force / NEWTONS_PER_POUND_FORCE);
/** ft to m. */
export const feetToMetres = (length: Feet): Metres => metres(length * METRES_PER_FOOT);
/** m to ft. */
export const metresToFeet = (length: Metres): Feet => feet(length / METRES_PER_FOOT);
/** nmi to m. */
export const nauticalMilesToMetres = (length: NauticalMiles): Metres => metres(length * METRES_PER_NAUTICAL_MILE);
/** MJ (a plain number of megajoules, as launch data is usually written) to J. */
export const megajoulesToJoules = (megajoules: number): Joules => joules(megajoules * JOULES_PER_MEGAJOULE);
/** J to MJ, as a plain number of megajoules for display. */
export const joulesToMegajoules = (energy: Joules): number => energy / JOULES_PER_MEGAJOULE;
/** degC to K. */
export const celsiusToKelvin = (temperature: Celsius): Kelvin => kelvin(temperature + KELVIN_AT_ZERO_CELSIUS);
/** s to ms, as a plain number to add to an {@link EpochMs}. */
export const secondsToMilliseconds = (duration: Seconds): number => duration * 1000;
