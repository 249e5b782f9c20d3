import { useMutation } from '@tanstack/react-query';
import type { SetPasswordWithTokenRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';

export const confirmPasswordReset = (request: SetPasswordWithTokenRequest) =>
  apiRequest<void>('/auth/password-reset/confirm', { method: 'POST', body: request });

export const useConfirmPasswordReset = () => useMutation({ mutationFn: confirmPasswordReset });
