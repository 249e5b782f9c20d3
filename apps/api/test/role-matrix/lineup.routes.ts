import { CATAPULT_ROLES, ROLES } from '@catline/contracts';
import { pilot } from '../support/lineup-fixtures.js';
import { demoEmail } from '../support/sign-in.js';
import { lineupDriver } from './lineup-driver.js';
import type { MatrixContext, MatrixRoute } from './route-table.js';

// A permitted caller acts on a fresh cycle of its own, set up as far as its command needs (the
// catapult officer is cat1@, the pilot pilot@); refused callers aim at the demo day cycle.
const DEMO_CYCLE = 2;
const refused = { params: { cycleId: DEMO_CYCLE, slotId: 1, catapultId: 1 }, body: {} };
/** The same roles on cat 2, for commands on a slot of cat 1. */
const OTHER_CATAPULT = { catapult_officer: 'cat2@catline.example', deck_edge_operator: 'deo2@catline.example' };

type Stage = 'pool' | 'lane' | 'executing' | 'taxiing' | 'tensioned';

/** A fresh cycle with one aircraft (flown by pilot@) taken to `stage` on cat 1. */
async function freshSlot(context: MatrixContext, stage: Stage) {
  const deck = lineupDriver(context);
  const cycle = await deck.createCycle();
  const slot = await deck.addSlot(cycle.id, 'C21', { pilotEmail: pilot(1) });
  if (stage !== 'pool') await deck.place(cycle.id, slot.id, 1);
  if (stage === 'executing' || stage === 'taxiing' || stage === 'tensioned') await deck.start(cycle.id);
  if (stage === 'taxiing') await deck.step(cycle.id, slot.id, 'taxiing');
  if (stage === 'tensioned') await deck.readyToLaunch(cycle.id, slot.id, pilot(1));
  return { deck, cycleId: cycle.id, slot: await deck.slot(cycle.id, slot.id), catapultId: await deck.catapultId(1) };
}

/** A fresh cycle whose aircraft on cat 1 is down, with a spare held aside (C28, no pilot). */
async function downWithSpare(context: MatrixContext) {
  const { deck, cycleId, slot } = await freshSlot(context, 'lane');
  const spare = await deck.addSlot(cycleId, 'C28', { spare: true });
  await deck.ok('handler@catline.example', 'post', `/api/cycles/${cycleId}/lineup/slots/${slot.id}/down`, {
    slotVersion: slot.version,
  });
  return { cycleId, down: await deck.slot(cycleId, slot.id), spare: await deck.slot(cycleId, spare.id) };
}

export const lineupRoutes: MatrixRoute[] = [
  {
    method: 'GET',
    path: '/api/cycles/{cycleId}/lineup',
    allowed: ROLES,
    example: () => ({ params: { cycleId: DEMO_CYCLE } }),
  },
  {
    method: 'GET',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}',
    allowed: ROLES,
    example: async (context) => {
      const [slot] = (await lineupDriver(context).snapshot(DEMO_CYCLE)).slots;
      return { params: { cycleId: DEMO_CYCLE, slotId: slot.id } };
    },
  },
  {
    method: 'GET',
    path: '/api/cycles/{cycleId}/lineup/changes',
    allowed: ROLES,
    example: () => ({ params: { cycleId: DEMO_CYCLE }, query: { since: 0 } }),
  },
  {
    method: 'GET',
    path: '/api/cycles/{cycleId}/lineup/suggestion',
    allowed: ['handler'],
    example: () => ({ params: { cycleId: DEMO_CYCLE } }),
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/moves',
    allowed: ['handler'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot, catapultId } = await freshSlot(context, 'pool');
      return {
        params: { cycleId },
        body: { slotId: slot.id, slotVersion: slot.version, toCatapultId: catapultId, toIndex: 0, targetLaneOrder: [] },
      };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/suggestion/apply',
    allowed: ['handler'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { deck, cycleId, slot, catapultId } = await freshSlot(context, 'pool');
      const { version } = await deck.snapshot(cycleId);
      return { params: { cycleId }, body: { basisVersion: version, lanes: [{ catapultId, slotIds: [slot.id] }] } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/down',
    allowed: ['handler'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'lane');
      return { params: { cycleId, slotId: slot.id }, body: { slotVersion: slot.version } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/catapults/{catapultId}/status',
    allowed: ['handler'],
    // Catapults belong to the ship every spec shares: the permitted call asks for the status it already
    // has, which is refused past the role check (409 no_change) and changes nothing.
    refusals: [409],
    example: async (context) =>
      context.allowed
        ? { params: { cycleId: DEMO_CYCLE, catapultId: 1 }, body: { status: 'up', basisStatus: 'up' } }
        : refused,
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/advance',
    allowed: CATAPULT_ROLES,
    notOwner: OTHER_CATAPULT,
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'executing');
      return { params: { cycleId, slotId: slot.id }, body: { slotVersion: slot.version, to: 'taxiing' } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/suspend',
    allowed: [...CATAPULT_ROLES, 'pilot', 'air_boss'],
    notOwner: { ...OTHER_CATAPULT, pilot: 'pilot2@catline.example' },
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'taxiing');
      return { params: { cycleId, slotId: slot.id }, body: { slotVersion: slot.version, reason: 'Matrix hold' } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/suspend-reason',
    allowed: [...CATAPULT_ROLES, 'pilot', 'air_boss'],
    notOwner: { ...OTHER_CATAPULT, pilot: 'pilot2@catline.example' },
    example: async (context) => {
      if (!context.allowed) return refused;
      const { deck, cycleId, slot } = await freshSlot(context, 'taxiing');
      await deck.ok('cat1@catline.example', 'post', `/api/cycles/${cycleId}/lineup/slots/${slot.id}/suspend`, {
        slotVersion: slot.version,
      });
      const suspended = await deck.slot(cycleId, slot.id);
      return { params: { cycleId, slotId: slot.id }, body: { slotVersion: suspended.version, reason: 'holdback' } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/undo',
    allowed: CATAPULT_ROLES,
    notOwner: OTHER_CATAPULT,
    example: async (context) => {
      if (!context.allowed) return refused;
      const { deck, cycleId, slot } = await freshSlot(context, 'executing');
      // Only the person who took the step may undo it: the caller takes it first.
      await deck.step(cycleId, slot.id, 'taxiing', demoEmail(context.caller!));
      return {
        params: { cycleId, slotId: slot.id },
        body: { slotVersion: (await deck.slot(cycleId, slot.id)).version },
      };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/launch',
    allowed: CATAPULT_ROLES,
    notOwner: OTHER_CATAPULT,
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'tensioned');
      return {
        params: { cycleId, slotId: slot.id },
        body: { slotVersion: slot.version, idempotencyKey: `matrix-${cycleId}-${slot.id}` },
      };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/hangfire',
    allowed: CATAPULT_ROLES,
    notOwner: OTHER_CATAPULT,
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'tensioned');
      return { params: { cycleId, slotId: slot.id }, body: { slotVersion: slot.version } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/cold-shot',
    allowed: CATAPULT_ROLES,
    notOwner: OTHER_CATAPULT,
    // A cold shot takes the ship's shared catapult down: the permitted call reports one on an aircraft that
    // has not launched, refused past the role check (409 wrong_step), which changes nothing.
    refusals: [409],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'taxiing');
      return { params: { cycleId, slotId: slot.id }, body: { slotVersion: slot.version } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/down-on-catapult',
    allowed: CATAPULT_ROLES,
    notOwner: OTHER_CATAPULT,
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'tensioned');
      return { params: { cycleId, slotId: slot.id }, body: { slotVersion: slot.version, outcome: 'pool' } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/waivers',
    allowed: ['air_boss'],
    // The fresh aircraft's gates are all hard or open: the permitted call is refused past the role check
    // (409 nothing_to_waive), which changes nothing.
    refusals: [409],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'executing');
      return {
        params: { cycleId, slotId: slot.id },
        body: { slotVersion: slot.version, gate: 'excess_below_recommended', reason: 'Matrix waiver' },
      };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/weight-ack',
    allowed: ['pilot'],
    notOwner: { pilot: 'pilot2@catline.example' },
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'pool');
      return {
        params: { cycleId, slotId: slot.id },
        body: { slotVersion: slot.version, grossWeightLb: slot.grossWeightLb },
      };
    },
  },
  {
    method: 'GET',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/spares',
    allowed: ['handler'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, down } = await downWithSpare(context);
      return { params: { cycleId, slotId: down.id } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/spare',
    allowed: ['handler'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, down, spare } = await downWithSpare(context);
      return {
        params: { cycleId, slotId: down.id },
        body: { slotVersion: down.version, spareSlotId: spare.id, spareVersion: spare.version },
      };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/up',
    allowed: ['handler'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, down } = await downWithSpare(context);
      return { params: { cycleId, slotId: down.id }, body: { slotVersion: down.version, reason: 'Hydraulics fixed' } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/pilot',
    allowed: ['handler', 'air_operations'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'pool');
      return { params: { cycleId, slotId: slot.id }, body: { slotVersion: slot.version, pilotId: null } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/load',
    allowed: ['handler', 'air_operations'],
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'pool');
      return {
        params: { cycleId, slotId: slot.id },
        body: { slotVersion: slot.version, fuelLb: 9_000, stores: [{ name: 'Practice bomb', count: 2 }] },
      };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/arm-state',
    allowed: ['handler', 'catapult_officer', 'deck_edge_operator'],
    // The crew of another catapult may not record it.
    notOwner: OTHER_CATAPULT,
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'lane');
      return { params: { cycleId, slotId: slot.id }, body: { slotVersion: slot.version, armState: 'armed' } };
    },
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/lineup/slots/{slotId}/return',
    allowed: ['catapult_officer', 'handler'],
    // The officer of another catapult may not return it (the handler needs the officer's agreement).
    notOwner: { catapult_officer: 'cat2@catline.example' },
    example: async (context) => {
      if (!context.allowed) return refused;
      const { cycleId, slot } = await freshSlot(context, 'taxiing');
      return {
        params: { cycleId, slotId: slot.id },
        body: { slotVersion: slot.version, reason: 'Matrix return', catapultOfficerAgreed: true },
      };
    },
  },
];
