import { orderSpares, type SpareFacts } from './spare-order.js';

const aircraft = (sideNumber: string, typeId: number, mission: string): SpareFacts => ({ sideNumber, typeId, mission });
const offered = (down: SpareFacts, spares: SpareFacts[]) =>
  orderSpares(down, spares, (spare) => spare).map(({ spare, match }) => [spare.sideNumber, match]);

describe('orderSpares', () => {
  const down = aircraft('C22', 10, 'Strike training');

  it('offers spares of the same type first, then of the same mission, then the rest', () => {
    expect(
      offered(down, [
        aircraft('D40', 20, 'Tanker'),
        aircraft('D41', 20, 'strike training '),
        aircraft('C30', 10, 'Tanker'),
      ]),
    ).toEqual([
      ['C30', 'type'],
      ['D41', 'mission'],
      ['D40', 'other'],
    ]);
  });

  it('puts a spare of the same type before one of the same mission, even when the mission matches too', () => {
    expect(offered(down, [aircraft('A01', 20, 'Strike training'), aircraft('Z99', 10, 'Strike training')])).toEqual([
      ['Z99', 'type'],
      ['A01', 'mission'],
    ]);
  });

  it('orders spares of the same match by side number, 9 before 10', () => {
    expect(offered(down, [aircraft('C10', 10, 'x'), aircraft('C9', 10, 'x')])).toEqual([
      ['C9', 'type'],
      ['C10', 'type'],
    ]);
  });

  it('reads the facts of each spare through the given accessor and hands back the spare itself', () => {
    const slots = [{ id: 7, aircraft: { sideNumber: 'D41', typeId: 20 }, mission: 'Strike training' }];
    const [first] = orderSpares(down, slots, (slot) => ({ ...slot.aircraft, mission: slot.mission }));
    expect(first).toEqual({ spare: slots[0], match: 'mission' });
  });
});
