import { ROLES, type Role } from '@catline/contracts';

/** One socket event the gateway answers, who may send it, and a valid request for a cycle. */
export interface MatrixSocketEvent {
  event: string;
  allowed: readonly Role[];
  /** What the event changes in the database: nothing, for every event (commands go through REST). */
  mutates: false;
  example: (cycleId: number, ownToken: string) => object;
}

// Every role may follow a cycle and keep its socket's session fresh; none may change anything over the
// socket. socket-role-matrix in security.e2e-spec.ts fails when the gateway answers an event missing here.
export const matrixSocketEvents: MatrixSocketEvent[] = [
  { event: 'cycle:join', allowed: ROLES, mutates: false, example: (cycleId) => ({ cycleId }) },
  { event: 'cycle:leave', allowed: ROLES, mutates: false, example: (cycleId) => ({ cycleId }) },
  {
    event: 'session:refresh',
    allowed: ROLES,
    mutates: false,
    example: (_cycleId, ownToken) => ({ accessToken: ownToken }),
  },
];
