import { REFRESH_HEADER, type SessionResponse, type SessionUser } from '@catline/contracts';
import { ApiRequestError, isUnanswered, toApiRequestError, unreachableServer } from './api-error.js';
import { endSession, getAccessToken, getSession, resumeSessionUnrenewed, startSession } from './session-store.js';
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

/**
 * Trades the refresh cookie for a new access token; one request at a time however many callers and tabs ask.
 * Null when the server refused (the session is over). When no answer came it rejects instead: the session
 * may well still be good, and the person must not be signed out because the network is down.
 */
export function refreshSession(): Promise<SessionResponse | null> {
  refreshing ??= (async () => {
    try {
      const session = await refreshOnceForAllTabs(async () => {
        const response = await send('/auth/refresh', { method: 'POST' }, null, { [REFRESH_HEADER]: '1' });
        if (response.ok) return (await response.json()) as SessionResponse;
        const error = await toApiRequestError(response);
        if (isUnanswered(error)) throw error;
        return null;
      });
      if (session) beginSession(session);
      return session;
    } finally {
      refreshing = null;
    }
  })();
  return refreshing;
}

// Whether this browser was given a refresh cookie (which scripts cannot read), and to whom. Without one there
// is no session to restore, and asking the server would only log a 401 on the sign-in page. The person (never
// a token) lets a tablet that reopens without the network go on showing what it last showed them.
const SESSION_HINT = 'catline.session';
const hint = {
  set: (user: SessionUser) => globalThis.localStorage?.setItem(SESSION_HINT, JSON.stringify(user)),
  clear: () => globalThis.localStorage?.removeItem(SESSION_HINT),
  present: () => (globalThis.localStorage?.getItem(SESSION_HINT) ?? null) !== null,
  user: (): SessionUser | null => {
    try {
      const kept: unknown = JSON.parse(globalThis.localStorage?.getItem(SESSION_HINT) ?? 'null');
      return typeof kept === 'object' && kept !== null && typeof (kept as SessionUser).id === 'number'
        ? (kept as SessionUser)
        : null;
    } catch {
      return null;
    }
  },
};

/** The person this browser was last signed in as, while a session may still be restored; never a token. */
export const lastSignedInUser = () => hint.user();

// While the server does not answer, renewal is asked again after these waits (doubling), and at once when
// the browser says it is back online.
const RETRY_FIRST_MS = 2_000;
const RETRY_LONGEST_MS = 60_000;
let renewTimer: ReturnType<typeof setTimeout> | undefined;
let retryMs = RETRY_FIRST_MS;
let waitingForServer = false;

function renewIn(delayMs: number) {
  clearTimeout(renewTimer);
  renewTimer = setTimeout(renew, delayMs);
}

function askAgainLater() {
  waitingForServer = true;
  renewIn(retryMs);
  retryMs = Math.min(retryMs * 2, RETRY_LONGEST_MS);
}

/** A refusal ends the session; no answer does not (the network is down): the person stays and it is asked again. */
function renew() {
  waitingForServer = false;
  refreshSession().then((renewed) => {
    if (!renewed) endedElsewhere();
  }, askAgainLater);
}

globalThis.addEventListener?.('online', () => {
  if (waitingForServer) renewIn(0);
});

/** Starts a session and renews its access token a minute before it runs out. */
export function beginSession(session: SessionResponse) {
  hint.set(session.user);
  startSession(session);
  waitingForServer = false;
  retryMs = RETRY_FIRST_MS;
  renewIn(Math.max(5_000, Date.parse(session.expiresAt) - Date.now() - 60_000));
}

/**
 * A reload keeps the person signed in through the refresh cookie. If the server cannot be reached, the
 * person last signed in here stays, with no token, until it answers (their screens show what was kept,
 * marked not live); only a refusal signs out.
 */
export function restoreSession() {
  if (!hint.present()) {
    forgetSession();
    return;
  }
  refreshSession().then(
    (session) => {
      if (!session) forgetSession();
    },
    () => {
      const user = hint.user();
      if (user) resumeSessionUnrenewed(user);
      askAgainLater();
    },
  );
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
  clearTimeout(renewTimer);
  waitingForServer = false;
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

/** A new access token; a refusal ends the session. Rejects unanswered while the server cannot be reached. */
async function renewedToken(): Promise<string> {
  const renewed = await refreshSession();
  if (!renewed) {
    endedElsewhere();
    throw new ApiRequestError(401, 'session_ended', SESSION_ENDED_NOTICE);
  }
  return renewed.accessToken;
}

/** Sends with the bearer token; on a 401, refreshes once and sends again. */
async function sendSignedIn(path: string, options: RequestOptions): Promise<Response> {
  // A session reopened while the server could not be reached has no token yet: it is renewed first.
  const token = getAccessToken() ?? (getSession().status === 'signed-in' ? await renewedToken() : null);
  const response = await send(path, options, token);
  if (response.status !== 401 || !token) return response;
  return send(path, options, await renewedToken());
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
