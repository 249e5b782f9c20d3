import type { UserView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createSquadron, createUser, TEST_PASSWORD, unique } from './support/fleet-fixtures.js';
import { readAllPages } from './support/paged-list.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

describe('people', () => {
  let app: INestApplication;
  let url: string;
  let admin: string;
  let adminId: number;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    admin = await signIn(url, 'admin@catline.example');
    adminId = (await request(url).get('/api/auth/me').set(bearer(admin))).body.id;
  });

  afterAll(async () => {
    await app.close();
  });

  const list = (): Promise<UserView[]> => readAllPages(url, admin, '/api/users');
  const post = (body: object) => request(url).post('/api/users').set(bearer(admin)).send(body);
  const patch = (id: number, body: object) => request(url).patch(`/api/users/${id}`).set(bearer(admin)).send(body);
  const newPerson = () => {
    const name = unique('new', 12).toLowerCase();
    return { email: `${name}@catline.example`, name: `New ${name}`, role: 'pilot', password: TEST_PASSWORD };
  };

  it('lists everyone for the admin, with their bindings', async () => {
    const people = await list();
    expect(people.find((person) => person.email === 'cat3@catline.example')).toMatchObject({
      role: 'catapult_officer',
      catapultId: 3,
      active: true,
    });
    expect(people.find((person) => person.email === 'pilot@catline.example')).toMatchObject({
      role: 'pilot',
      catapultId: null,
      squadronId: 1,
    });
  });

  it('lists only active pilots for assigning', async () => {
    const handler = await signIn(url, 'handler@catline.example');
    const removed = await createUser(url, admin, 'pilot');
    await request(url).delete(`/api/users/${removed.id}`).set(bearer(admin));

    const pilots = await readAllPages<UserView>(url, handler, '/api/users/pilots');

    expect(pilots.length).toBeGreaterThanOrEqual(9);
    expect(pilots.every((person) => person.role === 'pilot' && person.active)).toBe(true);
    expect(pilots.map((person) => person.id)).not.toContain(removed.id);
  });

  describe('create', () => {
    it('creates a pilot of a squadron who can sign in', async () => {
      const squadron = await createSquadron(url, admin);
      const body = { ...newPerson(), squadronId: squadron.id };
      const response = await post(body);
      expect(response.status).toBe(201);
      expect(response.body).toEqual({
        id: expect.any(Number),
        email: body.email,
        name: body.name,
        role: 'pilot',
        catapultId: null,
        squadronId: squadron.id,
        active: true,
      });
      await expect(signIn(url, body.email, TEST_PASSWORD)).resolves.toEqual(expect.any(String));
    });

    it('creates a catapult officer bound to a catapult', async () => {
      const response = await post({ ...newPerson(), role: 'catapult_officer', catapultId: 4 });
      expect(response.status).toBe(201);
      expect(response.body.catapultId).toBe(4);
    });

    it.each([
      ['a catapult officer without a catapult', { role: 'catapult_officer' }, /must be given the catapult/],
      [
        'a pilot bound to a catapult',
        { catapultId: 1 },
        /Only a catapult officer or a deck edge operator is bound to a catapult/,
      ],
      ['an unknown catapult', { role: 'catapult_officer', catapultId: 999_999 }, /no catapult with id 999999/],
      ['an unknown squadron', { squadronId: 999_999 }, /no squadron with id 999999/],
      ['a password under 12 characters', { password: 'short pass' }, /password must be at least 12 characters/],
      ['an unknown role', { role: 'captain' }, /role must be one of/],
      ['a missing name', { name: undefined }, /name/],
      ['a blank name', { name: '   ' }, /name is required/],
      ['a bad e-mail', { email: 'not-an-email' }, /email must be an e-mail address/],
      ['a catapult id given as text', { role: 'catapult_officer', catapultId: '1' }, /catapultId must be an integer/],
      ['an extra field', { tokenVersion: 5 }, /property tokenVersion should not exist/],
    ])('refuses %s with a 400 and creates nobody', async (_case, change, message) => {
      const body = { ...newPerson(), ...change };
      const before = (await list()).length;
      const response = await post(body);
      expect(response.status).toBe(400);
      expect(response.body.message).toMatch(message);
      expect((await list()).length).toBe(before);
    });

    it('refuses an e-mail already in use, in any case, with 409', async () => {
      const response = await post({ ...newPerson(), email: 'Handler@Catline.example' });
      expect(response.status).toBe(409);
      expect(response.body).toMatchObject({
        code: 'email_taken',
        message: expect.stringMatching(/handler@catline\.example/),
      });
    });
  });

  describe('update', () => {
    it('binds a new catapult officer to a catapult and releases it when the role changes', async () => {
      const person = await createUser(url, admin, 'observer');

      const refused = await patch(person.id, { role: 'catapult_officer' });
      expect(refused.status).toBe(400);
      expect(refused.body.code).toBe('invalid_binding');

      const bound = await patch(person.id, { role: 'catapult_officer', catapultId: 2 });
      expect(bound.status).toBe(200);
      expect(bound.body).toMatchObject({ role: 'catapult_officer', catapultId: 2 });

      const released = await patch(person.id, { role: 'handler' });
      expect(released.status).toBe(200);
      expect(released.body).toMatchObject({ role: 'handler', catapultId: null });
    });

    it('makes a role change take effect at once: the old token stops working', async () => {
      const person = await createUser(url, admin, 'observer');
      const token = await signIn(url, person.email, TEST_PASSWORD);
      expect((await patch(person.id, { role: 'handler' })).status).toBe(200);
      expect((await request(url).get('/api/auth/me').set(bearer(token))).status).toBe(401);
      const fresh = await signIn(url, person.email, TEST_PASSWORD);
      expect((await request(url).get('/api/auth/me').set(bearer(fresh))).body.role).toBe('handler');
    });

    it.each([
      ['a null name', { name: null }, /name must be a string/],
      ['a text active flag', { active: 'yes' }, /active must be a boolean value/],
      ['an unknown squadron', { squadronId: 999_999 }, /no squadron with id 999999/],
      ['an e-mail change', { email: 'changed@catline.example' }, /property email should not exist/],
    ])('refuses %s with a 400 and changes nothing', async (_case, body, message) => {
      const person = await createUser(url, admin, 'observer');
      const response = await patch(person.id, body);
      expect(response.status).toBe(400);
      expect(response.body.message).toMatch(message);
      expect((await list()).find((p) => p.id === person.id)).toEqual(person);
    });

    it('answers 404 for an unknown person and 400 for an id that is not a number', async () => {
      expect((await patch(999_999, { name: 'Nobody' })).status).toBe(404);
      const text = await patch(Number.NaN, { name: 'Nobody' });
      expect(text.status).toBe(400);
      expect(text.body).toMatchObject({
        code: 'invalid_id',
        message: 'The id in the address must be a whole number from 1, written in digits only.',
      });
    });

    it('refuses an admin changing their own role or deactivating themselves', async () => {
      expect((await patch(adminId, { role: 'observer' })).status).toBe(409);
      expect((await patch(adminId, { active: false })).status).toBe(409);
      expect((await list()).find((p) => p.id === adminId)).toMatchObject({ role: 'admin', active: true });
    });
  });

  describe('remove', () => {
    it('deactivates the person, who can no longer sign in', async () => {
      const person = await createUser(url, admin);
      expect((await request(url).delete(`/api/users/${person.id}`).set(bearer(admin))).status).toBe(204);
      expect((await list()).find((p) => p.id === person.id)?.active).toBe(false);
      await expect(signIn(url, person.email, TEST_PASSWORD)).rejects.toThrow(/401/);
    });

    it('refuses removing yourself with a readable 409', async () => {
      const response = await request(url).delete(`/api/users/${adminId}`).set(bearer(admin));
      expect(response.status).toBe(409);
      expect(response.body.message).toBe('You cannot remove your own account; ask another admin.');
    });

    it('answers 404 for an unknown person', async () => {
      expect((await request(url).delete('/api/users/999999').set(bearer(admin))).status).toBe(404);
    });
  });
});
