import type { AuditEntryView, Page } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { fleetAdmin } from '../src/database/seeds/demo-second-ship.js';
import { createAircraft, createUser, unique } from './support/fleet-fixtures.js';
import { ADMIN, AIR_OPS, LineupDriver } from './support/lineup-fixtures.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

describe('audit trail', () => {
  let app: INestApplication;
  let url: string;
  let admin: string;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    admin = await signIn(url, ADMIN);
  });

  afterAll(async () => {
    await app.close();
  });

  const entries = async (query: Record<string, string | number>, as = admin): Promise<Page<AuditEntryView>> => {
    const response = await request(url).get('/api/audit').query(query).set(bearer(as));
    expect(response.status).toBe(200);
    return response.body as Page<AuditEntryView>;
  };
  const latest = async (action: string, subjectId: number): Promise<AuditEntryView | undefined> =>
    (await entries({ action, limit: 200 })).items.find((entry) => entry.subjectId === subjectId);

  it('records a role change with who made it and the role before and after', async () => {
    const person = await createUser(url, admin, 'observer');

    await request(url).patch(`/api/users/${person.id}`).set(bearer(admin)).send({ role: 'handler' }).expect(200);

    const entry = await latest('person.updated', person.id);
    expect(entry).toMatchObject({
      actorEmail: ADMIN,
      actorRole: 'admin',
      subjectType: 'person',
      before: { role: 'observer' },
      after: { role: 'handler' },
    });
    expect(entry?.clientAddress).toMatch(/127\.0\.0\.1/);
    expect(Date.now() - Date.parse(entry!.at)).toBeLessThan(60_000);
  });

  it('records who created a person and who removed them', async () => {
    const person = await createUser(url, admin, 'pilot');
    await request(url).delete(`/api/users/${person.id}`).set(bearer(admin)).expect(204);

    expect(await latest('person.created', person.id)).toMatchObject({ actorEmail: ADMIN, after: { role: 'pilot' } });
    expect(await latest('person.removed', person.id)).toMatchObject({
      before: { active: true },
      after: { active: false },
    });
  });

  it('records a failed sign-in with the address typed, and no entry for a refused change', async () => {
    const typed = `${unique('nobody', 12).toLowerCase()}@catline.example`;
    await request(url).post('/api/auth/login').send({ email: typed, password: 'not the password' }).expect(401);

    // An address nobody signs in with belongs to no ship: the fleet admin reads it, a ship's admin does not.
    const failed = await entries({ action: 'sign_in.failed', actor: typed }, await signIn(url, fleetAdmin.email));
    expect(failed.total).toBe(1);
    expect(failed.items[0]).toMatchObject({
      actorId: null,
      actorEmail: typed,
      shipId: null,
      summary: expect.stringMatching(/no person/i),
    });
    expect((await entries({ action: 'sign_in.failed', actor: typed })).total).toBe(0);

    const aircraft = await createAircraft(url, admin);
    const other = await createAircraft(url, admin);
    await request(url)
      .patch(`/api/aircraft/${other.id}`)
      .set(bearer(admin))
      .send({ sideNumber: aircraft.sideNumber })
      .expect(409);
    expect(await latest('aircraft.updated', other.id)).toBeUndefined();
  });

  it('records an aircraft change with only the fields that changed', async () => {
    const aircraft = await createAircraft(url, admin);
    await request(url)
      .patch(`/api/aircraft/${aircraft.id}`)
      .set(bearer(admin))
      .send({ serviceable: false })
      .expect(200);

    const entry = await latest('aircraft.updated', aircraft.id);
    expect(entry).toMatchObject({ before: { serviceable: true }, after: { serviceable: false } });
    expect(Object.keys(entry!.after!)).toEqual(['serviceable']);
  });

  it('records cycle creation by air operations', async () => {
    const deck = new LineupDriver(url);
    const cycle = await deck.createCycle();
    expect(await latest('cycle.created', cycle.id)).toMatchObject({
      actorEmail: AIR_OPS,
      actorRole: 'air_operations',
      after: { number: cycle.number },
    });
  });

  it('pages newest first and refuses a page larger than the maximum', async () => {
    const first = await entries({ limit: 2, offset: 0 });
    const second = await entries({ limit: 2, offset: 1 });
    expect(first.items).toHaveLength(2);
    expect(first.total).toBeGreaterThanOrEqual(3);
    expect(second.items[0].id).toBe(first.items[1].id);
    expect(Date.parse(first.items[0].at)).toBeGreaterThanOrEqual(Date.parse(first.items[1].at));

    const tooMany = await request(url).get('/api/audit').query({ limit: 201 }).set(bearer(admin));
    expect(tooMany.status).toBe(400);
  });

  it('exports the filtered trail as CSV', async () => {
    const person = await createUser(url, admin, 'observer');
    const response = await request(url)
      .get('/api/audit/export.csv')
      .query({ action: 'person.created' })
      .set(bearer(admin));

    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toMatch(/^text\/csv/);
    // The first line is the launch caution every Catline CSV opens with.
    const lines = response.text
      .replace(/^\uFEFF/, '')
      .split('\r\n')
      .filter((line) => !line.startsWith('# '));
    expect(lines[0]).toBe(
      'id,at,actor id,actor e-mail,actor role,client address,action,subject type,subject id,ship id,summary,before,after,time zone',
    );
    expect(lines.some((line) => line.includes(`,person.created,person,${person.id},`))).toBe(true);
    expect(
      lines.filter((line) => line.length > 0).every((line, index) => index === 0 || line.includes('person.created')),
    ).toBe(true);
  });
});
