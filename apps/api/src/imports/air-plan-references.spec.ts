import type { AirPlanLine } from './air-plan-layout.js';
import { checkAirPlan, type PlanAircraft, type PlanContext, type PlanPerson } from './air-plan-references.js';

const aircraft = (id: number, sideNumber: string, fields: Partial<PlanAircraft> = {}): PlanAircraft => ({
  id,
  sideNumber,
  serviceable: true,
  typeDesignation: 'WKD-41',
  maxGrossWeightLb: 51_000,
  squadronCode: 'CWR',
  ...fields,
});
const person = (id: number, name: string, fields: Partial<PlanPerson> = {}): PlanPerson => ({
  id,
  name,
  email: `${name.split(' ')[0].toLowerCase()}@catline.example`,
  role: 'pilot',
  active: true,
  ...fields,
});

const fleet = [
  aircraft(1, 'C21'),
  aircraft(2, 'C22'),
  aircraft(3, 'C23', { serviceable: false }),
  aircraft(4, 'C24'),
  aircraft(5, 'AB7'),
];
const people = [
  person(11, 'Kit Marrowby'),
  person(12, 'Jo Fettleworth'),
  person(13, 'Tomas Ebberhold', { role: 'handler' }),
  person(14, 'Mika Grennadine'),
];

const context: PlanContext = {
  aircraft: new Map(fleet.map((row) => [row.sideNumber.toUpperCase(), row])),
  people: new Map(people.map((row) => [row.email, row])),
  cycle: { number: 7, aircraftIds: new Set([4]), pilotsFlying: new Map([[14, 'C24']]) },
};

const line = (row: number, sideNumber: string, fields: Partial<AirPlanLine> = {}): AirPlanLine => ({
  row,
  sideNumber,
  pilotEmail: null,
  mission: 'Strike training',
  fuelLb: 11_000,
  stores: '',
  grossWeightLb: 44_000,
  tanker: false,
  earlyWarning: false,
  spare: false,
  ...fields,
});

describe('checkAirPlan', () => {
  it('resolves known aircraft and pilots, matching side numbers in any case', () => {
    const checked = checkAirPlan([line(2, 'C21', { pilotEmail: 'kit@catline.example' }), line(3, 'ab7')], context);
    expect(checked.problems).toEqual([]);
    expect(
      checked.resolved.map(({ row, sideNumber, aircraftId, pilotId }) => ({ row, sideNumber, aircraftId, pilotId })),
    ).toEqual([
      { row: 2, sideNumber: 'C21', aircraftId: 1, pilotId: 11 },
      { row: 3, sideNumber: 'AB7', aircraftId: 5, pilotId: null },
    ]);
    expect(checked.rows[0]).toMatchObject({
      typeDesignation: 'WKD-41',
      squadronCode: 'CWR',
      pilotName: 'Kit Marrowby',
    });
  });

  it('applies the rules of adding a slot to every line, and within the file', () => {
    const checked = checkAirPlan(
      [
        line(2, '999'),
        line(3, 'C21', { pilotEmail: 'kit@catline.example' }),
        line(4, 'C21'),
        line(5, 'C23'),
        line(6, 'C24'),
        line(7, 'C22', { grossWeightLb: 52_000, pilotEmail: 'kit@catline.example' }),
        line(8, 'ab7', { pilotEmail: 'nobody@catline.example' }),
      ],
      context,
    );
    expect(checked.problems).toEqual([
      { row: 2, column: 'side_number', value: '999', reason: 'No aircraft has the side number 999.' },
      {
        row: 4,
        column: 'side_number',
        value: 'C21',
        reason: 'C21 is already on line 3; an aircraft flies once in a cycle.',
      },
      { row: 5, column: 'side_number', value: 'C23', reason: 'C23 is marked unserviceable.' },
      { row: 6, column: 'side_number', value: 'C24', reason: 'C24 is already in cycle 7.' },
      {
        row: 7,
        column: 'gross_weight_lb',
        value: '52000',
        reason: 'Over the WKD-41 maximum gross weight of 51000 lb.',
      },
      {
        row: 7,
        column: 'pilot_email',
        value: 'kit@catline.example',
        reason: 'Kit Marrowby already flies C21 on line 3.',
      },
      { row: 8, column: 'pilot_email', value: 'nobody@catline.example', reason: 'Nobody signs in with this e-mail.' },
    ]);
    expect(checked.resolved.map((resolved) => resolved.row)).toEqual([3]);
    expect(checked.rows.map((row) => row.row)).toEqual([2, 3, 4, 5, 6, 7, 8]);
  });

  it('refuses a person who is not an active pilot, or already flies in the cycle', () => {
    const checked = checkAirPlan(
      [line(2, 'C21', { pilotEmail: 'tomas@catline.example' }), line(3, 'C22', { pilotEmail: 'mika@catline.example' })],
      context,
    );
    expect(checked.problems.map((problem) => problem.reason)).toEqual([
      'Tomas Ebberhold is not an active pilot.',
      'Mika Grennadine already flies C24 in cycle 7.',
    ]);
  });
});
