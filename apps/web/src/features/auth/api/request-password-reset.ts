import { useMutation } from '@tanstack/react-query';
import type { AcceptedResponse, PasswordResetRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';

/** Asks for a reset link by mail; the answer is the same whether or not the e-mail has an account. */
export const requestPasswordReset = (request: PasswordResetRequest) =>
  apiRequest<AcceptedResponse>('/auth/password-reset', { method: 'POST', body: request });

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
