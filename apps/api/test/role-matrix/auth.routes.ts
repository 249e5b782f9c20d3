import { DEMO_PASSWORD, ROLES } from '@catline/contracts';
import request from 'supertest';
import { refreshCookie } from '../support/cookies.js';
import { bearer, demoEmail, signIn } from '../support/sign-in.js';
import type { MatrixRoute } from './route-table.js';

const OBSERVER = { email: 'observer@catline.example', password: DEMO_PASSWORD };

export const authRoutes: MatrixRoute[] = [
  { method: 'POST', path: '/api/auth/login', allowed: 'public', example: () => ({ body: OBSERVER }) },
  {
    method: 'POST',
    path: '/api/auth/refresh',
    allowed: 'public',
    example: async ({ baseUrl }) => {
      const login = await request(baseUrl).post('/api/auth/login').send(OBSERVER);
      return { headers: { Cookie: refreshCookie(login), 'X-Catline-Refresh': '1' } };
    },
  },
  {
    method: 'POST',
    path: '/api/auth/logout',
    allowed: ROLES,
    // Logout ends the session it is called with: a session of its own, not the one the matrix goes on with.
    example: async ({ baseUrl, caller }) =>
      caller ? { headers: bearer(await signIn(baseUrl, demoEmail(caller))) } : {},
  },
  { method: 'GET', path: '/api/auth/me', allowed: ROLES },
  {
    method: 'POST',
    path: '/api/auth/password',
    allowed: ROLES,
    // A real change would end the matrix's own sessions; a wrong current password passes the role check only.
    example: () => ({ body: { currentPassword: 'not the password', newPassword: 'a new long password' } }),
    refusals: [400],
  },
];
