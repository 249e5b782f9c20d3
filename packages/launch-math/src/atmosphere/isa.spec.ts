import { evaluate } from 'mathjs';
import { LaunchMathInputError } from '../errors.js';
import { celsius, celsiusToKelvin, kelvin, kilogramsPerCubicMetre, knots, metres, pascals } from '../units/units.js';
import {
  airDensity,
  densityRatio,
  hotDayMinimumLaunchAirspeed,
  isaSpeedOfSound,
  isaTroposphere,
  speedOfSound,
} from './isa.js';

describe('ISA air density', () => {
  it('is 1.225 kg/m3 at 15 C and 101325 Pa', () => {
    expect(airDensity(celsiusToKelvin(celsius(15)), pascals(101325))).toBeCloseTo(1.225, 5); // ICAO Doc 7488/3 (1993) / US Standard Atmosphere 1976: 1.225 kg/m3
  });

  it('is 1.1116 kg/m3 at 1000 m', () => {
    const air = isaTroposphere(metres(1000));
    expect(Math.abs(air.density - 1.1116)).toBeLessThan(1e-4); // ICAO Doc 7488/3 (1993) / US Standard Atmosphere 1976: 1.1116 kg/m3 at 1000 m
    expect(air.temperature).toBeCloseTo(281.65, 9); // ICAO Doc 7488/3 (1993): 8.50 C at 1000 m (lapse rate 6.5 K/km)
  });

  it('has a density ratio of one at sea level and below one on a hot day', () => {
    expect(densityRatio(kilogramsPerCubicMetre(1.225))).toBe(1); // ICAO Doc 7488/3 (1993): sea-level density 1.225 kg/m3
    const hotDay = densityRatio(airDensity(celsiusToKelvin(celsius(35)), pascals(101325)));
    // rho = p / (R* / M0 * T) worked in mathjs units with the constants of ICAO Doc 7488/3 (1993): universal
    // gas constant R* = 8314.32 J/(kmol K), molar mass of dry air M0 = 28.964420 kg/kmol, sea-level pressure
    // 101325 Pa and density 1.225 kg/m3; 35 C converted to kelvin by mathjs (1.14549 kg/m3, sigma 0.93510).
    const hotDayDensity = evaluate(
      '101325 Pa / (8314.32 J / (kmol K) / (28.964420 kg / kmol) * (35 degC to K))',
    ).toNumber('kg/m^3');
    expect(hotDay).toBeCloseTo(hotDayDensity / 1.225, 6);
  });

  it('raises a minimum launch airspeed by 1 / sqrt(sigma) on a hot day', () => {
    // TAS = EAS / sqrt(sigma) (FAA-H-8083-25, Pilot's Handbook of Aeronautical Knowledge, ch. 8: true
    // airspeed rises as density falls). By hand: 120 / sqrt(0.81) = 120 / 0.9 = 133.33 kt.
    expect(hotDayMinimumLaunchAirspeed(knots(120), 0.81)).toBeCloseTo(133.33, 2);
    expect(hotDayMinimumLaunchAirspeed(knots(120), 1)).toBe(120);
  });

  it('gives the speed of sound of the standard tables at sea level and at the tropopause', () => {
    expect(isaSpeedOfSound(metres(0))).toBeCloseTo(340.294, 3); // US Standard Atmosphere 1976 / ICAO Doc 7488/3 (1993): 340.294 m/s at sea level
    // ICAO Doc 7488/3 (1993), table by geopotential altitude: 295.07 m/s at 11,000 m (216.65 K). US Standard
    // Atmosphere 1976 gives the same at 11 km geopotential; its geometric table reads 295.15 m/s at 11 km
    // geometric, which is 10,981 m geopotential.
    expect(isaSpeedOfSound(metres(11000))).toBeCloseTo(295.07, 2);
    expect(speedOfSound(kelvin(216.65))).toBeCloseTo(295.07, 2); // the same air at the tropopause temperature: pressure does not enter
  });

  it('refuses an impossible temperature, pressure or altitude', () => {
    expect(() => airDensity(kelvin(0), pascals(101325))).toThrow(LaunchMathInputError);
    expect(() => airDensity(kelvin(288.15), pascals(-1))).toThrow(LaunchMathInputError);
    expect(() => isaTroposphere(metres(12000))).toThrow(LaunchMathInputError);
    expect(() => isaSpeedOfSound(metres(-1))).toThrow(LaunchMathInputError);
    expect(() => speedOfSound(kelvin(0))).toThrow(LaunchMathInputError);
  });
});
