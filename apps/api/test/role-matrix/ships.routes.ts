import { ROLES } from '@catline/contracts';
import { demoCatapults, demoDeckLayout, demoDeckSpots, demoShip } from '../../src/database/seeds/demo-fleet.js';
import type { MatrixRoute } from './route-table.js';

// The demo ship and its catapult 1 (ids 1 in the fresh test database), patched to the values they have.
export const shipsRoutes: MatrixRoute[] = [
  { method: 'GET', path: '/api/ships', allowed: ROLES },
  { method: 'GET', path: '/api/ships/{shipId}', allowed: ROLES, example: () => ({ params: { shipId: 1 } }) },
  {
    method: 'PATCH',
    path: '/api/ships/{shipId}',
    allowed: ['admin'],
    example: () => ({ params: { shipId: 1 }, body: { pairGapS: demoShip.pairGapS } }),
  },
  {
    method: 'PUT',
    path: '/api/ships/{shipId}/deck-layout',
    allowed: ['admin'],
    example: () => ({ params: { shipId: 1 }, body: { deckSpots: demoDeckSpots, ...demoDeckLayout } }),
  },
  {
    method: 'PATCH',
    path: '/api/ships/{shipId}/catapults/{catapultId}',
    allowed: ['admin'],
    example: () => ({
      params: { shipId: 1, catapultId: 1 },
      body: { resetIntervalS: demoCatapults[0].resetIntervalS },
    }),
  },
];
