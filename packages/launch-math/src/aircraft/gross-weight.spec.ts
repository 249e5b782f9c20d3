import { LaunchMathInputError } from '../errors.js';
import { pounds } from '../units/units.js';
import { grossWeightBuildUp } from './gross-weight.js';

describe('grossWeightBuildUp', () => {
  // Worked example, invented aircraft, written out by hand (common practice, no source):
  //   operating weight with crew   31,250 lb
  //   fuel on board                11,400 lb
  //   stores: 4 practice bombs × 28 lb  =   112 lb
  //           2 fuel tanks      × 1,210 lb = 2,420 lb
  //           1 training pod    × 175 lb  =   175 lb
  //   stores total  112 + 2,420 + 175   = 2,707 lb
  //   gross weight  31,250 + 11,400 + 2,707 = 45,357 lb
  //   in kilograms  45,357 × 0.45359237 = 20,573.589 126 09 kg (45,000 × 0.45359237 = 20,411.656 65;
  //   357 × 0.45359237 = 161.932 476 09) (NIST SP 811 (2008) B.8: pound (avoirdupois) =
  //   4.535 924 E-01 kg, rounded there; exactly 0.453 592 37 by the international yard and pound of 1959).
  const loaded = {
    operatingWeight: pounds(31_250),
    fuel: pounds(11_400),
    stores: [
      { name: 'Practice bomb', weightEach: pounds(28), count: 4 },
      { name: 'Fuel tank', weightEach: pounds(1_210), count: 2 },
      { name: 'Training pod', weightEach: pounds(175), count: 1 },
    ],
  };

  it('adds the operating weight, the fuel and each stores line, and keeps the parts', () => {
    const build = grossWeightBuildUp(loaded);
    expect(build.stores.map((line) => line.weight)).toEqual([112, 2_420, 175]); // hand computation above
    expect(build.storesWeight).toBe(2_707); // hand computation above
    expect(build.operatingWeight).toBe(31_250);
    expect(build.fuel).toBe(11_400);
    expect(build.grossWeight).toBe(45_357); // hand computation above
  });

  it('gives the gross weight in kilograms by the NIST SP 811 factor', () => {
    // NIST SP 811 (2008) B.8: 1 lb = 0.453 592 37 kg exactly; 45,357 lb → 20,573.589 126 09 kg by hand.
    expect(grossWeightBuildUp(loaded).grossWeightKg).toBeCloseTo(20_573.58912609, 6);
    // By B.8's rounded factor as printed: 45,357 × 0.453 592 4 = 20,573.590 486 8 kg by hand, the same to 0.002 kg.
    expect(grossWeightBuildUp(loaded).grossWeightKg).toBeCloseTo(20_573.5904868, 2);
  });

  it('weighs a clean aircraft (no stores) as operating weight plus fuel', () => {
    // 31,250 + 0 + 0 = 31,250 lb (common practice, no source).
    expect(grossWeightBuildUp({ ...loaded, fuel: pounds(0), stores: [] }).grossWeight).toBe(31_250);
  });

  it('refuses a negative fuel load, a fractional count and a missing operating weight', () => {
    expect(() => grossWeightBuildUp({ ...loaded, fuel: pounds(-1) })).toThrow(LaunchMathInputError);
    expect(() =>
      grossWeightBuildUp({ ...loaded, stores: [{ name: 'Fuel tank', weightEach: pounds(1_210), count: 1.5 }] }),
    ).toThrow('the count of Fuel tank must be a whole number, got 1.5');
    expect(() => grossWeightBuildUp({ ...loaded, operatingWeight: pounds(0) })).toThrow(LaunchMathInputError);
  });
});
