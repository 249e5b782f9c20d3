import type { UserView } from '@catline/contracts';
import { createUser, unique } from '../support/fleet-fixtures.js';
import type { MatrixContext, MatrixRoute } from './route-table.js';

// Refused callers all aim at one throwaway person; a permitted caller gets a fresh one to change.
let refusedTarget: Promise<UserView> | undefined;
async function targetId(context: MatrixContext): Promise<number> {
  const admin = context.tokenOf('admin');
  if (context.allowed) return (await createUser(context.baseUrl, admin)).id;
  refusedTarget ??= createUser(context.baseUrl, admin);
  return (await refusedTarget).id;
}

export const usersRoutes: MatrixRoute[] = [
  { method: 'GET', path: '/api/users', allowed: ['admin'] },
  { method: 'GET', path: '/api/users/pilots', allowed: ['admin', 'air_operations', 'handler'] },
  { method: 'GET', path: '/api/users/{id}', allowed: ['admin'], example: () => ({ params: { id: 1 } }) },
  {
    method: 'POST',
    path: '/api/users',
    allowed: ['admin'],
    example: () => ({
      body: {
        email: `${unique('matrix', 16).toLowerCase()}@catline.example`,
        name: 'Matrix person',
        role: 'observer',
        password: 'long enough password',
      },
    }),
  },
  {
    method: 'PATCH',
    path: '/api/users/{id}',
    allowed: ['admin'],
    example: async (context) => ({ params: { id: await targetId(context) }, body: { name: 'Matrix renamed' } }),
  },
  {
    method: 'DELETE',
    path: '/api/users/{id}',
    allowed: ['admin'],
    example: async (context) => ({ params: { id: await targetId(context) } }),
  },
];
