import { ROLES } from '@catline/contracts';
import { createSquadron, unique } from '../support/fleet-fixtures.js';
import type { MatrixContext, MatrixRoute } from './route-table.js';

// A permitted caller changes a squadron of its own; refused callers aim at a demo squadron.
async function targetId(context: MatrixContext): Promise<number> {
  return context.allowed ? (await createSquadron(context.baseUrl, context.tokenOf('admin'))).id : 1;
}

export const squadronsRoutes: MatrixRoute[] = [
  { method: 'GET', path: '/api/squadrons', allowed: ROLES },
  { method: 'GET', path: '/api/squadrons/{id}', allowed: ROLES, example: () => ({ params: { id: 1 } }) },
  {
    method: 'POST',
    path: '/api/squadrons',
    allowed: ['admin'],
    example: () => ({ body: { name: 'Matrix squadron', code: unique('M', 12), email: 'matrix@catline.example' } }),
  },
  {
    method: 'PATCH',
    path: '/api/squadrons/{id}',
    allowed: ['admin'],
    example: async (context) => ({ params: { id: await targetId(context) }, body: { name: 'Matrix renamed' } }),
  },
  {
    method: 'DELETE',
    path: '/api/squadrons/{id}',
    allowed: ['admin'],
    example: async (context) => ({ params: { id: await targetId(context) } }),
  },
];
