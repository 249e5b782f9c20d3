import { LaunchMathInputError } from '../errors.js';
import { interpolateInTable } from './interpolation.js';

const table = [
  [40000, 115],
  [50000, 135],
  [60000, 145],
] as const;

describe('table interpolation', () => {
  it('is linear between rows and exact on them', () => {
    expect(interpolateInTable(table, 45000)).toEqual({ kind: 'value', value: 125 }); // halfway between 115 and 135
    expect(interpolateInTable(table, 57500)).toEqual({ kind: 'value', value: 142.5 }); // three quarters from 135 to 145
    expect(interpolateInTable(table, 40000)).toEqual({ kind: 'value', value: 115 });
    expect(interpolateInTable(table, 60000)).toEqual({ kind: 'value', value: 145 });
  });

  it('refuses to extrapolate beyond either end', () => {
    expect(interpolateInTable(table, 39999)).toEqual({ kind: 'outside', lowest: 40000, highest: 60000 });
    expect(interpolateInTable(table, 60001)).toEqual({ kind: 'outside', lowest: 40000, highest: 60000 });
    expect(interpolateInTable(table, Number.NaN).kind).toBe('outside');
  });

  it('refuses an empty or unordered table', () => {
    expect(() => interpolateInTable([], 1)).toThrow(LaunchMathInputError);
    expect(() =>
      interpolateInTable(
        [
          [2, 1],
          [1, 2],
        ],
        1.5,
      ),
    ).toThrow(LaunchMathInputError);
    expect(() =>
      interpolateInTable(
        [
          [1, 1],
          [1, 2],
        ],
        1,
      ),
    ).toThrow(LaunchMathInputError);
  });
});
