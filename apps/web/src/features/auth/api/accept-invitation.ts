import { useMutation } from '@tanstack/react-query';
import type { SetPasswordWithTokenRequest } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';

export const acceptInvitation = (request: SetPasswordWithTokenRequest) =>
  apiRequest<void>('/auth/invitations/accept', { method: 'POST', body: request });

export const useAcceptInvitation = () => useMutation({ mutationFn: acceptInvitation });
