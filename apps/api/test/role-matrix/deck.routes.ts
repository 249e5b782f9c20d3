import { lineupDriver } from './lineup-driver.js';
import type { MatrixContext, MatrixRoute } from './route-table.js';

// A permitted caller acts on a fresh cycle of its own; refused callers aim at the demo day cycle.
const DEMO_CYCLE = 2;
const refused = { params: { cycleId: DEMO_CYCLE }, body: {} };

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
      // The aft elevator serves both demo hangar bays, so it is reachable from anywhere but itself.
      const onLift = slot.deckPosition?.kind === 'elevator' && slot.deckPosition.name === 'lift-aft';
      const to = onLift ? { kind: 'hangar', name: 'bay-B' } : { kind: 'elevator', name: 'lift-aft' };
      return { params: { cycleId }, body: { slotId: slot.id, slotVersion: slot.version, to } };
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
];
