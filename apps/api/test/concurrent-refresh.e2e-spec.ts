import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { getDataSourceToken } from '@nestjs/typeorm';
import request from 'supertest';
import { type DataSource, IsNull, Not } from 'typeorm';
import { RefreshToken } from '../src/database/entities/refresh-token.entity.js';
import { refreshCookie } from './support/cookies.js';
import { TEST_PASSWORD, createUser } from './support/fleet-fixtures.js';
import { ADMIN } from './support/lineup-fixtures.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

describe('two refreshes at the same moment with one cookie', () => {
  let app: INestApplication;
  let url: string;
  let origin: string;
  let admin: string;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
    admin = await signIn(url, ADMIN);
  });

  afterAll(async () => {
    await app.close();
  });

  const refresh = (cookie: string) =>
    request(url).post('/api/auth/refresh').set('Cookie', cookie).set('Origin', origin).set('X-Catline-Refresh', '1');
  const me = (token: string) => request(url).get('/api/auth/me').set(bearer(token));

  async function signedIn() {
    const person = await createUser(url, admin, 'observer');
    const response = await request(url).post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    return { person, cookie: refreshCookie(response) };
  }

  it('both succeed with the same successor, and the session goes on', async () => {
    const { cookie } = await signedIn();
    const answers = await Promise.all([refresh(cookie), refresh(cookie), refresh(cookie)]);
    expect(answers.map((answer) => answer.status)).toEqual([200, 200, 200]);
    const successors = new Set(answers.map(refreshCookie));
    expect(successors.size).toBe(1);
    for (const answer of answers) expect((await me(answer.body.accessToken)).status).toBe(200);

    const next = await refresh([...successors][0]);
    expect(next.status).toBe(200);
    expect((await me(next.body.accessToken)).status).toBe(200);
  });

  it('past the grace window the replaced cookie counts as a copy again and ends every session of the person', async () => {
    const { person, cookie } = await signedIn();
    const first = await refresh(cookie);
    expect(first.status).toBe(200);
    await app
      .get<DataSource>(getDataSourceToken())
      .getRepository(RefreshToken)
      .update({ userId: person.id, revokedAt: Not(IsNull()) }, { revokedAt: new Date(Date.now() - 60_000) });

    expect((await refresh(cookie)).status).toBe(401);
    expect((await refresh(refreshCookie(first))).status).toBe(401);
    expect((await me(first.body.accessToken)).status).toBe(401);
  });
});
