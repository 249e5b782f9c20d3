import type { ClientToServerEvents, ServerToClientEvents } from '@catline/contracts';
import type { Server, Socket } from 'socket.io';
import type { SessionClaims } from '../auth/token-verifier.service.js';
import type { AuthenticatedUser } from '../common/authenticated-user.js';

/** What the handshake puts on a socket: who is connected, their token's session, and until when it holds. */
export interface SocketSession {
  user: AuthenticatedUser;
  claims: SessionClaims;
  expiresAt: Date;
}

/** What API processes tell each other through the Redis adapter when several serve one board. */
export interface ProcessToProcessEvents {
  /** A process committed `version` of the cycle and is broadcasting it now. */
  'lineup:committed': (cycleId: number, version: number) => void;
}

export type CatlineServer = Server<
  ClientToServerEvents,
  ServerToClientEvents,
  ProcessToProcessEvents,
  Partial<SocketSession>
>;
export type CatlineSocket = Socket<
  ClientToServerEvents,
  ServerToClientEvents,
  ProcessToProcessEvents,
  Partial<SocketSession>
>;

export const cycleRoom = (cycleId: number) => `cycle:${cycleId}`;
/** Every socket is in its person's room and its session's room, so ending either disconnects it on every process. */
export const personRoom = (personId: number) => `person:${personId}`;
export const sessionRoom = (sessionId: string) => `session:${sessionId}`;
/** Every socket is in its ship's room (a fleet admin's in the fleet's), where each cycle's status changes go. */
export const shipRoom = (shipId: number | null) => (shipId === null ? 'fleet' : `ship:${shipId}`);
