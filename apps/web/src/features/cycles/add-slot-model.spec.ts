import { describe, expect, it } from 'vitest';
import { addSlotSchema, blankSlot } from './add-slot-model.js';

const typed = {
  ...blankSlot,
  aircraftId: '7',
  mission: ' Tanker track ',
  fuelLb: '11500',
  grossWeightLb: '45400',
  tanker: true,
};
const messages = (values: typeof blankSlot) =>
  addSlotSchema.safeParse(values).error?.issues.map((issue) => [issue.path.join('.'), issue.message]) ?? [];

describe('adding an aircraft to the deck pool', () => {
  it('hands on the add-slot request, with no pilot when none is picked', () => {
    expect(addSlotSchema.parse(typed)).toEqual({
      aircraftId: 7,
      pilotId: undefined,
      mission: 'Tanker track',
      fuelLb: 11_500,
      stores: '',
      grossWeightLb: 45_400,
      tanker: true,
      earlyWarning: false,
      spare: false,
    });
    expect(addSlotSchema.parse({ ...typed, pilotId: '4' }).pilotId).toBe(4);
  });

  it('holds fuel and gross weight to the whole pounds the server takes', () => {
    expect(messages({ ...typed, fuelLb: '100000', grossWeightLb: '200000' })).toEqual([]);
    expect(messages({ ...typed, fuelLb: '100001', grossWeightLb: '0' })).toEqual([
      ['fuelLb', 'Enter the fuel in whole pounds, up to 100,000.'],
      ['grossWeightLb', 'Enter the gross weight in whole pounds, from 1 to 200,000.'],
    ]);
    expect(messages({ ...typed, fuelLb: '11500.5', grossWeightLb: '-45400' }).map(([field]) => field)).toEqual([
      'fuelLb',
      'grossWeightLb',
    ]);
  });

  it('asks for an aircraft and a mission, and keeps the mission to 60 characters', () => {
    expect(messages({ ...typed, aircraftId: '', mission: '  ' })).toEqual([
      ['aircraftId', 'Pick an aircraft.'],
      ['mission', 'Say what the sortie is for.'],
    ]);
    expect(messages({ ...typed, mission: 'm'.repeat(61) })).toEqual([['mission', 'At most 60 characters.']]);
  });
});
