import type { ClientToServerEvents, ServerToClientEvents } from '@catline/contracts';
import type { Server, Socket } from 'socket.io';
import type { AuthenticatedUser } from '../common/authenticated-user.js';

/** What the handshake puts on a socket: who is connected, and until when their token holds. */
export interface SocketSession {
  user: AuthenticatedUser;
  expiresAt: Date;
}

export type CatlineServer = Server<ClientToServerEvents, ServerToClientEvents, Record<string, never>, Partial<SocketSession>>;
export type CatlineSocket = Socket<ClientToServerEvents, ServerToClientEvents, Record<string, never>, Partial<SocketSession>>;

export const cycleRoom = (cycleId: number) => `cycle:${cycleId}`;
