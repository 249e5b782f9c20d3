import { useMutation } from '@tanstack/react-query';
import { apiRequest, forgetSession } from '../../../lib/api-client.js';

export const signOut = () => apiRequest<void>('/auth/logout', { method: 'POST' });

/** Ends the session here even when the server cannot be reached: the device must not stay signed in. */
export function useSignOut() {
  return useMutation({ mutationFn: signOut, onSettled: () => forgetSession(null, true) });
}
