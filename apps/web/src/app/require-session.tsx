import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { LoadingState } from '../components/query-states.js';
import { useSession } from '../lib/session-store.js';

export interface SignInState {
  /** Where the person was when the session ended or was missing. */
  from?: string;
  /** What a screen before sign-in has just done, e.g. set a password. */
  notice?: string;
}

/** Everything below needs a signed-in person; without one, go to sign-in and remember where we were. */
export function RequireSession() {
  const { status, leftOnPurpose } = useSession();
  const location = useLocation();
  if (status === 'restoring') return <LoadingState label="Opening Catline…" />;
  if (status === 'signed-out') {
    const state: SignInState = leftOnPurpose ? {} : { from: `${location.pathname}${location.search}` };
    return <Navigate to="/sign-in" replace state={state} />;
  }
  return <Outlet />;
}
