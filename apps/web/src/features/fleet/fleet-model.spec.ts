import { describe, expect, it } from 'vitest';
import { aircraftSchema, squadronSchema } from './fleet-model.js';

describe('a new aircraft', () => {
  it('hands on the create request with ids as numbers', () => {
    expect(aircraftSchema.parse({ sideNumber: ' C21 ', typeId: '3', squadronId: '2', parkedSpot: 'bow-1' })).toEqual({
      sideNumber: 'C21',
      typeId: 3,
      squadronId: 2,
      parkedSpot: 'bow-1',
    });
  });

  it.each(['', '123456789', '10 1', '10_1'])('refuses the side number "%s" as the server does', (sideNumber) => {
    const result = aircraftSchema.safeParse({ sideNumber, typeId: '3', squadronId: '2', parkedSpot: 'bow-1' });
    expect(result.error?.issues.map((issue) => [issue.path.join('.'), issue.message])).toEqual([
      ['sideNumber', 'Up to 8 letters, digits or dashes.'],
    ]);
  });

  it('asks for each choice not made', () => {
    const result = aircraftSchema.safeParse({ sideNumber: 'AB-12345', typeId: '', squadronId: '', parkedSpot: '' });
    expect(result.error?.issues.map((issue) => issue.message)).toEqual([
      'Pick a type.',
      'Pick a squadron.',
      'Pick where it is parked.',
    ]);
  });
});

describe('a new squadron', () => {
  it('takes a code of up to 12 letters, digits or dashes and a duty officer address', () => {
    expect(squadronSchema.parse({ name: ' Test Wing ', code: 'VX-4100000AB', email: 'ops@catline.example' })).toEqual({
      name: 'Test Wing',
      code: 'VX-4100000AB',
      email: 'ops@catline.example',
    });
    const result = squadronSchema.safeParse({ name: '', code: 'VX-4100000ABC', email: 'ops' });
    expect(result.error?.issues.map((issue) => issue.message)).toEqual([
      'Enter the squadron name.',
      'Up to 12 letters, digits or dashes.',
      'Enter the duty officer e-mail address.',
    ]);
  });
});
