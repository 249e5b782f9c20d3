import { ROLES } from '@catline/contracts';
import { aircraftTypeBody, createAircraftType } from '../support/fleet-fixtures.js';
import type { MatrixContext, MatrixRoute } from './route-table.js';

// A permitted caller changes a type of its own; refused callers aim at a demo type.
async function targetId(context: MatrixContext): Promise<number> {
  return context.allowed ? (await createAircraftType(context.baseUrl, context.tokenOf('admin'))).id : 1;
}

export const aircraftTypesRoutes: MatrixRoute[] = [
  { method: 'GET', path: '/api/aircraft-types', allowed: ROLES },
  { method: 'GET', path: '/api/aircraft-types/{id}', allowed: ROLES, example: () => ({ params: { id: 1 } }) },
  { method: 'POST', path: '/api/aircraft-types', allowed: ['admin'], example: () => ({ body: aircraftTypeBody() }) },
  {
    method: 'PATCH',
    path: '/api/aircraft-types/{id}',
    allowed: ['admin'],
    example: async (context) => ({ params: { id: await targetId(context) }, body: { name: 'Matrix renamed' } }),
  },
  {
    method: 'PUT',
    path: '/api/aircraft-types/{id}/launch-table',
    allowed: ['admin'],
    example: async (context) => ({
      params: { id: await targetId(context) },
      body: { rows: aircraftTypeBody().launchTable },
    }),
  },
  {
    method: 'PUT',
    path: '/api/aircraft-types/{id}/stores-catalogue',
    allowed: ['admin'],
    example: async (context) => ({
      params: { id: await targetId(context) },
      body: { items: [{ name: 'Matrix pod', weightEachLb: 300 }] },
    }),
  },
  {
    method: 'PUT',
    path: '/api/aircraft-types/{id}/setting-tables',
    allowed: ['admin'],
    example: async (context) => ({
      params: { id: await targetId(context) },
      body: {
        tables: [
          {
            catapultNumber: 1,
            configuration: 'clean',
            recommendedExcessKt: 10,
            rows: [{ upToLb: 30_000, setting: 5 }],
          },
        ],
      },
    }),
  },
  {
    method: 'DELETE',
    path: '/api/aircraft-types/{id}',
    allowed: ['admin'],
    example: async (context) => ({ params: { id: await targetId(context) } }),
  },
];
