import type { Role, SessionResponse, SessionUser } from '@catline/contracts';
import { useStore } from 'zustand';
import { createStore } from 'zustand/vanilla';

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

const session = createStore<SessionState>(() => ({
  status: 'restoring',
  user: null,
  accessToken: null,
  expiresAt: null,
  endedNotice: null,
  leftOnPurpose: false,
}));

export const getSession = session.getState;
export const getAccessToken = () => session.getState().accessToken;

export function startSession({ user, accessToken, expiresAt }: SessionResponse) {
  session.setState({ status: 'signed-in', user, accessToken, expiresAt, endedNotice: null, leftOnPurpose: false });
}

/**
 * Reopens a session the server could not be asked about (no network): the person as last signed in, with
 * no token until the session is renewed. Requests wait for that renewal; the screens show what was kept.
 */
export function resumeSessionUnrenewed(user: SessionUser) {
  session.setState({ status: 'signed-in', user, accessToken: null, expiresAt: null, endedNotice: null });
}

export function endSession(notice: string | null = null, leftOnPurpose = false) {
  session.setState({
    status: 'signed-out',
    user: null,
    accessToken: null,
    expiresAt: null,
    endedNotice: notice,
    leftOnPurpose,
  });
}

/** Called whenever the access token changes (sign-in, refresh, sign-out). */
export function onAccessTokenChange(listener: (token: string | null) => void) {
  return session.subscribe((state, previous) => {
    if (state.accessToken !== previous.accessToken) listener(state.accessToken);
  });
}

/** Called once each time a session ends (or none could be restored), whatever its token was. */
export function onSessionEnd(listener: () => void) {
  return session.subscribe((state, previous) => {
    if (state.status === 'signed-out' && previous.status !== 'signed-out') listener();
  });
}

export function useSession(): SessionState {
  return useStore(session);
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
