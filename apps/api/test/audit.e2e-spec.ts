import { createHash, randomBytes } from 'node:crypto';
import { type AuditEntryView, DEMO_PASSWORD, type Page } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { PasswordLink } from '../src/database/entities/password-link.entity.js';
import { demoCatapults, demoShip } from '../src/database/seeds/demo-fleet.js';
import { fleetAdmin } from '../src/database/seeds/demo-second-ship.js';
import {
  TEST_PASSWORD,
  aircraftTypeBody,
  createAircraft,
  createAircraftType,
  createSquadron,
  createUser,
  unique,
} from './support/fleet-fixtures.js';
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

  describe('filters by instants and ship', () => {
    const csvRows = (text: string) =>
      text
        .replace(/^\uFEFF/, '')
        .split('\r\n')
        .filter((line) => line.length > 0 && !line.startsWith('# '))
        .slice(1);

    it('keeps entries from since (included) to until (excluded), in the list and the CSV alike', async () => {
      const first = await createUser(url, admin, 'observer');
      const firstAt = (await latest('person.created', first.id))!.at;
      const second = await createUser(url, admin, 'observer');
      const secondAt = (await latest('person.created', second.id))!.at;
      // Each creation hashes a password, so the two stand at different instants; this says so if ever not.
      expect(Date.parse(secondAt)).toBeGreaterThan(Date.parse(firstAt));

      const range = { action: 'person.created', since: firstAt, until: secondAt };
      const listed = await entries({ ...range, limit: 200 });
      expect(listed.items.map((entry) => entry.subjectId)).toEqual([first.id]);

      const csv = await request(url).get('/api/audit/export.csv').query(range).set(bearer(admin));
      expect(csv.status).toBe(200);
      const rows = csvRows(csv.text);
      expect(rows).toHaveLength(1);
      expect(rows[0]).toContain(`,person.created,person,${first.id},`);
    });

    it('refuses a range whose until comes before its since, in the list and the CSV, in words', async () => {
      const reversed = { since: '2027-01-02T00:00:00Z', until: '2027-01-01T00:00:00Z' };
      for (const path of ['/api/audit', '/api/audit/export.csv']) {
        const response = await request(url).get(path).query(reversed).set(bearer(admin));
        expect(response.status).toBe(400);
        expect(JSON.stringify(response.body.message)).toMatch(/until must not be before since/);
      }
      const empty = { since: '2027-01-01T00:00:00Z', until: '2027-01-01T00:00:00Z' };
      expect((await entries(empty)).total).toBe(0);
      const notAnInstant = await request(url).get('/api/audit').query({ since: 'yesterday' }).set(bearer(admin));
      expect(notAnInstant.status).toBe(400);
      expect(JSON.stringify(notAnInstant.body.message)).toMatch(/since must be an ISO 8601 instant/);
    });

    it("gives a fleet admin one ship's entries, and a ship's admin nothing of another ship", async () => {
      const fleet = await signIn(url, fleetAdmin.email);
      await createUser(url, admin, 'observer');
      const squadron = await request(url)
        .post('/api/squadrons')
        .set(bearer(fleet))
        .send({ shipId: 2, name: 'Second ship squadron', code: unique('S', 8), email: 'second@catline.example' })
        .expect(201);
      const secondShip = await entries({ ship: 2, limit: 200 }, fleet);
      expect(secondShip.items.map((entry) => entry.subjectId)).toContain(squadron.body.id);
      expect(secondShip.items.every((entry) => entry.shipId === 2)).toBe(true);
      const firstShip = await entries({ ship: 1, limit: 200 }, fleet);
      expect(firstShip.total).toBeGreaterThan(0);
      expect(firstShip.items.every((entry) => entry.shipId === 1)).toBe(true);
      expect((await entries({ ship: 2 })).total).toBe(0);
    });
  });

  describe('sign-ins and passwords', () => {
    it('records a successful sign-in by the person who signed in', async () => {
      const person = await createUser(url, admin, 'pilot');
      await signIn(url, person.email, TEST_PASSWORD);
      expect(await latest('sign_in.succeeded', person.id)).toMatchObject({
        actorId: person.id,
        actorEmail: person.email,
        actorRole: 'pilot',
        subjectType: 'person',
      });
    });

    it('records a password change by its owner, without the password', async () => {
      const person = await createUser(url, admin, 'observer');
      await request(url)
        .post('/api/auth/password')
        .set(bearer(await signIn(url, person.email, TEST_PASSWORD)))
        .send({ currentPassword: TEST_PASSWORD, newPassword: `${DEMO_PASSWORD}-changed` })
        .expect(204);
      const entry = await latest('password.changed', person.id);
      expect(entry).toMatchObject({ actorId: person.id, before: null, after: null });
    });

    it('records a password set through a reset link, by the link holder', async () => {
      const person = await createUser(url, admin, 'observer');
      const token = randomBytes(24).toString('base64url');
      await app.get(DataSource).manager.insert(PasswordLink, {
        userId: person.id,
        purpose: 'reset',
        tokenHash: createHash('sha256').update(token).digest('hex'),
        expiresAt: new Date(Date.now() + 60_000),
        createdAt: new Date(),
      });
      await request(url)
        .post('/api/auth/password-reset/confirm')
        .send({ token, newPassword: `${DEMO_PASSWORD}-by-link` })
        .expect(204);
      expect(await latest('password.set_by_link', person.id)).toMatchObject({
        actorId: person.id,
        actorEmail: person.email,
        summary: expect.stringMatching(/reset link/),
      });
    });

    it('records who sent an invitation again', async () => {
      const email = `${unique('invitee', 16).toLowerCase()}@catline.example`;
      const created = await request(url)
        .post('/api/users')
        .set(bearer(admin))
        .send({ email, name: 'Audit invitee', role: 'observer' })
        .expect(201);
      await request(url).post(`/api/users/${created.body.id}/invitation`).set(bearer(admin)).expect(202);
      expect(await latest('person.invited', created.body.id as number)).toMatchObject({
        actorEmail: ADMIN,
        subjectType: 'person',
      });
    });
  });

  describe('aircraft types and launch data', () => {
    it('records a type change and a type deletion', async () => {
      const type = await createAircraftType(url, admin);
      await request(url)
        .patch(`/api/aircraft-types/${type.id}`)
        .set(bearer(admin))
        .send({ name: 'Renamed in the audit test' })
        .expect(200);
      await request(url).delete(`/api/aircraft-types/${type.id}`).set(bearer(admin)).expect(204);

      expect(await latest('aircraft_type.updated', type.id)).toMatchObject({
        before: { name: type.name },
        after: { name: 'Renamed in the audit test' },
      });
      expect(await latest('aircraft_type.deleted', type.id)).toMatchObject({
        before: { designation: type.designation },
        after: null,
      });
    });

    it('records the launch table before and after a replacement', async () => {
      const type = await createAircraftType(url, admin);
      const rows = [
        { grossWeightLb: 25_000, minLaunchAirspeedKt: 118 },
        { grossWeightLb: 40_000, minLaunchAirspeedKt: 138 },
      ];
      await request(url)
        .put(`/api/aircraft-types/${type.id}/launch-table`)
        .set(bearer(admin))
        .send({ rows })
        .expect(200);
      expect(await latest('launch_table.replaced', type.id)).toMatchObject({
        before: { launchTable: aircraftTypeBody().launchTable },
        after: { launchTable: rows },
      });
    });
  });

  describe('squadrons, the ship and its catapults', () => {
    it('records a squadron added, changed and deleted', async () => {
      const squadron = await createSquadron(url, admin);
      await request(url)
        .patch(`/api/squadrons/${squadron.id}`)
        .set(bearer(admin))
        .send({ name: 'Renamed squadron' })
        .expect(200);
      await request(url).delete(`/api/squadrons/${squadron.id}`).set(bearer(admin)).expect(204);

      expect(await latest('squadron.created', squadron.id)).toMatchObject({
        actorEmail: ADMIN,
        subjectType: 'squadron',
        shipId: 1,
        before: null,
        after: { code: squadron.code, name: squadron.name },
      });
      expect(await latest('squadron.updated', squadron.id)).toEqual(
        expect.objectContaining({ before: { name: squadron.name }, after: { name: 'Renamed squadron' } }),
      );
      expect(await latest('squadron.deleted', squadron.id)).toMatchObject({
        before: { code: squadron.code },
        after: null,
      });
    });

    it('records a change of the ship and of a catapult, and only what changed', async () => {
      const patchShip = (pairGapS: number) =>
        request(url).patch('/api/ships/1').set(bearer(admin)).send({ pairGapS }).expect(200);
      const patchCatapult = (resetIntervalS: number) =>
        request(url).patch('/api/ships/1/catapults/1').set(bearer(admin)).send({ resetIntervalS }).expect(200);
      try {
        await patchShip(demoShip.pairGapS + 1);
        await patchCatapult(demoCatapults[0].resetIntervalS + 1);
        expect(await latest('ship.updated', 1)).toEqual(
          expect.objectContaining({
            subjectType: 'ship',
            before: { pairGapS: demoShip.pairGapS },
            after: { pairGapS: demoShip.pairGapS + 1 },
          }),
        );
        expect(await latest('catapult.updated', 1)).toEqual(
          expect.objectContaining({
            subjectType: 'catapult',
            shipId: 1,
            before: { resetIntervalS: demoCatapults[0].resetIntervalS },
            after: { resetIntervalS: demoCatapults[0].resetIntervalS + 1 },
          }),
        );
      } finally {
        await patchShip(demoShip.pairGapS);
        await patchCatapult(demoCatapults[0].resetIntervalS);
      }
    });
  });

  it('refuses to change or delete an entry, even to the database account of the app', async () => {
    const person = await createUser(url, admin, 'observer');
    const entry = (await latest('person.created', person.id))!;
    const database = app.get(DataSource);

    await expect(
      database.query('UPDATE audit_entries SET summary = ? WHERE id = ?', ['rewritten', entry.id]),
    ).rejects.toThrow(/append-only/);
    await expect(database.query('DELETE FROM audit_entries WHERE id = ?', [entry.id])).rejects.toThrow(/append-only/);
    expect(await latest('person.created', person.id)).toEqual(entry);
  });
});
