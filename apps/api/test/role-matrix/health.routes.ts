import type { MatrixRoute } from './route-table.js';

export const healthRoutes: MatrixRoute[] = [{ method: 'GET', path: '/api/health', allowed: 'public' }];
