import { useMutation } from '@tanstack/react-query';
import type { LoginRequest, SessionResponse } from '@catline/contracts';
import { apiRequest, beginSession } from '../../../lib/api-client.js';

export const signIn = (request: LoginRequest) =>
  apiRequest<SessionResponse>('/auth/login', { method: 'POST', body: request });

export function useSignIn() {
  return useMutation({ mutationFn: signIn, onSuccess: beginSession });
}
