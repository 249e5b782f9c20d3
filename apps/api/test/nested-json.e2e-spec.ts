import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { startTestApp } from './support/test-app.js';

/** `depth` arrays inside each other around a value: `[[[…"x"…]]]`. */
const nestedArrays = (depth: number) => `${'['.repeat(depth)}"x"${']'.repeat(depth)}`;
/** `depth` objects inside each other under the key `a`. */
const nestedObjects = (depth: number) => `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}`;

describe('deeply nested JSON bodies', () => {
  let app: INestApplication;
  let url: string;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
  });

  afterAll(async () => {
    await app.close();
  });

  const post = (path: string, raw: string) => request(url).post(path).set('Content-Type', 'application/json').send(raw);

  it.each([
    ['arrays', `{"email":${nestedArrays(5_000)}}`],
    ['objects', `{"email":${nestedObjects(5_000)}}`],
  ])('answers 400 to a 5,000-deep body of %s on the password-reset route, not a 500', async (_shape, raw) => {
    const response = await post('/api/auth/password-reset', raw);
    expect(response.status).toBe(400);
    expect(response.body).toMatchObject({ code: 'json_too_deep' });
    expect(response.body.message).toMatch(/nested more than 32 levels/);
  });

  it('refuses one level past the limit and reads the body at the limit', async () => {
    // 31 arrays in the object that holds them: 32 levels in all, which the validation then refuses as a field.
    expect((await post('/api/auth/password-reset', `{"email":${nestedArrays(31)}}`)).body.code).toBe(
      'validation_failed',
    );
    expect((await post('/api/auth/password-reset', `{"email":${nestedArrays(32)}}`)).body.code).toBe('json_too_deep');
  });

  it('counts brackets inside strings as text, not as nesting', async () => {
    const response = await post(
      '/api/auth/password-reset',
      JSON.stringify({ email: `${'['.repeat(100)}@catline.example` }),
    );
    expect(response.body.code).toBe('validation_failed');
  });

  it('still answers 400 to malformed JSON', async () => {
    const response = await post('/api/auth/password-reset', '{"email": ');
    expect(response.status).toBe(400);
  });
});
