import { DEMO_PASSWORD } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import request from 'supertest';
import { refreshCookie } from './support/cookies.js';
import { startTestApp } from './support/test-app.js';

describe('POST /auth/refresh is for the Catline page only', () => {
  let app: INestApplication;
  let url: string;
  let origin: string;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
  });

  afterAll(async () => {
    await app.close();
  });

  const cookie = async () =>
    refreshCookie(
      await request(url).post('/api/auth/login').send({ email: 'observer@catline.example', password: DEMO_PASSWORD }),
    );

  it("refuses another site's origin and a request without the X-Catline-Refresh header, keeping the cookie usable", async () => {
    const held = await cookie();
    const foreign = await request(url)
      .post('/api/auth/refresh')
      .set('Cookie', held)
      .set('Origin', 'http://elsewhere.example')
      .set('X-Catline-Refresh', '1');
    expect(foreign.status).toBe(403);
    expect(foreign.body.code).toBe('refresh_refused');
    const bare = await request(url).post('/api/auth/refresh').set('Cookie', held).set('Origin', origin);
    expect(bare.status).toBe(403);

    const own = await request(url)
      .post('/api/auth/refresh')
      .set('Cookie', held)
      .set('Origin', origin)
      .set('X-Catline-Refresh', '1');
    expect(own.status).toBe(200);
  });
});
