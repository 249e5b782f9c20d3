import { CAUTION_LINE } from '../common/csv.js';
import { LAUNCH_TABLE_TEMPLATE, readLaunchTable } from './launch-table-layout.js';

describe('readLaunchTable', () => {
  it('reads rising weights with decimal airspeeds, and its own template', () => {
    expect(readLaunchTable('min_launch_airspeed_kt,gross_weight_lb\n112.5,20000\n121,25000\n')).toEqual({
      problems: [],
      rows: [
        { row: 2, grossWeightLb: 20_000, minLaunchAirspeedKt: 112.5 },
        { row: 3, grossWeightLb: 25_000, minLaunchAirspeedKt: 121 },
      ],
    });
    expect(readLaunchTable(LAUNCH_TABLE_TEMPLATE).problems).toEqual([]);
    // Written like every CSV the API hands out: byte-order mark, the caution line, header, CRLF line ends.
    expect(LAUNCH_TABLE_TEMPLATE).toBe(
      `\uFEFF${CAUTION_LINE}\r\ngross_weight_lb,min_launch_airspeed_kt\r\n34000,124\r\n40000,133\r\n`,
    );
  });

  it('refuses a weight no heavier than the line before, and bad figures, by line', () => {
    const { problems } = readLaunchTable(
      'gross_weight_lb,min_launch_airspeed_kt\n25000,121\n25000,125\n24000,119\nheavy,0\n31000,-4\n',
    );
    expect(problems).toEqual([
      {
        row: 3,
        column: 'gross_weight_lb',
        value: '25000',
        reason: 'Must be heavier than line 2 (25000 lb): the weights must rise from line to line.',
      },
      {
        row: 4,
        column: 'gross_weight_lb',
        value: '24000',
        reason: 'Must be heavier than line 2 (25000 lb): the weights must rise from line to line.',
      },
      { row: 5, column: 'gross_weight_lb', value: 'heavy', reason: 'Must be a number of lb, e.g. 132 or 132.5.' },
      { row: 5, column: 'min_launch_airspeed_kt', value: '0', reason: 'Must be more than 0.' },
      { row: 6, column: 'min_launch_airspeed_kt', value: '-4', reason: 'Cannot be negative.' },
    ]);
  });

  it('refuses a table of one row', () => {
    expect(readLaunchTable('gross_weight_lb,min_launch_airspeed_kt\n25000,121\n').problems).toEqual([
      { row: 1, column: null, value: null, reason: 'A launch table needs at least two rows to interpolate between.' },
    ]);
  });
});
