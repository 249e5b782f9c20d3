import type { MatrixRoute } from './route-table.js';

export const auditRoutes: MatrixRoute[] = [
  { method: 'GET', path: '/api/audit', allowed: ['admin'], example: () => ({ query: { limit: 5 } }) },
  {
    method: 'GET',
    path: '/api/audit/export.csv',
    allowed: ['admin'],
    example: () => ({ query: { action: 'cycle.created' } }),
  },
];
