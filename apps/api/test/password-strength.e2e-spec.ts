import { createHash, randomBytes } from 'node:crypto';
import { DEMO_PASSWORD } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { PasswordLink } from '../src/database/entities/password-link.entity.js';
import { createUser, TEST_PASSWORD, unique } from './support/fleet-fixtures.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

// Finding: weak passwords (twelve ones, the old demo password, the person's own e-mail) were accepted
// wherever a password is set. Each is refused with weak_password and a sentence that says why.
describe('password strength', () => {
  let app: INestApplication;
  let url: string;
  let admin: string;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    admin = await signIn(url, 'admin@catline.example');
  });

  afterAll(async () => {
    await app.close();
  });

  const expectWeak = (response: request.Response) => {
    expect(response.status).toBe(400);
    expect(response.body.code).toBe('weak_password');
    expect(response.body.message).toMatch(/too easy to guess/);
  };

  it('refuses a new person with twelve ones, the old demo password or their own e-mail, and takes a passphrase', async () => {
    const name = unique('strength', 14).toLowerCase();
    const email = `${name}@catline.example`;
    const person = (password: string) =>
      request(url)
        .post('/api/users')
        .set(bearer(admin))
        .send({ email, name: `Test ${name}`, role: 'observer', password });
    for (const weak of ['111111111111', 'catline-demo', email, `${name}${name}`]) expectWeak(await person(weak));
    expect((await person(DEMO_PASSWORD)).status).toBe(201);
  });

  it('refuses a weak new password on a change; the old one still signs in', async () => {
    const person = await createUser(url, admin);
    const token = await signIn(url, person.email, TEST_PASSWORD);
    const change = (newPassword: string) =>
      request(url).post('/api/auth/password').set(bearer(token)).send({ currentPassword: TEST_PASSWORD, newPassword });
    expectWeak(await change('111111111111'));
    expectWeak(await change(person.email));
    expect(
      (await request(url).post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD })).status,
    ).toBe(200);
  });

  it('refuses a weak password through a reset link and leaves the link usable', async () => {
    const person = await createUser(url, admin);
    const token = randomBytes(24).toString('base64url');
    await app.get(DataSource).manager.insert(PasswordLink, {
      userId: person.id,
      purpose: 'reset',
      tokenHash: createHash('sha256').update(token).digest('hex'),
      expiresAt: new Date(Date.now() + 60_000),
      createdAt: new Date(),
    });
    const confirm = (newPassword: string) =>
      request(url).post('/api/auth/password-reset/confirm').send({ token, newPassword });
    expectWeak(await confirm('111111111111'));
    expectWeak(await confirm(person.email));
    expect((await confirm(`${DEMO_PASSWORD}-reset`)).status).toBe(204);
  });
});
