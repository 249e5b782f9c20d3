import { ROLES } from '@catline/contracts';
import type { MatrixRoute } from './route-table.js';

// Reading a cycle's record changes nothing: every caller aims at the demo cycle flown and closed earlier.
const FLOWN_CYCLE = 1;
const flown = () => ({ params: { cycleId: FLOWN_CYCLE } });
const range = () => ({ query: { from: '2027-01-01', to: '2027-01-31' } });

export const reportsRoutes: MatrixRoute[] = [
  { method: 'GET', path: '/api/cycles/{cycleId}/report', allowed: ROLES, example: flown },
  { method: 'GET', path: '/api/cycles/{cycleId}/replay', allowed: ROLES, example: flown },
  { method: 'GET', path: '/api/cycles/{cycleId}/slots.csv', allowed: ROLES, example: flown },
  { method: 'GET', path: '/api/cycles/{cycleId}/changes.csv', allowed: ROLES, example: flown },
  { method: 'GET', path: '/api/reports/shot-counts', allowed: ROLES, example: range },
  { method: 'GET', path: '/api/reports/shot-counts.csv', allowed: ROLES, example: range },
];
