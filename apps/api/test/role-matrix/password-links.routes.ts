import type { UserView } from '@catline/contracts';
import request from 'supertest';
import { unique } from '../support/fleet-fixtures.js';
import { bearer } from '../support/sign-in.js';
import type { MatrixContext, MatrixRoute } from './route-table.js';

// A made-up token passes validation and the role check, and is refused as an unknown link.
const UNKNOWN_LINK = { token: 'not-a-token-anyone-was-mailed', newPassword: 'long enough password' };

/** A person added without a password, so they can be invited again. */
async function invitedPerson(context: MatrixContext): Promise<number> {
  const email = `${unique('invited', 16).toLowerCase()}@catline.example`;
  const response = await request(context.baseUrl)
    .post('/api/users')
    .set(bearer(context.tokenOf('admin')))
    .send({ email, name: 'Matrix invitee', role: 'observer' });
  if (response.status !== 201) throw new Error(`Inviting ${email} failed: ${JSON.stringify(response.body)}`);
  return (response.body as UserView).id;
}

let refusedInvitee: Promise<number> | undefined;

export const passwordLinksRoutes: MatrixRoute[] = [
  {
    method: 'POST',
    path: '/api/auth/password-reset',
    allowed: 'public',
    example: () => ({ body: { email: 'nobody-in-the-matrix@catline.example' } }),
  },
  {
    method: 'POST',
    path: '/api/auth/password-reset/confirm',
    allowed: 'public',
    example: () => ({ body: UNKNOWN_LINK }),
    refusals: [400],
  },
  {
    method: 'POST',
    path: '/api/auth/invitations/accept',
    allowed: 'public',
    example: () => ({ body: UNKNOWN_LINK }),
    refusals: [400],
  },
  {
    method: 'POST',
    path: '/api/users/{id}/invitation',
    allowed: ['admin'],
    example: async (context) => {
      if (context.allowed) return { params: { id: await invitedPerson(context) } };
      refusedInvitee ??= invitedPerson(context);
      return { params: { id: await refusedInvitee } };
    },
  },
];
