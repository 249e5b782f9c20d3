import type { SlotView } from '@catline/contracts';
import { HANDLER } from '../support/lineup-fixtures.js';
import { lineupDriver } from './lineup-driver.js';
import type { MatrixContext, MatrixRoute } from './route-table.js';

// A permitted caller acts on a fresh cycle of its own; refused callers aim at the demo day cycle.
const DEMO_CYCLE = 2;
const refused = { params: { cycleId: DEMO_CYCLE }, body: {} };

/** A free position for the slot to go to: the aft elevator serves both demo hangar bays. */
const elsewhere = (slot: SlotView) =>
  slot.deckPosition?.kind === 'elevator' && slot.deckPosition.name === 'lift-aft'
    ? { kind: 'hangar', name: 'bay-B' }
    : { kind: 'elevator', name: 'lift-aft' };

/** A fresh cycle with one aircraft in its deck pool. */
async function freshCycle(context: MatrixContext) {
  const deck = lineupDriver(context);
  const cycle = await deck.createCycle();
  const slot = await deck.addSlot(cycle.id, 'C22');
  return {
    cycleId: cycle.id,
    slot: await deck.slot(cycle.id, slot.id),
    version: (await deck.snapshot(cycle.id)).version,
  };
}

export const deckRoutes: MatrixRoute[] = [
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/deck/tows',
    allowed: ['handler'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshCycle(context);
      return { params: { cycleId }, body: { slotId: slot.id, slotVersion: slot.version, to: elsewhere(slot) } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/deck/landing-area',
    allowed: ['air_boss', 'handler'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, version } = await freshCycle(context);
      return { params: { cycleId }, body: { state: 'fouled', reason: 'Arresting wire down', basisVersion: version } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/deck/catapult-status',
    allowed: ['air_boss'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, version } = await freshCycle(context);
      const catapultId = await lineupDriver(context).catapultId(1);
      return {
        params: { cycleId },
        body: { catapultId, clear: false, reason: 'Deck crew forward', basisVersion: version },
      };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/deck/respot',
    allowed: ['handler'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot, version } = await freshCycle(context);
      return {
        params: { cycleId },
        body: { targets: [{ slotId: slot.id, to: elsewhere(slot) }], basisVersion: version },
      };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/deck/respot/tows/{step}',
    allowed: ['handler'],
    example: async (context) => {
      if (!context.allowed) return { params: { cycleId: DEMO_CYCLE, step: 1 }, body: {} };
      const { cycleId, slot, version } = await freshCycle(context);
      const deck = lineupDriver(context);
      await deck.call(HANDLER, 'post', `/api/cycles/${cycleId}/deck/respot`, {
        targets: [{ slotId: slot.id, to: elsewhere(slot) }],
        basisVersion: version,
      });
      return { params: { cycleId, step: 1 }, body: { basisVersion: (await deck.snapshot(cycleId)).version } };
    },
  },
];
