// The role matrix: one row per route of the API, saying who may call it. role-matrix.e2e-spec.ts calls
// every route as every role and without a token, and fails when the app has a route without a row here.
//
// To add a table: create `<feature>.routes.ts` beside this file exporting `export const <feature>Routes:
// MatrixRoute[] = [...]` (one row per method and path, the path as the OpenAPI document writes it, e.g.
// `/api/cycles/{id}/start`; see route-table.ts for the fields), import it below and spread it into
// `matrixRoutes`. Give each row an `example` that a permitted caller can run successfully; a row whose
// example consumes its target (delete, launch) should build a fresh target whenever `allowed` is true.
import { aircraftTypesRoutes } from './aircraft-types.routes.js';
import { aircraftRoutes } from './aircraft.routes.js';
import { auditRoutes } from './audit.routes.js';
import { authRoutes } from './auth.routes.js';
import { cyclesRoutes } from './cycles.routes.js';
import { deckRoutes } from './deck.routes.js';
import { healthRoutes } from './health.routes.js';
import { importsRoutes } from './imports.routes.js';
import { lineupRoutes } from './lineup.routes.js';
import { passwordLinksRoutes } from './password-links.routes.js';
import { reportsRoutes } from './reports.routes.js';
import type { MatrixRoute } from './route-table.js';
import { shipsRoutes } from './ships.routes.js';
import { squadronsRoutes } from './squadrons.routes.js';
import { usersRoutes } from './users.routes.js';

export type { MatrixContext, MatrixRoute, RouteExample } from './route-table.js';
export { type MatrixSocketEvent, matrixSocketEvents } from './socket-events.js';

export const matrixRoutes: MatrixRoute[] = [
  ...healthRoutes,
  ...authRoutes,
  ...usersRoutes,
  ...shipsRoutes,
  ...deckRoutes,
  ...squadronsRoutes,
  ...aircraftTypesRoutes,
  ...aircraftRoutes,
  ...cyclesRoutes,
  ...lineupRoutes,
  ...importsRoutes,
  ...passwordLinksRoutes,
  ...reportsRoutes,
  ...auditRoutes,
];
