import { DEMO_PASSWORD } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { User } from '../src/database/entities/user.entity.js';
import { refreshCookie } from './support/cookies.js';
import { createUser, TEST_PASSWORD } from './support/fleet-fixtures.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

const ADMIN = 'admin@catline.example';

describe('auth', () => {
  let app: INestApplication;
  let url: string;
  let adminToken: string;
  let secret: string;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    adminToken = await signIn(url, ADMIN);
    secret = app.get(ConfigService).get<string>('JWT_SECRET')!;
  });

  afterAll(async () => {
    await app.close();
  });

  const login = (email: string, password: string) => request(url).post('/api/auth/login').send({ email, password });
  const me = (token: string) => request(url).get('/api/auth/me').set(bearer(token));
  const refresh = (cookie: string) =>
    request(url).post('/api/auth/refresh').set('Cookie', cookie).set('X-Catline-Refresh', '1');

  describe('login', () => {
    it('returns a 15-minute access token, the person and an httpOnly refresh cookie for the auth routes', async () => {
      const before = Date.now();
      const response = await login('cat2@catline.example', DEMO_PASSWORD);

      expect(response.status).toBe(200);
      expect(response.body.user).toEqual({
        id: expect.any(Number),
        email: 'cat2@catline.example',
        name: 'Sam Dellavint',
        role: 'catapult_officer',
        catapultId: 2,
      });
      const lifetimeS = (Date.parse(response.body.expiresAt) - before) / 1000;
      expect(lifetimeS).toBeGreaterThan(14 * 60);
      expect(lifetimeS).toBeLessThanOrEqual(15 * 60 + 1);
      const cookie = (response.headers['set-cookie'] as unknown as string[]).find((c) =>
        c.startsWith('catline_refresh='),
      )!;
      expect(cookie).toMatch(/; HttpOnly/);
      expect(cookie).toMatch(/; SameSite=Strict/);
      expect(cookie).toMatch(/; Path=\/api\/auth/);
      expect(cookie).not.toMatch(/; Secure/); // plain http here; Secure is set on https requests
    });

    it('accepts the e-mail in any case and with spaces around it', async () => {
      const response = await login('  Observer@Catline.Example ', DEMO_PASSWORD);
      expect(response.status).toBe(200);
      expect(response.body.user.email).toBe('observer@catline.example');
    });

    it('refuses a wrong password and an unknown e-mail with the same 401 message', async () => {
      const wrongPassword = await login(ADMIN, `${DEMO_PASSWORD}-wrong`);
      const unknownEmail = await login('nobody@catline.example', DEMO_PASSWORD);

      expect(wrongPassword.status).toBe(401);
      expect(unknownEmail.status).toBe(401);
      expect(wrongPassword.body).toEqual(unknownEmail.body);
      expect(wrongPassword.body).toEqual({
        statusCode: 401,
        code: 'invalid_credentials',
        message: 'The e-mail or password is not right.',
      });
      expect(wrongPassword.headers['set-cookie']).toBeUndefined();
    });

    it('refuses a body without a password or with an extra field as a 400 naming the problem', async () => {
      const missing = await request(url).post('/api/auth/login').send({ email: ADMIN });
      expect(missing.status).toBe(400);
      expect(missing.body.message).toMatch(/password/);

      const extra = await request(url)
        .post('/api/auth/login')
        .send({ email: ADMIN, password: DEMO_PASSWORD, role: 'admin' });
      expect(extra.status).toBe(400);
      expect(extra.body.message).toMatch(/property role should not exist/);
    });
  });

  describe('access tokens', () => {
    it('answers GET /auth/me with the signed-in person', async () => {
      const response = await me(adminToken);
      expect(response.status).toBe(200);
      expect(response.body).toMatchObject({ email: ADMIN, role: 'admin', catapultId: null });
    });

    it('refuses a request without a token, or with a malformed Authorization header, with 401', async () => {
      const none = await request(url).get('/api/auth/me');
      expect(none.status).toBe(401);
      expect(none.body).toEqual({ statusCode: 401, code: 'unauthenticated', message: 'Sign in to continue.' });
      const basic = await request(url).get('/api/auth/me').set('Authorization', `Basic ${adminToken}`);
      expect(basic.status).toBe(401);
    });

    it('refuses an expired token', async () => {
      const { id } = (await me(adminToken)).body;
      const { sid } = new JwtService().decode<{ sid: string }>(adminToken);
      const now = Math.floor(Date.now() / 1000);
      const expired = new JwtService().sign(
        { sub: id, role: 'admin', tv: 0, sid, iat: now - 1000, exp: now - 100 },
        { secret, algorithm: 'HS256' },
      );
      const response = await me(expired);
      expect(response.status).toBe(401);
      expect(response.body.code).toBe('session_invalid');
    });

    it('refuses a token signed with another key', async () => {
      const { id } = (await me(adminToken)).body;
      const { sid } = new JwtService().decode<{ sid: string }>(adminToken);
      const forged = new JwtService().sign(
        { sub: id, role: 'admin', tv: 0, sid },
        { secret: 'another-key-of-enough-length', algorithm: 'HS256', expiresIn: 600 },
      );
      expect((await me(forged)).status).toBe(401);
    });

    it('refuses an unsigned token (alg none)', async () => {
      const { id } = (await me(adminToken)).body;
      const { sid } = new JwtService().decode<{ sid: string }>(adminToken);
      const encode = (part: object) => Buffer.from(JSON.stringify(part)).toString('base64url');
      const now = Math.floor(Date.now() / 1000);
      const unsigned = `${encode({ alg: 'none', typ: 'JWT' })}.${encode({ sub: id, role: 'admin', tv: 0, sid, iat: now, exp: now + 600 })}.`;
      expect((await me(unsigned)).status).toBe(401);
    });

    it('refuses the token of a removed person', async () => {
      const person = await createUser(url, adminToken);
      const token = await signIn(url, person.email, TEST_PASSWORD);
      expect((await me(token)).status).toBe(200);

      expect((await request(url).delete(`/api/users/${person.id}`).set(bearer(adminToken))).status).toBe(204);

      expect((await me(token)).status).toBe(401);
      expect((await login(person.email, TEST_PASSWORD)).status).toBe(401);
    });
  });

  describe('refresh', () => {
    it('rotates the refresh token: the new one works, the used one is refused', async () => {
      const person = await createUser(url, adminToken);
      const first = refreshCookie(await login(person.email, TEST_PASSWORD));

      const rotated = await refresh(first);
      expect(rotated.status).toBe(200);
      expect(rotated.body.user.email).toBe(person.email);
      expect((await me(rotated.body.accessToken)).status).toBe(200);
      const second = refreshCookie(rotated);
      expect(second).not.toBe(first);

      const third = await refresh(second);
      expect(third.status).toBe(200);
    });

    it('ends every session of the person when a used refresh token comes back', async () => {
      const person = await createUser(url, adminToken);
      const stolen = refreshCookie(await login(person.email, TEST_PASSWORD));
      // Its successor has been replaced too, so the grace for a simultaneous refresh does not apply
      // (concurrent-refresh.e2e-spec.ts covers a replay past the grace alone).
      const rotated = await refresh(refreshCookie(await refresh(stolen)));
      const current = refreshCookie(rotated);

      const replay = await refresh(stolen);
      expect(replay.status).toBe(401);
      expect(replay.body.code).toBe('session_ended');

      expect((await refresh(current)).status).toBe(401);
      expect((await me(rotated.body.accessToken)).status).toBe(401);
    });

    it('refuses a refresh without a cookie or with an unknown token', async () => {
      const none = await request(url).post('/api/auth/refresh').set('X-Catline-Refresh', '1');
      expect(none.status).toBe(401);
      expect(none.body).toEqual({
        statusCode: 401,
        code: 'session_ended',
        message: 'Your session has ended. Sign in again.',
      });
      expect((await refresh('catline_refresh=made-up')).status).toBe(401);
    });

    it('refuses a refresh for a person removed since', async () => {
      const person = await createUser(url, adminToken);
      const cookie = refreshCookie(await login(person.email, TEST_PASSWORD));
      await request(url).delete(`/api/users/${person.id}`).set(bearer(adminToken));
      expect((await refresh(cookie)).status).toBe(401);
    });
  });

  describe('logout', () => {
    it('revokes the session refresh token and clears the cookie', async () => {
      const person = await createUser(url, adminToken);
      const session = await login(person.email, TEST_PASSWORD);
      const cookie = refreshCookie(session);

      const response = await request(url)
        .post('/api/auth/logout')
        .set(bearer(session.body.accessToken))
        .set('Cookie', cookie);
      expect(response.status).toBe(204);
      expect((response.headers['set-cookie'] as unknown as string[])[0]).toMatch(
        /^catline_refresh=;.*Expires=Thu, 01 Jan 1970/,
      );

      expect((await refresh(cookie)).status).toBe(401);
    });
  });

  describe('change password', () => {
    const change = (token: string, body: object) =>
      request(url).post('/api/auth/password').set(bearer(token)).send(body);

    it('refuses a wrong current password and a new one under 12 characters, changing nothing', async () => {
      const person = await createUser(url, adminToken);
      const token = await signIn(url, person.email, TEST_PASSWORD);

      const wrong = await change(token, { currentPassword: 'not the password', newPassword: 'a long new password' });
      expect(wrong.status).toBe(400);
      expect(wrong.body.code).toBe('wrong_password');

      const short = await change(token, { currentPassword: TEST_PASSWORD, newPassword: 'eleven char' });
      expect(short.status).toBe(400);
      expect(short.body.message).toMatch(/newPassword must be at least 12 characters/);

      expect((await me(token)).status).toBe(200);
      expect((await login(person.email, TEST_PASSWORD)).status).toBe(200);
    });

    it('sets the new password, ends other sessions and keeps this one through a fresh refresh cookie', async () => {
      const person = await createUser(url, adminToken);
      const here = await login(person.email, TEST_PASSWORD);
      const elsewhere = refreshCookie(await login(person.email, TEST_PASSWORD));
      const newPassword = 'twelve chars or more';

      const response = await change(here.body.accessToken, { currentPassword: TEST_PASSWORD, newPassword });
      expect(response.status).toBe(204);

      expect((await me(here.body.accessToken)).status).toBe(401);
      expect((await refresh(elsewhere)).status).toBe(401);
      expect((await refresh(refreshCookie(response))).status).toBe(200);
      expect((await login(person.email, TEST_PASSWORD)).status).toBe(401);
      expect((await login(person.email, newPassword)).status).toBe(200);
    });
  });

  it('stores passwords as argon2id with at least 19 MiB, 2 iterations and 1 lane', async () => {
    // Minimum from the OWASP Password Storage Cheat Sheet (argon2id, m=19456 KiB, t=2, p=1).
    const person = await createUser(url, adminToken);
    const hashes = await app
      .get(DataSource)
      .getRepository(User)
      .find({ where: [{ email: ADMIN }, { id: person.id }] });
    expect(hashes).toHaveLength(2);
    for (const { passwordHash } of hashes) {
      const match = /^\$argon2id\$v=19\$m=(\d+),t=(\d+),p=(\d+)\$/.exec(passwordHash ?? '');
      expect(match).not.toBeNull();
      const [, memory, iterations, lanes] = match!.map(Number);
      expect(memory).toBeGreaterThanOrEqual(19_456);
      expect(iterations).toBeGreaterThanOrEqual(2);
      expect(lanes).toBe(1);
    }
  });
});
