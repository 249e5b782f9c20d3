import { AsyncLocalStorage } from 'node:async_hooks';
import type { NextFunction, Request, Response } from 'express';
import type { AuthenticatedUser } from './authenticated-user.js';

/** What the code serving one HTTP request may ask about it without being handed it: the caller and their address. */
export interface RequestContext {
  clientAddress: string | null;
  /** Set by the auth guard once the access token checks out. */
  actor: AuthenticatedUser | null;
}

const storage = new AsyncLocalStorage<RequestContext>();

/** Express middleware: everything that runs for this request (guards, pipes, handler, services) sees one context. */
export function withRequestContext(request: Request, _response: Response, next: NextFunction): void {
  storage.run({ clientAddress: request.ip ?? null, actor: null }, next);
}

/** The current request's context; undefined outside a request (socket events, timers, the mail sender). */
export function requestContext(): RequestContext | undefined {
  return storage.getStore();
}
