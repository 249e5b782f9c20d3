import type { Slot } from '../database/entities/slot.entity.js';
import { spareCandidates } from './spare-candidates.js';

const slot = (id: number, side: string, typeId: number, mission: string) =>
  ({ id, mission, aircraft: { sideNumber: side, typeId, type: { designation: `T${typeId}` } } }) as unknown as Slot;

describe('spareCandidates', () => {
  const down = slot(1, 'C22', 10, 'Strike training');

  it('offers spares of the same type first, then of the same mission, then the rest', () => {
    const offered = spareCandidates(down, [
      slot(2, 'D40', 20, 'Tanker'),
      slot(3, 'D41', 20, 'strike training '),
      slot(4, 'C30', 10, 'Tanker'),
    ]);
    expect(offered.map((candidate) => [candidate.sideNumber, candidate.match])).toEqual([
      ['C30', 'type'],
      ['D41', 'mission'],
      ['D40', 'other'],
    ]);
  });

  it('orders spares of the same match by side number, 9 before 10', () => {
    const offered = spareCandidates(down, [slot(2, 'C10', 10, 'x'), slot(3, 'C9', 10, 'x')]);
    expect(offered.map((candidate) => candidate.sideNumber)).toEqual(['C9', 'C10']);
  });
});
