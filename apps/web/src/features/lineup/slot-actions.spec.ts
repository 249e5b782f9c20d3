import type { ArmState, SlotView } from '@catline/contracts';
import { describe, expect, it, vi } from 'vitest';
import { slotActions, type SlotActionHandlers } from './slot-actions.js';

const slot = (extra: Partial<SlotView> = {}) =>
  ({ id: 4, sideNumber: 'G43', status: 'planned', heldSpare: false, pilotId: 9, armState: null, ...extra }) as SlotView;

const handlers = (): SlotActionHandlers => ({
  markDown: vi.fn(),
  assignPilot: vi.fn(),
  callSpare: vi.fn(),
  upAgain: vi.fn(),
  returnToPool: vi.fn(),
  setLoad: vi.fn(),
  recordArmState: vi.fn(),
});

const handler = { arranges: true, plans: true };
const armEntries = (card: SlotView, rights = handler) =>
  slotActions(card, rights, handlers())
    .filter((action) => action.id.startsWith('record-'))
    .map((action) => action.label);

describe('slotActions: armed or safe on the handler’s card', () => {
  it('offers both records, in the Cat station’s words, until one is recorded', () => {
    expect(armEntries(slot())).toEqual(['Record safe', 'Record armed']);
  });

  it('offers only the state not in force', () => {
    expect(armEntries(slot({ armState: 'armed' }))).toEqual(['Record safe']);
    expect(armEntries(slot({ status: 'on_catapult', armState: 'safe' }))).toEqual(['Record armed']);
  });

  it('offers none once the aircraft has launched or is scratched, nor to air operations', () => {
    expect(armEntries(slot({ status: 'launched' }))).toEqual([]);
    expect(armEntries(slot({ status: 'scratched' }))).toEqual([]);
    expect(armEntries(slot(), { arranges: false, plans: true })).toEqual([]);
  });

  it('records the chosen state for that aircraft', () => {
    const card = slot({ armState: 'safe' });
    const given = handlers();
    slotActions(card, handler, given)
      .find((action) => action.id === 'record-armed')
      ?.run();
    expect(given.recordArmState).toHaveBeenCalledWith(card, 'armed' satisfies ArmState);
  });
});
