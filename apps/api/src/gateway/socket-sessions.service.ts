import { Injectable } from '@nestjs/common';
import type { VerifiedSession } from '../auth/token-verifier.service.js';
import type { CatlineSocket } from './socket.types.js';

/**
 * A socket lives as long as the access token it was opened (or last refreshed) with: when the token
 * expires the server says so ('session:expired') and disconnects it.
 */
@Injectable()
export class SocketSessions {
  private readonly timers = new WeakMap<CatlineSocket, NodeJS.Timeout>();

  start(socket: CatlineSocket, session: VerifiedSession): void {
    this.renew(socket, session);
    socket.once('disconnect', () => clearTimeout(this.timers.get(socket)));
  }

  renew(socket: CatlineSocket, session: VerifiedSession): void {
    socket.data.user = session.user;
    socket.data.expiresAt = session.expiresAt;
    clearTimeout(this.timers.get(socket));
    const timer = setTimeout(
      () => {
        socket.emit('session:expired');
        socket.disconnect(true);
      },
      Math.max(0, session.expiresAt.getTime() - Date.now()),
    );
    timer.unref();
    this.timers.set(socket, timer);
  }
}
