import { strikeFighter } from '../testing/profiles.fixture.js';
import { joules, kilograms, kilogramsToPounds, knots, metres, newtons, newtonsToPoundsForce } from '../units/units.js';
import type { CatapultEnergyProfile } from '../catapult/end-speed.js';
import { launchEndSpeed, lowestLaunchSetting } from './launch-settings.js';

describe('launch settings in trade units', () => {
  // Halliday, Resnick & Walker, Fundamentals of Physics, ch. 5: 2.36e4 kg, 107 kN, 90 m, about 8.4e5 N of
  // catapult force gives 85 m/s. Setting 1 of this catapult delivers that force over the stroke.
  const textbookCatapult: CatapultEnergyProfile = {
    strokeLength: metres(90),
    energyAtMinSetting: joules(0),
    energyAtMaxSetting: joules(2 * 8.4e5 * 90),
    maxSetting: 2,
  };
  const textbookJet = { ...strikeFighter, thrust: newtonsToPoundsForce(newtons(107e3)) };
  const grossWeight = kilogramsToPounds(kilograms(2.36e4));

  it('reproduce the textbook end speed from pounds and pounds-force', () => {
    const speed = launchEndSpeed({ aircraft: textbookJet, catapult: textbookCatapult, setting: 1, grossWeight });
    expect(speed).toBeCloseTo((85 * 3600) / 1852, 0); // Halliday, Resnick & Walker, ch. 5: 85 m/s = 165 kt
  });

  it('find the setting back from its own end speed', () => {
    const wanted = launchEndSpeed({ aircraft: textbookJet, catapult: textbookCatapult, setting: 1, grossWeight });
    expect(
      lowestLaunchSetting({
        aircraft: textbookJet,
        catapult: textbookCatapult,
        grossWeight,
        wanted: knots(wanted - 1e-9),
      }),
    ).toEqual({
      kind: 'setting',
      setting: 1,
      endSpeed: wanted,
    });
    expect(
      lowestLaunchSetting({ aircraft: textbookJet, catapult: textbookCatapult, grossWeight, wanted: knots(400) }).kind,
    ).toBe('out_of_range');
  });
});
