import { useSyncExternalStore } from 'react';
import type { Role, SessionResponse, SessionUser } from '@catline/contracts';

export type SessionStatus = 'restoring' | 'signed-in' | 'signed-out';

export interface SessionState {
  status: SessionStatus;
  user: SessionUser | null;
  accessToken: string | null;
  expiresAt: string | null;
  /** Why the last session ended, shown on the sign-in page; null after a deliberate sign-out. */
  endedNotice: string | null;
  /** The person signed out themselves: the next person starts on their own main screen. */
  leftOnPurpose: boolean;
}

let state: SessionState = {
  status: 'restoring',
  user: null,
  accessToken: null,
  expiresAt: null,
  endedNotice: null,
  leftOnPurpose: false,
};
const listeners = new Set<() => void>();
const tokenListeners = new Set<(token: string | null) => void>();

function update(next: SessionState) {
  const tokenChanged = next.accessToken !== state.accessToken;
  state = next;
  listeners.forEach((listener) => listener());
  if (tokenChanged) tokenListeners.forEach((listener) => listener(next.accessToken));
}

export const getSession = () => state;
export const getAccessToken = () => state.accessToken;

export function startSession(session: SessionResponse) {
  update({
    status: 'signed-in',
    user: session.user,
    accessToken: session.accessToken,
    expiresAt: session.expiresAt,
    endedNotice: null,
    leftOnPurpose: false,
  });
}

export function endSession(notice: string | null = null, leftOnPurpose = false) {
  update({ status: 'signed-out', user: null, accessToken: null, expiresAt: null, endedNotice: notice, leftOnPurpose });
}

/** Called whenever the access token changes (sign-in, refresh, sign-out). */
export function onAccessTokenChange(listener: (token: string | null) => void) {
  tokenListeners.add(listener);
  return () => tokenListeners.delete(listener);
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useSession(): SessionState {
  return useSyncExternalStore(subscribe, getSession);
}

/** The signed-in person; only call below the route guard that requires a session. */
export function useSessionUser(): SessionUser {
  const { user } = useSession();
  if (!user) throw new Error('useSessionUser needs a signed-in person');
  return user;
}

export function useHasRole(...roles: Role[]): boolean {
  const { user } = useSession();
  return user !== null && roles.includes(user.role);
}
