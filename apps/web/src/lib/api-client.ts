import type { SessionResponse } from '@catline/contracts';
import { ApiRequestError, toApiRequestError, unreachableServer } from './api-error.js';
import { endSession, getAccessToken, getSession, startSession } from './session-store.js';

export const SESSION_ENDED_NOTICE = 'Your session has ended. Sign in again and you will return to where you were.';

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions {
  method?: Method;
  body?: unknown;
  signal?: AbortSignal;
}

async function send(path: string, { method = 'GET', body, signal }: RequestOptions, token: string | null) {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (token) headers.Authorization = `Bearer ${token}`;
  try {
    return await fetch(`/api${path}`, {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      signal,
      credentials: 'same-origin',
    });
  } catch (error) {
    if (signal?.aborted) throw error;
    throw unreachableServer();
  }
}

async function read<T>(response: Response): Promise<T> {
  if (!response.ok) throw await toApiRequestError(response);
  if (response.status === 204) return undefined as T;
  return (await response.json()) as T;
}

let refreshing: Promise<SessionResponse | null> | null = null;
let refreshTimer: ReturnType<typeof setTimeout> | undefined;

/** Trades the refresh cookie for a new access token; one request at a time however many callers ask. */
export function refreshSession(): Promise<SessionResponse | null> {
  refreshing ??= (async () => {
    try {
      const response = await send('/auth/refresh', { method: 'POST' }, null);
      if (!response.ok) return null;
      const session = (await response.json()) as SessionResponse;
      beginSession(session);
      return session;
    } catch {
      return null;
    } finally {
      refreshing = null;
    }
  })();
  return refreshing;
}

/** Starts a session and renews its access token a minute before it runs out. */
export function beginSession(session: SessionResponse) {
  startSession(session);
  clearTimeout(refreshTimer);
  const renewInMs = Math.max(5_000, Date.parse(session.expiresAt) - Date.now() - 60_000);
  refreshTimer = setTimeout(() => {
    void refreshSession().then((renewed) => {
      if (!renewed && getSession().status === 'signed-in') endSession(SESSION_ENDED_NOTICE);
    });
  }, renewInMs);
}

export function forgetSession(notice: string | null = null, leftOnPurpose = false) {
  clearTimeout(refreshTimer);
  endSession(notice, leftOnPurpose);
}

/** Every call to the API goes through here: bearer token, one refresh and retry on 401, ApiError parsing. */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const token = getAccessToken();
  const response = await send(path, options, token);
  if (response.status !== 401 || !token) return read<T>(response);

  const renewed = await refreshSession();
  if (!renewed) {
    forgetSession(SESSION_ENDED_NOTICE);
    throw new ApiRequestError(401, 'session_ended', SESSION_ENDED_NOTICE);
  }
  return read<T>(await send(path, options, renewed.accessToken));
}
