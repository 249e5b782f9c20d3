import type { SquadronView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { createAircraft, createSquadron, unique } from './support/fleet-fixtures.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

describe('squadrons', () => {
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

  const list = async (): Promise<SquadronView[]> => (await request(url).get('/api/squadrons').set(bearer(admin))).body;

  it('creates, renames and deletes a squadron', async () => {
    const code = unique('NEW', 10);
    const created = await request(url)
      .post('/api/squadrons')
      .set(bearer(admin))
      .send({ name: ' Stormpetrels ', code, email: 'storm@catline.example' });
    expect(created.status).toBe(201);
    // A ship's admin creates for their own ship, the only one they list.
    const [ship] = (await request(url).get('/api/ships').set(bearer(admin))).body as { id: number }[];
    expect(created.body).toEqual({
      id: expect.any(Number),
      name: 'Stormpetrels',
      code,
      email: 'storm@catline.example',
      shipId: ship.id,
    });

    const renamed = await request(url)
      .patch(`/api/squadrons/${created.body.id}`)
      .set(bearer(admin))
      .send({ name: 'Storm Petrels' });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toEqual({ ...created.body, name: 'Storm Petrels' });

    expect((await request(url).delete(`/api/squadrons/${created.body.id}`).set(bearer(admin))).status).toBe(204);
    expect((await list()).map((squadron) => squadron.id)).not.toContain(created.body.id);
  });

  it.each([
    ['a missing e-mail', { email: undefined }, /email must be an e-mail address/],
    ['a code with spaces', { code: 'A B' }, /code must be 1 to 12 letters, digits or dashes/],
    ['a numeric name', { name: 42 }, /name must be a string/],
    ['an extra field', { id: 7 }, /property id should not exist/],
  ])('refuses %s with a 400 and creates nothing', async (_case, change, message) => {
    const before = await list();
    const response = await request(url)
      .post('/api/squadrons')
      .set(bearer(admin))
      .send({ name: 'Bad', code: unique('BAD', 10), email: 'bad@catline.example', ...change });
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(message);
    expect(await list()).toEqual(before);
  });

  it('refuses a code already in use with 409, on create and on rename', async () => {
    const created = await request(url)
      .post('/api/squadrons')
      .set(bearer(admin))
      .send({ name: 'Copy', code: 'CWR', email: 'copy@catline.example' });
    expect(created.status).toBe(409);
    expect(created.body).toEqual({
      statusCode: 409,
      code: 'code_taken',
      message: 'Another squadron already uses the code CWR.',
    });

    const own = await createSquadron(url, admin);
    const renamed = await request(url).patch(`/api/squadrons/${own.id}`).set(bearer(admin)).send({ code: 'DFM' });
    expect(renamed.status).toBe(409);
    expect((await list()).find((squadron) => squadron.id === own.id)).toEqual(own);
  });

  it('refuses deleting a squadron that still has aircraft with 409, keeping it', async () => {
    const squadron = await createSquadron(url, admin);
    await createAircraft(url, admin, { squadronId: squadron.id });
    const response = await request(url).delete(`/api/squadrons/${squadron.id}`).set(bearer(admin));
    expect(response.status).toBe(409);
    expect(response.body.message).toBe(
      `Squadron ${squadron.code} still has 1 aircraft; move or delete them before deleting the squadron.`,
    );
    expect((await list()).map((s) => s.id)).toContain(squadron.id);
  });

  it('answers 404 for an unknown squadron', async () => {
    expect((await request(url).patch('/api/squadrons/999999').set(bearer(admin)).send({ name: 'X' })).status).toBe(404);
    expect((await request(url).delete('/api/squadrons/999999').set(bearer(admin))).status).toBe(404);
  });
});
