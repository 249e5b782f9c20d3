import { useMutation } from '@tanstack/react-query';
import type { AcceptedResponse } from '@catline/contracts';
import { apiRequest } from '../../../lib/api-client.js';

/** Mails a new invitation link; refused (409) for a person who has already chosen a password. */
export const sendInvitation = (id: number) =>
  apiRequest<AcceptedResponse>(`/users/${id}/invitation`, { method: 'POST' });

export const useSendInvitation = () => useMutation({ mutationFn: sendInvitation });
