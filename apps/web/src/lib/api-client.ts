import { REFRESH_HEADER, type SessionResponse } from '@catline/contracts';
import { ApiRequestError, toApiRequestError, unreachableServer } from './api-error.js';
import { endSession, getAccessToken, getSession, startSession } from './session-store.js';
import { onSessionHandedOver, refreshOnceForAllTabs, shareSessionWithNewTabs } from './shared-refresh.js';

export const SESSION_ENDED_NOTICE = 'Your session has ended. Sign in again and you will return to where you were.';

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions {
  method?: Method;
  /** Sent as JSON, or as multipart/form-data when it is a FormData (an uploaded file). */
  body?: unknown;
  signal?: AbortSignal;
}

async function send(
  path: string,
  { method = 'GET', body, signal }: RequestOptions,
  token: string | null,
  extraHeaders: Record<string, string> = {},
) {
  const headers: Record<string, string> = { Accept: 'application/json', ...extraHeaders };
  const form = body instanceof FormData;
  // The browser writes a multipart body's Content-Type itself, with the boundary.
  if (body !== undefined && !form) headers['Content-Type'] = 'application/json';
  if (token) headers.Authorization = `Bearer ${token}`;
  try {
    return await fetch(`/api${path}`, {
      method,
      headers,
      body: body === undefined ? undefined : form ? body : JSON.stringify(body),
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

/** Trades the refresh cookie for a new access token; one request at a time however many callers and tabs ask. */
export function refreshSession(): Promise<SessionResponse | null> {
  refreshing ??= (async () => {
    try {
      const session = await refreshOnceForAllTabs(async () => {
        const response = await send('/auth/refresh', { method: 'POST' }, null, { [REFRESH_HEADER]: '1' });
        return response.ok ? ((await response.json()) as SessionResponse) : null;
      });
      if (session) beginSession(session);
      return session;
    } catch {
      return null;
    } finally {
      refreshing = null;
    }
  })();
  return refreshing;
}

// Whether this browser was given a refresh cookie (which scripts cannot read). Without one there is no
// session to restore, and asking the server would only log a 401 on the sign-in page.
const SESSION_HINT = 'catline.session';
const hint = {
  set: () => globalThis.localStorage?.setItem(SESSION_HINT, '1'),
  clear: () => globalThis.localStorage?.removeItem(SESSION_HINT),
  present: () => globalThis.localStorage?.getItem(SESSION_HINT) === '1',
};

/** Whether a reload may find a session to restore through the refresh cookie. */
export const mayRestoreSession = () => hint.present();

/** Starts a session and renews its access token a minute before it runs out. */
export function beginSession(session: SessionResponse) {
  hint.set();
  startSession(session);
  clearTimeout(refreshTimer);
  const renewInMs = Math.max(5_000, Date.parse(session.expiresAt) - Date.now() - 60_000);
  refreshTimer = setTimeout(() => {
    void refreshSession().then((renewed) => {
      if (!renewed && getSession().status === 'signed-in') endSession(SESSION_ENDED_NOTICE);
    });
  }, renewInMs);
}

// Another tab refreshed: this one goes on with the same session (unless it was signed out here).
onSessionHandedOver((session) => {
  if (getSession().status !== 'signed-out') beginSession(session);
});
shareSessionWithNewTabs(() => {
  const { status, user, accessToken, expiresAt } = getSession();
  return status === 'signed-in' && user && accessToken && expiresAt ? { user, accessToken, expiresAt } : null;
});

export function forgetSession(notice: string | null = null, leftOnPurpose = false) {
  hint.clear();
  clearTimeout(refreshTimer);
  endSession(notice, leftOnPurpose);
}

/**
 * The server ended the session (a password change, an admin, its age): back to sign-in with the reason.
 * A refusal that comes back after the person signed out here (a request or the live link still open) is
 * not one: that session was left on purpose, and the sign-in page must not say it was ended.
 */
export function endedElsewhere() {
  if (getSession().status !== 'signed-out') forgetSession(SESSION_ENDED_NOTICE);
}

/** Sends with the bearer token; on a 401, refreshes once and sends again. */
async function sendSignedIn(path: string, options: RequestOptions): Promise<Response> {
  const token = getAccessToken();
  const response = await send(path, options, token);
  if (response.status !== 401 || !token) return response;

  const renewed = await refreshSession();
  if (!renewed) {
    endedElsewhere();
    throw new ApiRequestError(401, 'session_ended', SESSION_ENDED_NOTICE);
  }
  return send(path, options, renewed.accessToken);
}

/** Every call to the API goes through here: bearer token, one refresh and retry on 401, ApiError parsing. */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  return read<T>(await sendSignedIn(path, options));
}

export interface ApiFile {
  blob: Blob;
  /** The name the server suggests in Content-Disposition, if any. */
  fileName: string | null;
}

/** A file the API serves (a CSV template): fetched here because a plain link carries no bearer token. */
export async function apiFile(path: string): Promise<ApiFile> {
  const response = await sendSignedIn(path, {});
  if (!response.ok) throw await toApiRequestError(response);
  const disposition = response.headers.get('Content-Disposition') ?? '';
  return { blob: await response.blob(), fileName: /filename="([^"]+)"/.exec(disposition)?.[1] ?? null };
}
