import { Injectable } from '@nestjs/common';
import type { EndedSessions } from '../auth/session-ends.service.js';
import type { VerifiedSession } from '../auth/token-verifier.service.js';
import { type CatlineServer, type CatlineSocket, personRoom, sessionRoom, shipRoom } from './socket.types.js';

/**
 * A socket lives as long as the access token it was opened (or last refreshed) with: when the token
 * expires, or its session or person's sessions end, the server says so ('session:expired') and
 * disconnects it.
 */
@Injectable()
export class SocketSessions {
  private readonly timers = new WeakMap<CatlineSocket, NodeJS.Timeout>();

  start(socket: CatlineSocket, session: VerifiedSession): void {
    this.renew(socket, session);
    socket.once('disconnect', () => clearTimeout(this.timers.get(socket)));
  }

  renew(socket: CatlineSocket, session: VerifiedSession): void {
    const previous = socket.data.claims?.sid;
    if (previous !== undefined && previous !== session.claims.sid) void socket.leave(sessionRoom(previous));
    void socket.join([personRoom(session.user.id), sessionRoom(session.claims.sid), shipRoom(session.user.shipId)]);
    socket.data.user = session.user;
    socket.data.claims = session.claims;
    socket.data.expiresAt = session.expiresAt;
    clearTimeout(this.timers.get(socket));
    const timer = setTimeout(() => this.expire(socket), Math.max(0, session.expiresAt.getTime() - Date.now()));
    timer.unref();
    this.timers.set(socket, timer);
  }

  /** Disconnects the ended sessions' sockets, on this process and (through the rooms' adapter) every other. */
  end(server: CatlineServer, ended: EndedSessions): void {
    const room = 'personId' in ended ? personRoom(ended.personId) : sessionRoom(ended.sessionId);
    server.to(room).emit('session:expired');
    server.in(room).disconnectSockets(true);
  }

  private expire(socket: CatlineSocket): void {
    socket.emit('session:expired');
    socket.disconnect(true);
  }
}
