import { ROLES } from '@catline/contracts';
import { createAircraft, unique } from '../support/fleet-fixtures.js';
import type { MatrixContext, MatrixRoute } from './route-table.js';

// A permitted caller changes an aircraft of its own; refused callers aim at demo aircraft 1.
async function targetId(context: MatrixContext): Promise<number> {
  return context.allowed ? (await createAircraft(context.baseUrl, context.tokenOf('admin'))).id : 1;
}

export const aircraftRoutes: MatrixRoute[] = [
  { method: 'GET', path: '/api/aircraft', allowed: ROLES },
  { method: 'GET', path: '/api/aircraft/{id}', allowed: ROLES, example: () => ({ params: { id: 1 } }) },
  {
    method: 'POST',
    path: '/api/aircraft',
    allowed: ['admin'],
    example: () => ({ body: { sideNumber: unique('M', 8), typeId: 1, squadronId: 1, parkedSpot: 'bow-2' } }),
  },
  {
    method: 'PATCH',
    path: '/api/aircraft/{id}',
    allowed: ['admin'],
    example: async (context) => ({ params: { id: await targetId(context) }, body: { parkedSpot: 'mid-1' } }),
  },
  {
    method: 'DELETE',
    path: '/api/aircraft/{id}',
    allowed: ['admin'],
    example: async (context) => ({ params: { id: await targetId(context) } }),
  },
];
