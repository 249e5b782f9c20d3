import { DEMO_PASSWORD } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';

// The other specs raise the limit (global-setup.mjs); this one runs the app with the default of 5 a
// minute. The app reads its configuration when its module is first imported, hence the late import.
const previousLimit = process.env.LOGIN_RATE_LIMIT;
process.env.LOGIN_RATE_LIMIT = '5';
const { startTestApp } = await import('./support/test-app.js');

describe('login rate limit', () => {
  let app: INestApplication;
  let url: string;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
  });

  afterAll(async () => {
    await app.close();
    if (previousLimit === undefined) delete process.env.LOGIN_RATE_LIMIT;
    else process.env.LOGIN_RATE_LIMIT = previousLimit;
  });

  const attempt = (email: string, password = 'not the password') =>
    request(url).post('/api/auth/login').send({ email, password });

  it('refuses the sixth attempt in a minute for one e-mail with 429, even with the right password', async () => {
    for (let i = 0; i < 5; i += 1) expect((await attempt('handler@catline.example')).status).toBe(401);

    const refused = await attempt('handler@catline.example', DEMO_PASSWORD);
    expect(refused.status).toBe(429);
    expect(refused.body.code).toBe('too_many_attempts');
    expect(refused.body.message).toMatch(
      /^Too many sign-in attempts for this e-mail\. Wait \d+ seconds, then try again\.$/,
    );
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('counts another e-mail on its own', async () => {
    expect((await attempt('airops@catline.example', DEMO_PASSWORD)).status).toBe(200);
  });
});
