import type { ArmState, LaunchGateView, SlotView } from '@catline/contracts';
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
  waive: vi.fn(),
});

const handler = { arranges: true, plans: true, waives: false };
const airBoss = { arranges: false, plans: false, waives: true };
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
    expect(armEntries(slot(), { arranges: false, plans: true, waives: false })).toEqual([]);
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

const gate = (code: LaunchGateView['gate'], soft: boolean, waived = false): LaunchGateView => ({
  gate: code,
  soft,
  waived,
  message: `${code} closed`,
});

describe('slotActions: the air boss’s waivers', () => {
  const waiverEntries = (card: SlotView, rights = airBoss) =>
    slotActions(card, rights, handlers())
      .filter((action) => action.id.startsWith('waive-'))
      .map((action) => action.label);

  it('offers one waiver per soft gate still closed, none for a hard gate or one already waived', () => {
    const held = slot({
      status: 'on_catapult',
      gates: [
        gate('deck_not_clear', false),
        gate('excess_below_recommended', true),
        gate('wind_reading_stale', true, true),
      ],
    });
    expect(waiverEntries(held)).toEqual(['Grant waiver: excess wind over deck below the recommended value…']);
  });

  it('offers none to anyone but the air boss, nor to an aircraft in the deck pool', () => {
    const held = slot({ status: 'on_catapult', gates: [gate('wind_reading_stale', true)] });
    expect(waiverEntries(held, handler)).toEqual([]);
    expect(waiverEntries(slot({ gates: null }))).toEqual([]);
  });

  it('waives the chosen gate of that aircraft', () => {
    const stale = gate('wind_reading_stale', true);
    const card = slot({ status: 'on_catapult', gates: [stale] });
    const given = handlers();
    slotActions(card, airBoss, given)
      .find((action) => action.id === 'waive-wind_reading_stale')
      ?.run();
    expect(given.waive).toHaveBeenCalledWith(card, stale);
  });
});
