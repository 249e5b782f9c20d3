import { DEMO_PASSWORD } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { refreshCookie } from './support/cookies.js';
import { TEST_PASSWORD, unique } from './support/fleet-fixtures.js';
import { readAllPages } from './support/paged-list.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

describe('strict input: names, path ids and token answers', () => {
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

  describe('names', () => {
    // NUL, a line break, escape; the bidi overrides and isolates (Unicode UAX #9, "explicit formatting").
    const unsafe = [
      '\u0000',
      '\n',
      '\u001b',
      '\u007f',
      '\u202e',
      '\u202d',
      '\u2066',
      '\u2067',
      '\u2068',
      '\u2069',
      '\u200f',
      '\u061c',
    ];

    it.each(unsafe.map((character) => [JSON.stringify(character), character]))(
      'refuses a person named with %s and stores nobody',
      async (_shown, character) => {
        const email = `${unique('ctl', 12).toLowerCase()}@catline.example`;
        const response = await request(url)
          .post('/api/users')
          .set(bearer(admin))
          .send({ email, name: `Ada${character}gnol`, role: 'observer', password: TEST_PASSWORD });
        expect(response.status).toBe(400);
        expect(response.body.message).toMatch(/name must not hold control or text-direction characters/);
        const people = await readAllPages<{ email: string }>(url, admin, '/api/users');
        expect(people.some((person) => person.email === email)).toBe(false);
      },
    );

    it('refuses a right-to-left override in a squadron name and a NUL in a ship name', async () => {
      const code = unique('SQ', 10);
      const squadron = await request(url)
        .post('/api/squadrons')
        .set(bearer(admin))
        .send({ name: 'Fighting \u202eevil', code, email: `${code.toLowerCase()}@catline.example` });
      expect(squadron.status).toBe(400);
      const ship = await request(url).patch('/api/ships/1').set(bearer(admin)).send({ name: 'Ship\u0000' });
      expect(ship.status).toBe(400);
    });

    it('keeps accepting names in any script', async () => {
      const email = `${unique('intl', 12).toLowerCase()}@catline.example`;
      const response = await request(url)
        .post('/api/users')
        .set(bearer(admin))
        .send({ email, name: 'Zoë Ó Briain-Łukasz 渡辺 عمر', role: 'observer', password: TEST_PASSWORD });
      expect(response.status).toBe(201);
    });
  });

  describe('path ids', () => {
    it.each(['0x10', '1e3', '%204', '4%20', '+4', '-1', '4.0', '0b1', '99999999999'])(
      'refuses /api/cycles/%s with 400',
      async (id) => {
        const response = await request(url).get(`/api/cycles/${id}`).set(bearer(admin));
        expect(response.status).toBe(400);
        expect(response.body.code).toBe('invalid_id');
      },
    );

    it('reads an id written in plain digits', async () => {
      const [first] = (await request(url).get('/api/cycles').set(bearer(admin))).body.items as { id: number }[];
      expect((await request(url).get(`/api/cycles/${first.id}`).set(bearer(admin))).status).toBe(200);
      expect((await request(url).get('/api/cycles/999999').set(bearer(admin))).status).toBe(404);
    });
  });

  describe('ids in the query string', () => {
    it.each(['0x10', '1e3', ' 1', '1 ', '+1', '-1', '1.0', '0', '99999999999'])(
      'refuses /api/audit?ship=%j with 400',
      async (ship) => {
        const response = await request(url).get('/api/audit').query({ ship }).set(bearer(admin));
        expect(response.status).toBe(400);
        expect(response.body.message).toMatch(/ship must be a ship id, a whole number from 1 written in digits only/);
      },
    );

    it('reads a ship id written in plain digits', async () => {
      const response = await request(url).get('/api/audit').query({ ship: '1', limit: 1 }).set(bearer(admin));
      expect(response.status).toBe(200);
      expect(response.body.items[0].shipId).toBe(1);
    });
  });

  describe('token answers', () => {
    it('are never stored by a cache: sign-in and refresh send Cache-Control: no-store', async () => {
      const login = await request(url)
        .post('/api/auth/login')
        .send({ email: 'observer@catline.example', password: DEMO_PASSWORD });
      expect(login.status).toBe(200);
      expect(login.headers['cache-control']).toBe('no-store');
      const refresh = await request(url)
        .post('/api/auth/refresh')
        .set('Cookie', refreshCookie(login))
        .set('X-Catline-Refresh', '1');
      expect(refresh.status).toBe(200);
      expect(refresh.headers['cache-control']).toBe('no-store');
    });
  });
});
