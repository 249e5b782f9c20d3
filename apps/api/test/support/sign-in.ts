import { DEMO_PASSWORD, type Role } from '@catline/contracts';
import request from 'supertest';
import { ACCESS_TOKEN_LIFETIME_S } from '../../src/auth/access-token.js';
import { demoPeople } from '../../src/database/seeds/demo-fleet.js';

/**
 * How long a spec keeps a token before it signs in again: half the server's lifetime, so a stage that outlasts
 * one token (the soak's bad-input run takes about 16 minutes) never sends an expired one.
 */
export const TOKEN_RENEWAL_MS = (ACCESS_TOKEN_LIFETIME_S * 1000) / 2;

/** Signs in through the real login route and returns the access token; throws with the server's answer when refused. */
export async function signIn(baseUrl: string, email: string, password = DEMO_PASSWORD): Promise<string> {
  const response = await request(baseUrl).post('/api/auth/login').send({ email, password });
  if (response.status !== 200 || typeof response.body?.accessToken !== 'string') {
    throw new Error(`Sign-in as ${email} failed with ${response.status}: ${JSON.stringify(response.body)}`);
  }
  return response.body.accessToken as string;
}

/** The first demo person with the role (cat1@ for catapult officers, pilot@ for pilots). */
export function demoEmail(role: Role): string {
  const person = demoPeople.find((candidate) => candidate.role === role);
  if (!person) throw new Error(`The demo seed has nobody with the role ${role}`);
  return person.email;
}

/** The Authorization header of a token, for supertest's `.set(...)`. */
export function bearer(token: string): { Authorization: string } {
  return { Authorization: `Bearer ${token}` };
}
