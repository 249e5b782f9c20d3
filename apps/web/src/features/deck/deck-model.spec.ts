import type { LineupSnapshot, ShipView, SlotView } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import {
  deckPanels,
  isElsewhere,
  positionFromKey,
  positionKey,
  respotCandidates,
  respotSteps,
  towTargets,
} from './deck-model.js';

const ship = {
  deckSpots: [
    { name: 'b1', area: 'Bow', taxiS: { 1: 60 } },
    { name: 'b2', area: 'Bow', clearBefore: ['b1'], taxiS: { 1: 70 } },
    { name: 'lone', taxiS: { 1: 90 } },
  ],
  deckLayout: {
    elevators: [{ name: 'lift', cycleS: 50, taxiS: { 1: 80 } }],
    hangarBays: [{ name: 'bay', elevators: ['lift'] }],
    landingAreaCatapults: [],
  },
} as unknown as ShipView;

const slot = (id: number, deckPosition: SlotView['deckPosition']) =>
  ({ id, sideNumber: `X${id}`, deckPosition, status: 'planned' }) as SlotView;

const snapshot = (slots: SlotView[]) => ({ slots }) as LineupSnapshot;

describe('the deck screen model', () => {
  it('groups spots by deck area in the ship’s order, then elevators and hangar bays, with their aircraft', () => {
    const panels = deckPanels(
      ship,
      snapshot([slot(1, { kind: 'spot', name: 'b2' }), slot(2, { kind: 'hangar', name: 'bay' }), slot(3, null)]),
    );
    expect(panels.map((panel) => [panel.title, panel.places.map((place) => place.position.name)])).toEqual([
      ['Bow', ['b1', 'b2']],
      ['lone', ['lone']],
      ['Elevators', ['lift']],
      ['Hangar', ['bay']],
    ]);
    expect(panels[0].places[1].slots.map((on) => on.sideNumber)).toEqual(['X1']);
    expect(panels[3].places[0].slots.map((on) => on.sideNumber)).toEqual(['X2']);
  });

  it('offers free spots and elevators and every hangar bay, not where the aircraft already is', () => {
    const aboard = slot(1, { kind: 'spot', name: 'b2' });
    const panels = deckPanels(ship, snapshot([aboard, slot(2, { kind: 'spot', name: 'lone' })]));
    expect(towTargets(panels, aboard).map((position) => position.name)).toEqual(['b1', 'lift', 'bay']);
  });

  it('reads a place key back into its position, names with a colon included', () => {
    const position = { kind: 'elevator' as const, name: 'lift:fwd' };
    expect(positionFromKey(positionKey(position))).toEqual(position);
  });

  it('asks for a tow on a drop only somewhere other than where the aircraft is', () => {
    const aboard = slot(1, { kind: 'spot', name: 'b2' });
    const [bow] = deckPanels(ship, snapshot([aboard]));
    expect(bow.places.map((place) => isElsewhere(place, aboard))).toEqual([true, false]);
  });

  it('numbers the respot tows with their side numbers, the first not done being next', () => {
    const tows = [
      {
        slotId: 1,
        from: { kind: 'spot', name: 'b1' },
        to: { kind: 'spot', name: 'lone' },
        doneAt: '2026-12-02T13:00:00Z',
      },
      { slotId: 2, from: { kind: 'hangar', name: 'bay' }, to: { kind: 'spot', name: 'b1' }, doneAt: null },
    ] as const;
    const steps = respotSteps({
      cycle: { respot: { targets: [], tows } },
      slots: [slot(1, null), slot(2, null)],
    } as unknown as LineupSnapshot);
    expect(steps.map((step) => [step.step, step.sideNumber, step.next])).toEqual([
      [1, 'X1', false],
      [2, 'X2', true],
    ]);
  });

  it('offers aircraft on deck or below and airborne ones for the respot, not those taxiing', () => {
    const taxiing = { ...slot(3, { kind: 'spot', name: 'b2' }), status: 'taxiing' } as SlotView;
    const airborne = { ...slot(2, null), status: 'launched' } as SlotView;
    const candidates = respotCandidates(snapshot([slot(1, { kind: 'spot', name: 'b1' }), airborne, taxiing]));
    expect(candidates.map(({ slot: on, now }) => [on.sideNumber, now?.name ?? null])).toEqual([
      ['X1', 'b1'],
      ['X2', null],
    ]);
  });
});
