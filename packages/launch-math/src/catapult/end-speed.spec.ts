import fc from 'fast-check';
import { evaluate } from 'mathjs';
import { LaunchMathInputError } from '../errors.js';
import { joules, kilograms, megajoulesToJoules, metres, metresPerSecond, newtons, seconds } from '../units/units.js';
import {
  catapultEnergyAtSetting,
  catapultEnergyForEndSpeed,
  endSpeed,
  endSpeedFromStrokeTime,
  lowestSettingForEndSpeed,
  meanStrokeAcceleration,
  meanStrokeAccelerationFromTime,
  type CatapultEnergyProfile,
} from './end-speed.js';

// Halliday, Resnick and Walker, Fundamentals of Physics, chapter 5: a 2.36e4 kg jet, 107 kN thrust,
// catapulted over 90 m to 85 m/s.
const jet = { mass: kilograms(2.36e4), thrust: newtons(107e3), stroke: metres(90) };

// Invented for the tests: 10 to 90 MJ over settings 0..80, a 94 m stroke.
const catapult: CatapultEnergyProfile = {
  strokeLength: metres(94),
  energyAtMinSetting: megajoulesToJoules(10),
  energyAtMaxSetting: megajoulesToJoules(90),
  maxSetting: 80,
};

describe('catapult end speed', () => {
  it('matches the Halliday, Resnick and Walker worked example', () => {
    expect(meanStrokeAcceleration(metresPerSecond(85), jet.stroke)).toBeCloseTo(40, 0); // Halliday, Resnick & Walker, ch. 5: about 40 m/s2
    const energy = catapultEnergyForEndSpeed({ ...jet, endSpeed: metresPerSecond(85) });
    const catapultForce = energy / jet.stroke;
    expect(Math.abs(catapultForce - 8.4e5) / 8.4e5).toBeLessThan(0.01); // Halliday, Resnick & Walker, ch. 5: catapult force about 8.4e5 N
    expect(endSpeed({ ...jet, catapultEnergy: joules(8.4e5 * 90) })).toBeCloseTo(85, 0); // Halliday, Resnick & Walker, ch. 5: 85 m/s
  });

  it('needs no catapult when thrust alone gives the end speed', () => {
    // Work-energy theorem (Halliday, Resnick & Walker, ch. 7) with the chapter 5 jet: v = sqrt(2 T s / m).
    expect(endSpeed({ ...jet, catapultEnergy: joules(0) })).toBeCloseTo(
      evaluate('sqrt(2 * 107 kN * 90 m / 23600 kg)').toNumber('m/s'),
      9,
    ); // mathjs units
    expect(endSpeed({ ...jet, catapultEnergy: joules(0) })).toBeCloseTo(28.57, 2); // by hand: sqrt(19,260,000 / 23,600) = sqrt(816.1) = 28.57 m/s
  });

  it('delivers energy linearly between the ends of the setting range', () => {
    expect(catapultEnergyAtSetting(catapult, 0)).toBe(10e6);
    expect(catapultEnergyAtSetting(catapult, 40)).toBe(50e6);
    expect(catapultEnergyAtSetting(catapult, 80)).toBe(90e6);
    expect(() => catapultEnergyAtSetting(catapult, 81)).toThrow(LaunchMathInputError);
    expect(() => catapultEnergyAtSetting(catapult, 2.5)).toThrow(LaunchMathInputError);
  });

  it('never gives a heavier aircraft a higher end speed', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5e3, max: 5e4, noNaN: true }),
        fc.double({ min: 0, max: 2e4, noNaN: true }),
        fc.integer({ min: 0, max: 80 }),
        fc.double({ min: 0, max: 2e5, noNaN: true }),
        (mass, extra, setting, thrust) => {
          const at = (kg: number): number =>
            endSpeed({
              catapultEnergy: catapultEnergyAtSetting(catapult, setting),
              thrust: newtons(thrust),
              stroke: catapult.strokeLength,
              mass: kilograms(kg),
            });
          expect(at(mass + extra)).toBeLessThanOrEqual(at(mass));
        },
      ),
    );
  });
});

describe('mean acceleration from stroke length and stroke time', () => {
  // OpenStax, College Physics, Examples 2.10 and 2.11: a dragster accelerating from rest at 26.0 m/s2 for
  // 5.56 s covers 402 m and reaches 145 m/s. Read backwards: a 402 m "stroke" run in 5.56 s.
  it('matches the OpenStax dragster worked example read backwards', () => {
    expect(meanStrokeAccelerationFromTime(metres(402), seconds(5.56))).toBeCloseTo(26.0, 1); // OpenStax College Physics, Example 2.10: 26.0 m/s2
    expect(endSpeedFromStrokeTime(metres(402), seconds(5.56))).toBeCloseTo(145, 0); // OpenStax College Physics, Example 2.11: 145 m/s
  });

  it('agrees with the acceleration from the end speed when the stroke time is 2 s / v', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 120, noNaN: true }),
        fc.double({ min: 50, max: 110, noNaN: true }),
        (stroke, speed) => {
          const time = seconds((2 * stroke) / speed); // constant acceleration from rest: mean speed v / 2 (Halliday, Resnick & Walker, ch. 2)
          const fromTime = meanStrokeAccelerationFromTime(metres(stroke), time);
          expect(fromTime / meanStrokeAcceleration(metresPerSecond(speed), metres(stroke))).toBeCloseTo(1, 12);
          expect(endSpeedFromStrokeTime(metres(stroke), time) / speed).toBeCloseTo(1, 12);
        },
      ),
    );
  });

  it('refuses a stroke or a time that is not above zero', () => {
    expect(() => meanStrokeAccelerationFromTime(metres(90), seconds(0))).toThrow(LaunchMathInputError);
    expect(() => endSpeedFromStrokeTime(metres(-1), seconds(2))).toThrow(LaunchMathInputError);
  });
});

describe('lowest setting for an end speed', () => {
  const speedAt = (setting: number, mass: number): number =>
    endSpeed({
      catapultEnergy: catapultEnergyAtSetting(catapult, setting),
      thrust: jet.thrust,
      stroke: catapult.strokeLength,
      mass: kilograms(mass),
    });

  it('finds the lowest setting that reaches the wanted end speed', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e4, max: 3e4, noNaN: true }),
        fc.double({ min: 40, max: 90, noNaN: true }),
        (mass, wanted) => {
          const found = lowestSettingForEndSpeed({
            catapult,
            thrust: jet.thrust,
            mass: kilograms(mass),
            wanted: metresPerSecond(wanted),
          });
          if (found.kind === 'out_of_range') {
            expect(speedAt(80, mass)).toBeLessThan(wanted);
            return;
          }
          expect(found.endSpeed).toBeGreaterThanOrEqual(wanted);
          expect(found.endSpeed).toBe(speedAt(found.setting, mass));
          if (found.setting > 0) expect(speedAt(found.setting - 1, mass)).toBeLessThan(wanted);
        },
      ),
    );
  });

  it('says out of range, with the best it can do, when the highest setting falls short', () => {
    const found = lowestSettingForEndSpeed({
      catapult,
      thrust: jet.thrust,
      mass: kilograms(3e4),
      wanted: metresPerSecond(100),
    });
    expect(found).toEqual({ kind: 'out_of_range', maxEndSpeed: speedAt(80, 3e4) });
  });

  it('returns setting 0 when even the lowest energy is enough', () => {
    const found = lowestSettingForEndSpeed({
      catapult,
      thrust: jet.thrust,
      mass: kilograms(1e4),
      wanted: metresPerSecond(10),
    });
    expect(found.kind === 'setting' && found.setting).toBe(0);
  });

  it('refuses a catapult whose range runs backwards', () => {
    const backwards = { ...catapult, energyAtMaxSetting: joules(5e6) };
    expect(() =>
      lowestSettingForEndSpeed({
        catapult: backwards,
        thrust: jet.thrust,
        mass: kilograms(1e4),
        wanted: metresPerSecond(60),
      }),
    ).toThrow(LaunchMathInputError);
  });
});
