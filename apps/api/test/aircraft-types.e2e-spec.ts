import type { AircraftTypeView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { aircraftTypeBody, createAircraft, createAircraftType } from './support/fleet-fixtures.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

describe('aircraft types', () => {
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

  const list = async (): Promise<AircraftTypeView[]> =>
    (await request(url).get('/api/aircraft-types').set(bearer(admin))).body;
  const get = (id: number) => request(url).get(`/api/aircraft-types/${id}`).set(bearer(admin));
  const putTable = (id: number, rows: unknown) =>
    request(url).put(`/api/aircraft-types/${id}/launch-table`).set(bearer(admin)).send({ rows });

  it('creates a type and reads it back whole, a jet when no class is given', async () => {
    const body = aircraftTypeBody();
    const created = await request(url).post('/api/aircraft-types').set(bearer(admin)).send(body);
    expect(created.status).toBe(201);
    // A ship's admin creates for their own ship, the only one they list.
    const [ship] = (await request(url).get('/api/ships').set(bearer(admin))).body as { id: number }[];
    expect(created.body).toEqual({
      id: expect.any(Number),
      ...body,
      aircraftClass: 'jet',
      storesCatalogue: [],
      settingTables: [],
      holdbackElement: null,
      shipId: ship.id,
    });
    expect((await get(created.body.id)).body).toEqual(created.body);
  });

  it('creates a type that never needs afterburner when afterburnerFromLb is null', async () => {
    const created = await request(url)
      .post('/api/aircraft-types')
      .set(bearer(admin))
      .send({ ...aircraftTypeBody(), afterburnerFromLb: null });
    expect(created.status).toBe(201);
    expect(created.body.afterburnerFromLb).toBeNull();
  });

  const good = aircraftTypeBody().launchTable;
  it.each([
    ['a missing launch table', { launchTable: undefined }, /launchTable/],
    ['a launch table of one row', { launchTable: [good[0]] }, /launchTable needs at least two rows/],
    ['a negative weight', { maxGrossWeightLb: -40_000 }, /maxGrossWeightLb must be a positive number/],
    ['a weight given as text', { maxGrossWeightLb: '40000' }, /maxGrossWeightLb must be an integer number/],
    [
      'a negative launch airspeed',
      { launchTable: [good[0], { ...good[1], minLaunchAirspeedKt: -1 }] },
      /minLaunchAirspeedKt must be a positive number/,
    ],
    [
      'weights not rising',
      { launchTable: [good[1], good[0]] },
      /Launch table row 2 \(25000 lb\) must be heavier than row 1 \(40000 lb\)/,
    ],
    [
      'a last trim band with an upper weight',
      { trimBands: [{ upToLb: 30_000, trimDeg: 10 }] },
      /The last trim band must have no upper weight/,
    ],
    ['a trim band without a trim', { trimBands: [{ upToLb: null }] }, /trimDeg must be a number/],
    ['a class not in the list', { aircraftClass: 'glider' }, /aircraftClass must be one of jet, turboprop, helicopter/],
    ['a null class', { aircraftClass: null }, /aircraftClass must be one of jet, turboprop, helicopter/],
    [
      'an extra field in a launch table row',
      { launchTable: [good[0], { ...good[1], note: 'x' }] },
      /property note should not exist/,
    ],
    [
      'the designation of another type',
      { designation: 'WKD-41' },
      /Another aircraft type is already designated WKD-41/,
    ],
  ])('refuses %s and creates nothing', async (_case, change, message) => {
    const before = await list();
    const response = await request(url)
      .post('/api/aircraft-types')
      .set(bearer(admin))
      .send({ ...aircraftTypeBody(), ...change });
    expect(response.status).toBeGreaterThanOrEqual(400);
    expect(response.status).toBeLessThan(500);
    expect(response.body.message).toMatch(message);
    expect(await list()).toEqual(before);
  });

  it('changes a type but not its launch table through PATCH', async () => {
    const type = await createAircraftType(url, admin);
    const response = await request(url)
      .patch(`/api/aircraft-types/${type.id}`)
      .set(bearer(admin))
      .send({ crosswindLimitKt: 18, afterburnerFromLb: null });
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ ...type, crosswindLimitKt: 18, afterburnerFromLb: null });

    const table = await request(url)
      .patch(`/api/aircraft-types/${type.id}`)
      .set(bearer(admin))
      .send({ launchTable: good });
    expect(table.status).toBe(400);
    expect(table.body.message).toMatch(/property launchTable should not exist/);
  });

  it('changes a type’s class and refuses a class not in the list or cleared', async () => {
    const type = await createAircraftType(url, admin);
    const patch = (aircraftClass: unknown) =>
      request(url).patch(`/api/aircraft-types/${type.id}`).set(bearer(admin)).send({ aircraftClass });
    const changed = await patch('helicopter');
    expect(changed.status).toBe(200);
    expect(changed.body).toEqual({ ...type, aircraftClass: 'helicopter' });
    for (const refused of ['airship', null]) {
      const response = await patch(refused);
      expect(response.status).toBe(400);
      expect(response.body.message).toMatch(/aircraftClass must be one of jet, turboprop, helicopter/);
    }
    expect((await get(type.id)).body.aircraftClass).toBe('helicopter');
  });

  it('replaces the launch table', async () => {
    const type = await createAircraftType(url, admin);
    const rows = [
      { grossWeightLb: 24_000, minLaunchAirspeedKt: 113.5 },
      { grossWeightLb: 32_000, minLaunchAirspeedKt: 124 },
      { grossWeightLb: 40_000, minLaunchAirspeedKt: 136 },
    ];
    const response = await putTable(type.id, rows);
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ ...type, launchTable: rows });
    expect((await get(type.id)).body.launchTable).toEqual(rows);
  });

  it.each([
    ['repeated weights', [good[0], good[0]], /row 2 \(25000 lb\) must be heavier than row 1/],
    ['a zero weight', [{ ...good[0], grossWeightLb: 0 }, good[1]], /grossWeightLb must be a positive number/],
    ['rows that are not a list', { 0: good[0] }, /rows must be an array/],
  ])('refuses a launch table with %s and keeps the old one', async (_case, rows, message) => {
    const type = await createAircraftType(url, admin);
    const response = await putTable(type.id, rows);
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(message);
    expect((await get(type.id)).body).toEqual(type);
  });

  const putStores = (id: number, items: unknown) =>
    request(url).put(`/api/aircraft-types/${id}/stores-catalogue`).set(bearer(admin)).send({ items });

  it('replaces the stores catalogue, keeps it ordered by name, and audits it', async () => {
    const type = await createAircraftType(url, admin);
    const items = [
      { name: 'Training pod', weightEachLb: 175 },
      { name: 'Fuel tank', weightEachLb: 1_210 },
    ];
    const response = await putStores(type.id, items);
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ ...type, storesCatalogue: [items[1], items[0]] });
    expect((await get(type.id)).body.storesCatalogue).toEqual([items[1], items[0]]);
    const audit = await request(url)
      .get('/api/audit')
      .query({ action: 'stores_catalogue.replaced' })
      .set(bearer(admin));
    expect(audit.body.items[0]).toMatchObject({
      subjectId: type.id,
      summary: `Stores catalogue of ${type.designation} replaced (2 items)`,
    });
  });

  it.each([
    [
      'a name given twice',
      [
        { name: 'Pod', weightEachLb: 1 },
        { name: 'POD', weightEachLb: 2 },
      ],
      /names POD twice/,
    ],
    ['a weight of zero', [{ name: 'Pod', weightEachLb: 0 }], /weightEachLb must not be less than 1/],
    ['a fractional weight', [{ name: 'Pod', weightEachLb: 1.5 }], /whole pounds/],
    ['an empty name', [{ name: ' ', weightEachLb: 10 }], /needs a name/],
  ])('refuses a stores catalogue with %s and keeps the old one', async (_case, items, message) => {
    const type = await createAircraftType(url, admin);
    const response = await putStores(type.id, items);
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(message);
    expect((await get(type.id)).body).toEqual(type);
  });

  const putSettings = (id: number, tables: unknown) =>
    request(url).put(`/api/aircraft-types/${id}/setting-tables`).set(bearer(admin)).send({ tables });
  const settingTable = (catapultNumber: number, configuration: string, rows = [{ upToLb: 30_000, setting: 5 }]) => ({
    catapultNumber,
    configuration,
    recommendedExcessKt: 12,
    rows,
  });

  it('replaces the approved setting tables, keeps them by catapult then configuration, and audits it', async () => {
    const type = await createAircraftType(url, admin);
    const tables = [
      settingTable(2, 'stores'),
      settingTable(1, 'stores'),
      settingTable(1, 'clean', [
        { upToLb: 30_000, setting: 4 },
        { upToLb: 36_000, setting: 9 },
      ]),
    ];
    const response = await putSettings(type.id, tables);
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ ...type, settingTables: [tables[2], tables[1], tables[0]] });
    expect((await get(type.id)).body.settingTables).toEqual([tables[2], tables[1], tables[0]]);
    const audit = await request(url).get('/api/audit').query({ action: 'setting_tables.replaced' }).set(bearer(admin));
    expect(audit.body.items[0]).toMatchObject({
      subjectId: type.id,
      summary: `Approved setting tables of ${type.designation} replaced (3 tables)`,
    });
  });

  it.each([
    ['a catapult the ship lacks', [settingTable(9, 'clean')], /has no cat 9/],
    [
      'a table given twice',
      [settingTable(1, 'clean'), settingTable(1, 'clean')],
      /clean table of cat 1 is given twice/,
    ],
    [
      'weights that do not rise',
      [
        settingTable(1, 'clean', [
          { upToLb: 30_000, setting: 4 },
          { upToLb: 30_000, setting: 5 },
        ]),
      ],
      /row 2 \(up to 30000 lb\) must end above row 1/,
    ],
    // The demo ship's catapults have 40 settings, 0 to 39.
    ['a setting the catapult lacks', [settingTable(1, 'clean', [{ upToLb: 30_000, setting: 40 }])], /goes up to 39/],
    ['a fractional setting', [settingTable(1, 'clean', [{ upToLb: 30_000, setting: 4.5 }])], /whole number/],
    ['an unknown configuration', [settingTable(1, 'ferry')], /configuration is one of clean, stores/],
    ['no rows', [settingTable(1, 'clean', [])], /at least one row/],
  ])('refuses setting tables with %s and keeps the old ones', async (_case, tables, message) => {
    const type = await createAircraftType(url, admin);
    const response = await putSettings(type.id, tables);
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(message);
    expect((await get(type.id)).body).toEqual(type);
  });

  it('deletes an unused type and refuses one still used by aircraft with 409', async () => {
    const unused = await createAircraftType(url, admin);
    expect((await request(url).delete(`/api/aircraft-types/${unused.id}`).set(bearer(admin))).status).toBe(204);
    expect((await get(unused.id)).status).toBe(404);

    const used = await createAircraftType(url, admin);
    await createAircraft(url, admin, { typeId: used.id });
    const refused = await request(url).delete(`/api/aircraft-types/${used.id}`).set(bearer(admin));
    expect(refused.status).toBe(409);
    expect(refused.body.message).toBe(
      `1 aircraft are of type ${used.designation}; change or delete them before deleting the type.`,
    );
    expect((await get(used.id)).status).toBe(200);
  });

  it('answers 404 with a message for an unknown type', async () => {
    const response = await get(999_999);
    expect(response.status).toBe(404);
    expect(response.body.message).toBe('There is no aircraft type with id 999999.');
    expect((await putTable(999_999, good)).status).toBe(404);
  });
});
