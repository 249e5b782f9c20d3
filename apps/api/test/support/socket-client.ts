import type {
  ClientToServerEvents,
  JoinCycleRequest,
  JoinCycleResult,
  LineupChange,
  ServerToClientEvents,
} from '@catline/contracts';
import { io, type Socket } from 'socket.io-client';

export type ClientSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

/** A socket.io client as the web app opens one (websocket transport), with the Origin header a browser would send. */
export function openSocket(url: string, options: { token?: string; origin?: string }): ClientSocket {
  return io(url, {
    transports: ['websocket'],
    reconnection: false,
    forceNew: true,
    auth: options.token === undefined ? {} : { token: options.token },
    extraHeaders: options.origin === undefined ? {} : { origin: options.origin },
  });
}

/** Resolves on connect; rejects with the server's refusal (message and `data.code`). */
export function connected(socket: ClientSocket): Promise<void> {
  return new Promise((resolve, reject) => {
    socket.once('connect', () => resolve());
    socket.once('connect_error', (error) => reject(error));
  });
}

export async function join(socket: ClientSocket, request: JoinCycleRequest): Promise<JoinCycleResult> {
  return socket.timeout(10_000).emitWithAck('cycle:join', request);
}

/** Keeps every lineup change a socket receives, in arrival order. */
export function recordChanges(socket: ClientSocket): LineupChange[] {
  const received: LineupChange[] = [];
  socket.on('lineup:change', (change) => received.push(change));
  return received;
}

/** Polls until `done` holds, failing after `timeoutMs`. */
export async function eventually(done: () => boolean, timeoutMs: number, what: string): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!done()) {
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}
