import { launchTableProblems, trimBandProblems } from './launch-data.js';

describe('launchTableProblems', () => {
  it('accepts weights rising strictly', () => {
    expect(
      launchTableProblems([
        { grossWeightLb: 20_000, minLaunchAirspeedKt: 112 },
        { grossWeightLb: 25_000, minLaunchAirspeedKt: 121 },
      ]),
    ).toEqual([]);
  });

  it('refuses a row no heavier than the one before', () => {
    expect(
      launchTableProblems([
        { grossWeightLb: 25_000, minLaunchAirspeedKt: 121 },
        { grossWeightLb: 25_000, minLaunchAirspeedKt: 125 },
        { grossWeightLb: 24_000, minLaunchAirspeedKt: 119 },
      ]),
    ).toEqual([
      'Launch table row 2 (25000 lb) must be heavier than row 1 (25000 lb).',
      'Launch table row 3 (24000 lb) must be heavier than row 2 (25000 lb).',
    ]);
  });
});

describe('trimBandProblems', () => {
  it('accepts rising bands closed by an open-ended one', () => {
    expect(
      trimBandProblems([
        { upToLb: 44_000, trimDeg: 15 },
        { upToLb: 48_000, trimDeg: 17 },
        { upToLb: null, trimDeg: 18 },
      ]),
    ).toEqual([]);
  });

  it('refuses a last band with an upper weight', () => {
    expect(trimBandProblems([{ upToLb: 44_000, trimDeg: 15 }])).toEqual([
      'The last trim band must have no upper weight (upToLb null) so every weight has a trim.',
    ]);
  });

  it('refuses an open-ended band before the last', () => {
    expect(
      trimBandProblems([
        { upToLb: null, trimDeg: 15 },
        { upToLb: null, trimDeg: 18 },
      ]),
    ).toEqual(['Only the last trim band may be open-ended; band 1 has no upper weight.']);
  });

  it('refuses falling upper weights', () => {
    expect(
      trimBandProblems([
        { upToLb: 48_000, trimDeg: 15 },
        { upToLb: 44_000, trimDeg: 17 },
        { upToLb: null, trimDeg: 18 },
      ]),
    ).toEqual(['Trim band 2 (up to 44000 lb) must end above band 1 (up to 48000 lb).']);
  });
});
