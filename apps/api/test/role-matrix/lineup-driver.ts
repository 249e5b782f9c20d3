import { ROLES } from '@catline/contracts';
import { LineupDriver } from '../support/lineup-fixtures.js';
import { demoEmail } from '../support/sign-in.js';
import type { MatrixContext } from './route-table.js';

/** A lineup driver that uses the matrix's own tokens for the demo people it holds. */
export function lineupDriver(context: MatrixContext): LineupDriver {
  return new LineupDriver(context.baseUrl, (email) => {
    const role = ROLES.find((candidate) => demoEmail(candidate) === email);
    return role === undefined ? undefined : context.tokenOf(role);
  });
}
