import type { GatewayRefusalCode } from '@catline/contracts';
import { Logger } from '@nestjs/common';
import type { TokenVerifier } from '../auth/token-verifier.service.js';
import type { SocketSessions } from './socket-sessions.service.js';
import type { CatlineSocket } from './socket.types.js';

const logger = new Logger('SocketHandshake');

function refuse(code: GatewayRefusalCode, message: string): Error {
  return Object.assign(new Error(message), { data: { code } });
}

/**
 * socket.io middleware run once per connection, before any event: the Origin header must be one of
 * WEB_ORIGINS (always; scripts and tests send one too), and `handshake.auth.token` a valid access token.
 * A refused client gets `connect_error` with the message and `data.code`.
 */
export function socketHandshake(verifier: TokenVerifier, sessions: SocketSessions, origins: readonly string[]) {
  return (socket: CatlineSocket, next: (error?: Error) => void): void => {
    const origin = socket.handshake.headers.origin;
    if (!origin || !origins.includes(origin)) {
      logger.warn(`Refused a socket from origin ${origin ?? '(none)'}`);
      next(refuse('origin_refused', 'This page is not allowed to connect to Catline.'));
      return;
    }
    const token: unknown = socket.handshake.auth?.token;
    if (typeof token !== 'string' || token.length === 0) {
      next(refuse('unauthenticated', 'Sign in to connect.'));
      return;
    }
    verifier.verifySession(token).then(
      (session) => {
        sessions.start(socket, session);
        next();
      },
      (error: unknown) => next(refuse('session_invalid', error instanceof Error ? error.message : 'Sign in again.')),
    );
  };
}
