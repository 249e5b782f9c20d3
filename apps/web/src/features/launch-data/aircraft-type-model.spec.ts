import { describe, expect, it } from 'vitest';
import { aircraftTypeSchema, blankAircraftType } from './aircraft-type-model.js';

const typed = {
  ...blankAircraftType,
  designation: 'KX-9',
  name: 'Kestrel',
  maxGrossWeightLb: '52000',
  crosswindLimitKt: '15',
  thrustLbf: '0',
  requiredExcessKt: '10',
  maxEndSpeedKt: '175',
  trimBands: '44000:15, *:18',
  launchTable: '34000:124, 46000:143',
};
const fields = (values: typeof blankAircraftType) =>
  aircraftTypeSchema.safeParse(values).error?.issues.map((issue) => issue.path.join('.')) ?? [];

describe('a new aircraft type', () => {
  it('takes the holdback release element as marked, or none when left empty', () => {
    expect(aircraftTypeSchema.parse({ ...typed, holdbackElement: ' RE-14 ' }).holdbackElement).toBe('RE-14');
    expect(aircraftTypeSchema.parse({ ...typed, holdbackElement: '' }).holdbackElement).toBeNull();
    expect(fields({ ...typed, holdbackElement: 'RE 14' })).toEqual(['holdbackElement']);
  });

  it('hands on the create request with bands and table read from their text', () => {
    expect(aircraftTypeSchema.parse(typed)).toEqual({
      designation: 'KX-9',
      name: 'Kestrel',
      aircraftClass: 'jet',
      maxGrossWeightLb: 52_000,
      operatingWeightLb: null,
      crosswindLimitKt: 15,
      thrustLbf: 0,
      requiredExcessKt: 10,
      afterburnerFromLb: null,
      maxEndSpeedKt: 175,
      holdbackElement: null,
      trimBands: [
        { upToLb: 44_000, trimDeg: 15 },
        { upToLb: null, trimDeg: 18 },
      ],
      launchTable: [
        { grossWeightLb: 34_000, minLaunchAirspeedKt: 124 },
        { grossWeightLb: 46_000, minLaunchAirspeedKt: 143 },
      ],
    });
  });

  it('takes a class from the server’s list only', () => {
    expect(aircraftTypeSchema.parse({ ...typed, aircraftClass: 'helicopter' }).aircraftClass).toBe('helicopter');
    expect(fields({ ...typed, aircraftClass: 'glider' as 'jet' })).toEqual(['aircraftClass']);
  });

  it('wants whole pounds where the server does', () => {
    expect(
      fields({
        ...typed,
        maxGrossWeightLb: '52000.5',
        operatingWeightLb: '30000.5',
        thrustLbf: '1.5',
        afterburnerFromLb: '48000.5',
        crosswindLimitKt: '15.5',
      }),
    ).toEqual(['maxGrossWeightLb', 'operatingWeightLb', 'thrustLbf', 'afterburnerFromLb']);
  });

  it('refuses figures outside the server ranges', () => {
    expect(
      fields({
        ...typed,
        maxGrossWeightLb: '0',
        crosswindLimitKt: '101',
        requiredExcessKt: '-1',
        afterburnerFromLb: '1000001',
        maxEndSpeedKt: '401',
      }),
    ).toEqual(['maxGrossWeightLb', 'crosswindLimitKt', 'requiredExcessKt', 'afterburnerFromLb', 'maxEndSpeedKt']);
  });

  it('says what is wrong with the bands and the table', () => {
    const issues = aircraftTypeSchema.safeParse({
      ...typed,
      trimBands: '44000:15',
      launchTable: '34000:124, 30000:120',
    }).error?.issues;
    expect(issues?.map((issue) => issue.message)).toEqual([
      'Write bands as 44000:15, 48000:17, *:18 — the last one with *.',
      'Row 2: each weight must be heavier than the row above.',
    ]);
  });
});
