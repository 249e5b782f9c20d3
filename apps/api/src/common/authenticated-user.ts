import type { Role } from '@catline/contracts';

/** The person behind a verified access token, as the guards put it on the request or socket. */
export interface AuthenticatedUser {
  id: number;
  email: string;
  name: string;
  role: Role;
  catapultId: number | null;
  /** The ship whose data they work on; null for a fleet admin (see ship-scope.ts). */
  shipId: number | null;
}
