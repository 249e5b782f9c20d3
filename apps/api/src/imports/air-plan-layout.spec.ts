import { AIR_PLAN_TEMPLATE, readAirPlan } from './air-plan-layout.js';

const HEADER = 'side_number,pilot_email,mission,fuel_lb,stores,gross_weight_lb,tanker,early_warning,spare';
const file = (...lines: string[]) => [HEADER, ...lines].join('\n');

describe('readAirPlan', () => {
  it('reads a file with a byte-order mark, Windows line ends, shuffled columns and a quoted comma', () => {
    const text =
      '\uFEFFspare,side_number,pilot_email,mission,fuel_lb,stores,gross_weight_lb,tanker,early_warning\r\n' +
      'no,C21,Pilot@Catline.Example,Strike training,11500,"2 bombs, 1 pod",45400,no,no\r\n' +
      '\r\n' +
      'Y,L48,,Airborne early warning,11000,,51900,false,1\r\n';
    expect(readAirPlan(text)).toEqual({
      problems: [],
      lines: [
        {
          row: 2,
          sideNumber: 'C21',
          pilotEmail: 'pilot@catline.example',
          mission: 'Strike training',
          fuelLb: 11_500,
          stores: '2 bombs, 1 pod',
          grossWeightLb: 45_400,
          tanker: false,
          earlyWarning: false,
          spare: false,
        },
        {
          row: 4,
          sideNumber: 'L48',
          pilotEmail: null,
          mission: 'Airborne early warning',
          fuelLb: 11_000,
          stores: '',
          grossWeightLb: 51_900,
          tanker: false,
          earlyWarning: true,
          spare: true,
        },
      ],
    });
  });

  it('reads its own template', () => {
    expect(readAirPlan(AIR_PLAN_TEMPLATE)).toMatchObject({
      problems: [],
      lines: [{ row: 3, sideNumber: 'C21', grossWeightLb: 45_400 }],
    });
  });

  it('reports each wrong cell by line and column and leaves the line out', () => {
    const result = readAirPlan(
      file('C21,,,lots,,-45000,maybe,no,no', 'C22,x@,Strike,11500,,45000,no,no,no', 'C23,,Strike,11500,,45000,no,no'),
    );
    expect(result.lines).toEqual([]);
    expect(result.problems).toEqual([
      { row: 2, column: 'mission', value: '', reason: 'A mission is required.' },
      { row: 2, column: 'fuel_lb', value: 'lots', reason: 'Must be a whole number (digits only), in lb.' },
      { row: 2, column: 'gross_weight_lb', value: '-45000', reason: 'Cannot be negative.' },
      {
        row: 2,
        column: 'tanker',
        value: 'maybe',
        reason: 'Must be yes or no (y/n, true/false and 1/0 work too; empty means no).',
      },
      { row: 3, column: 'pilot_email', value: 'x@', reason: 'Not an e-mail address.' },
      { row: 4, column: null, value: null, reason: 'This line has 8 cells; the header line has 9.' },
    ]);
  });

  it('refuses a header with an unknown, a doubled and a missing column', () => {
    const text =
      'side,side_number,pilot_email,mission,mission,fuel_lb,stores,tanker,early_warning,spare\nC21,C21,,a,a,1,,no,no,no';
    expect(readAirPlan(text)).toEqual({
      lines: [],
      problems: [
        {
          row: 1,
          column: null,
          value: 'side',
          reason:
            'Unknown column "side"; the columns are side_number, pilot_email, mission, fuel_lb, stores, gross_weight_lb, tanker, early_warning, spare.',
        },
        { row: 1, column: 'mission', value: 'mission', reason: 'This column is named twice in the header line.' },
        {
          row: 1,
          column: 'gross_weight_lb',
          value: null,
          reason: 'The column gross_weight_lb is missing from the header line.',
        },
      ],
    });
  });

  it('refuses an empty file, a header alone and an unclosed quote as a whole', () => {
    expect(readAirPlan('').problems).toEqual([
      {
        row: 1,
        column: null,
        value: null,
        reason: `The file is empty: it needs the header line (${HEADER}) and a line per aircraft.`,
      },
    ]);
    expect(readAirPlan(`${HEADER}\r\n\r\n`).problems).toEqual([
      { row: 1, column: null, value: null, reason: 'The file has the header line but no aircraft under it.' },
    ]);
    expect(readAirPlan(file('C21,,"Strike,11500,,45000,no,no,no')).problems).toEqual([
      { row: 2, column: null, value: null, reason: 'A quoted cell is never closed: a " opens it but no " ends it.' },
    ]);
  });

  it('refuses more than 200 lines whole', () => {
    const lines = Array.from({ length: 201 }, (_, i) => `${i},,Strike,1,,1,no,no,no`);
    expect(readAirPlan(file(...lines))).toEqual({
      lines: [],
      problems: [
        {
          row: 1,
          column: null,
          value: null,
          reason: 'The file has 201 lines under the header; one upload takes at most 200.',
        },
      ],
    });
  });
});
