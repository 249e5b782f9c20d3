import { ROLES } from '@catline/contracts';
import { goodConditions } from '../support/lineup-fixtures.js';
import { lineupDriver } from './lineup-driver.js';
import type { MatrixContext, MatrixRoute } from './route-table.js';

// A permitted caller changes a cycle of its own; refused callers aim at demo cycle 2 (the day cycle).
const DEMO_CYCLE = 2;

async function targetCycle(context: MatrixContext): Promise<number> {
  return context.allowed ? (await lineupDriver(context).createCycle()).id : DEMO_CYCLE;
}

export const cyclesRoutes: MatrixRoute[] = [
  { method: 'GET', path: '/api/cycles', allowed: ROLES },
  { method: 'GET', path: '/api/cycles/landing', allowed: ROLES },
  {
    method: 'GET',
    path: '/api/cycles/{cycleId}',
    allowed: ROLES,
    example: () => ({ params: { cycleId: DEMO_CYCLE } }),
  },
  {
    method: 'POST',
    path: '/api/cycles',
    allowed: ['air_operations'],
    // The number is random; another spec's cycle may hold it.
    refusals: [409],
    example: () => ({
      body: {
        shipId: 1,
        number: 1000 + Math.floor(Math.random() * 8999),
        plannedLaunchAt: '2027-02-01T10:00:00.000Z',
        windowStartAt: '2027-02-01T09:50:00.000Z',
        windowEndAt: '2027-02-01T10:40:00.000Z',
        ...goodConditions,
      },
    }),
  },
  {
    method: 'PATCH',
    path: '/api/cycles/{cycleId}/conditions',
    allowed: ['air_operations'],
    example: async (context) => ({
      params: { cycleId: await targetCycle(context) },
      body: { basisVersion: 0, trueWindSpeedKt: 13 },
    }),
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/start',
    allowed: ['air_boss'],
    // The matrix's cycle is planned an hour ahead: the air boss is warned, and starting is not confirmed, so
    // no cycle of the demo ship is left launching.
    refusals: [409],
    example: async (context) => ({ params: { cycleId: await targetCycle(context) }, body: { basisVersion: 0 } }),
  },
  {
    method: 'PUT',
    path: '/api/cycles/{cycleId}/prerequisites/{number}',
    allowed: ['air_boss'],
    example: async (context) => ({
      params: { cycleId: await targetCycle(context), number: 1 },
      body: { ticked: true, basisVersion: 0 },
    }),
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/stop',
    allowed: ['air_boss'],
    // A cycle in planning does not stop: the answer is a refusal, after the role check let it through.
    refusals: [409],
    example: async (context) => ({ params: { cycleId: await targetCycle(context) }, body: { basisVersion: 0 } }),
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/close',
    allowed: ['air_operations'],
    example: async (context) => ({ params: { cycleId: await targetCycle(context) }, body: { basisVersion: 0 } }),
  },
  {
    method: 'POST',
    path: '/api/cycles/{cycleId}/slots',
    allowed: ['air_operations'],
    example: async (context) => ({
      params: { cycleId: await targetCycle(context) },
      body: {
        aircraftId: 1,
        pilotId: null,
        mission: 'Matrix sortie',
        fuelLb: 9000,
        stores: '',
        grossWeightLb: 42_000,
        tanker: false,
        earlyWarning: false,
        spare: false,
      },
    }),
  },
];
