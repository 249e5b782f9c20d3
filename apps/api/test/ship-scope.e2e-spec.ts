import type {
  AircraftTypeView,
  AircraftView,
  AuditEntryView,
  CycleLanding,
  CycleView,
  ShipView,
  ShotCounts,
  SquadronView,
  UserView,
} from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import request from 'supertest';
import { fleetAdmin, secondShip as secondShipSeed, secondShipPeople } from '../src/database/seeds/demo-second-ship.js';
import { TEST_PASSWORD, aircraftTypeBody, unique } from './support/fleet-fixtures.js';
import { ADMIN, AIR_OPS, LineupDriver, OBSERVER } from './support/lineup-fixtures.js';
import { bearer } from './support/sign-in.js';
import { connected, join, openSocket } from './support/socket-client.js';
import { startTestApp } from './support/test-app.js';

const secondShip = (role: string) => secondShipPeople.find((person) => person.role === role)!.email;
const OTHER_ADMIN = secondShip('admin');
const OTHER_AIR_OPS = secondShip('air_operations');
const OTHER_OBSERVER = secondShip('observer');
const ids = (rows: { id: number }[]) => rows.map((row) => row.id);
const PAGED_LISTS = ['/api/users', '/api/users/pilots', '/api/aircraft', '/api/cycles'];

// Finding 12 of issue 22: with one ship only, nothing tied people, aircraft or squadrons to a ship, so a
// second ship's cycles were open to every handler and air operations person. The demo has two ships now;
// each ship's people must neither see nor change the other's data, and must not learn which ids exist.
describe('finding 12: ships own their data', () => {
  let app: INestApplication;
  let url: string;
  let deck: LineupDriver;
  let firstCycle: CycleView;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    deck = new LineupDriver(url);
    firstCycle = await deck.createCycle();
  });

  /** Every row of a list as `email` reads it, page after page where the list is paged. */
  const rows = <T>(email: string, path: string): Promise<T[]> =>
    PAGED_LISTS.includes(path) ? deck.all<T>(email, path) : deck.ok<T[]>(email, 'get', path);

  afterAll(async () => {
    await app.close();
  });

  it("lists none of the first ship's people, aircraft, squadrons, types, ships or cycles to the second ship", async () => {
    for (const path of ['/api/users', '/api/aircraft', '/api/squadrons', '/api/aircraft-types', '/api/ships']) {
      const first = ids(await rows<{ id: number }>(ADMIN, path));
      const second = ids(await rows<{ id: number }>(OTHER_ADMIN, path));
      expect({ path, shared: second.filter((id) => first.includes(id)) }).toEqual({ path, shared: [] });
      expect(second.length).toBeGreaterThan(0);
    }
    const cycles = await rows<CycleView>(OTHER_AIR_OPS, '/api/cycles');
    expect(cycles.map((cycle) => cycle.id)).not.toContain(firstCycle.id);
  });

  it("answers the second ship's admin about a first-ship row as about one that does not exist, and changes nothing", async () => {
    const [aircraft] = await rows<AircraftView>(ADMIN, '/api/aircraft');
    const [squadron] = await rows<SquadronView>(ADMIN, '/api/squadrons');
    const person = (await rows<UserView>(ADMIN, '/api/users')).find((user) => user.role === 'observer')!;
    const [ship] = await rows<ShipView>(ADMIN, '/api/ships');
    const cases = [
      { path: `/api/aircraft/${aircraft.id}`, missing: '/api/aircraft/2000000000', body: { parkedSpot: 'row-1' } },
      { path: `/api/squadrons/${squadron.id}`, missing: '/api/squadrons/2000000000', body: { name: 'Taken over' } },
      { path: `/api/users/${person.id}`, missing: '/api/users/2000000000', body: { name: 'Taken over' } },
      { path: `/api/ships/${ship.id}`, missing: '/api/ships/2000000000', body: { pairGapS: 30 } },
      {
        path: `/api/aircraft-types/${aircraft.typeId}`,
        missing: '/api/aircraft-types/2000000000',
        body: { name: 'X' },
      },
    ];
    for (const { path, missing, body } of cases) {
      const foreign = await deck.call(OTHER_ADMIN, 'patch', path, body);
      const absent = await deck.call(OTHER_ADMIN, 'patch', missing, body);
      expect({ path, status: foreign.status, code: foreign.body.code }).toEqual({
        path,
        status: 404,
        code: absent.body.code,
      });
      expect(foreign.body.message.replace(/\d+/g, 'N')).toBe(absent.body.message.replace(/\d+/g, 'N'));
    }
    expect(await rows<AircraftView>(ADMIN, '/api/aircraft')).toContainEqual(aircraft);
    expect((await deck.ok<ShipView>(ADMIN, 'get', `/api/ships/${ship.id}`)).pairGapS).toBe(ship.pairGapS);
    expect((await deck.call(OTHER_ADMIN, 'get', `/api/aircraft-types/${aircraft.typeId}`)).status).toBe(404);
    const removal = await request(url)
      .delete(`/api/aircraft/${aircraft.id}`)
      .set(bearer(await deck.token(OTHER_ADMIN)));
    expect(removal.status).toBe(404);
  });

  it("refuses the second ship's people every route under a first-ship cycle, and a cycle on the first ship", async () => {
    const missing = await deck.call(OTHER_AIR_OPS, 'get', '/api/cycles/2000000000/lineup');
    for (const path of ['', '/lineup', '/report', '/slots.csv', '/lineup/changes']) {
      const response = await deck.call(OTHER_AIR_OPS, 'get', `/api/cycles/${firstCycle.id}${path}`);
      expect({ path, status: response.status, code: response.body.code }).toEqual({
        path,
        status: 404,
        code: missing.body.code,
      });
    }
    const closing = await deck.call(OTHER_AIR_OPS, 'post', `/api/cycles/${firstCycle.id}/close`, {
      basisVersion: firstCycle.version,
    });
    expect(closing.status).toBe(404);
    expect((await deck.ok<CycleView>(AIR_OPS, 'get', `/api/cycles/${firstCycle.id}`)).state).toBe(firstCycle.state);

    const created = await deck.call(OTHER_AIR_OPS, 'post', '/api/cycles', await deck.createCycleBody());
    expect({ status: created.status, code: created.body.code }).toEqual({ status: 404, code: 'not_found' });
  });

  it("keeps the second ship's aircraft and pilots out of a first-ship cycle", async () => {
    const [foreign] = await rows<AircraftView>(OTHER_ADMIN, '/api/aircraft');
    const foreignPilot = (await rows<UserView>(OTHER_AIR_OPS, '/api/users/pilots'))[0];
    const slot = (fields: object) => ({
      aircraftId: foreign.id,
      pilotId: null,
      mission: 'Strike training',
      fuelLb: 11_000,
      stores: '',
      grossWeightLb: 20_000,
      tanker: false,
      earlyWarning: false,
      spare: false,
      ...fields,
    });
    const path = `/api/cycles/${firstCycle.id}/slots`;
    const aircraft = await deck.call(AIR_OPS, 'post', path, slot({}));
    expect({ status: aircraft.status, code: aircraft.body.code }).toEqual({ status: 404, code: 'not_found' });
    const own = await deck.aircraftId('C21');
    const pilot = await deck.call(AIR_OPS, 'post', path, slot({ aircraftId: own, pilotId: foreignPilot.id }));
    expect({ status: pilot.status, code: pilot.body.code }).toEqual({ status: 400, code: 'invalid_pilot' });
    expect((await rows<UserView>(AIR_OPS, '/api/users/pilots')).map((user) => user.id)).not.toContain(foreignPilot.id);
  });

  it('lets a socket of the second ship join no first-ship cycle', async () => {
    const origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
    const socket = openSocket(url, { token: await deck.token(OTHER_OBSERVER), origin });
    try {
      await connected(socket);
      expect(await join(socket, { cycleId: firstCycle.id })).toEqual({
        ok: false,
        code: 'not_found',
        message: `Cycle ${firstCycle.id} does not exist.`,
      });
    } finally {
      socket.disconnect();
    }
    const own = openSocket(url, { token: await deck.token(OBSERVER), origin });
    try {
      await connected(own);
      expect(await join(own, { cycleId: firstCycle.id })).toMatchObject({ ok: true });
    } finally {
      own.disconnect();
    }
  });

  it("names each squadron's and aircraft type's ship, one ship's admin reading only their own", async () => {
    const firstShipId = (await deck.demoShip()).id;
    const secondShipId = (await rows<ShipView>(OTHER_ADMIN, '/api/ships'))[0].id;
    for (const path of ['/api/squadrons', '/api/aircraft-types']) {
      const shipsOf = async (email: string) =>
        [...new Set((await rows<{ shipId: number }>(email, path)).map((row) => row.shipId))].sort();
      expect({ path, ships: await shipsOf(ADMIN) }).toEqual({ path, ships: [firstShipId] });
      expect({ path, ships: await shipsOf(OTHER_ADMIN) }).toEqual({ path, ships: [secondShipId] });
      // The fleet admin's forms keep to these ids to offer only the chosen ship's rows.
      expect({ path, ships: await shipsOf(fleetAdmin.email) }).toEqual({
        path,
        ships: expect.arrayContaining([firstShipId, secondShipId]),
      });
    }
  });

  it('lets a fleet admin work on both ships, naming the ship of what they add', async () => {
    const aircraft = await rows<AircraftView>(fleetAdmin.email, '/api/aircraft');
    const ofFirst = ids(await rows<AircraftView>(ADMIN, '/api/aircraft'));
    const ofSecond = ids(await rows<AircraftView>(OTHER_ADMIN, '/api/aircraft'));
    expect(ids(aircraft).sort()).toEqual([...ofFirst, ...ofSecond].sort());

    const body = { name: 'Fleet squadron', code: unique('F', 6), email: 'fleet-squadron@catline.example' };
    const unnamed = await deck.call(fleetAdmin.email, 'post', '/api/squadrons', body);
    expect({ status: unnamed.status, code: unnamed.body.code }).toEqual({ status: 400, code: 'ship_required' });
    const secondShipId = (await rows<ShipView>(OTHER_ADMIN, '/api/ships'))[0].id;
    const squadron = await deck.ok<SquadronView>(
      fleetAdmin.email,
      'post',
      '/api/squadrons',
      { ...body, shipId: secondShipId },
      201,
    );
    expect(squadron.shipId).toBe(secondShipId);
    expect(ids(await rows<SquadronView>(OTHER_ADMIN, '/api/squadrons'))).toContain(squadron.id);
    expect(ids(await rows<SquadronView>(ADMIN, '/api/squadrons'))).not.toContain(squadron.id);

    const typeForFirst = await deck.call(OTHER_ADMIN, 'post', '/api/aircraft-types', {
      ...aircraftTypeBody(),
      shipId: (await deck.demoShip()).id,
    });
    expect({ status: typeForFirst.status, code: typeForFirst.body.code }).toEqual({
      status: 404,
      code: 'ship_not_found',
    });
  });

  it("keeps each ship's audit trail to its own admins; a fleet admin reads every ship's, or one ship's", async () => {
    const firstShipId = (await deck.demoShip()).id;
    const secondShipId = (await rows<ShipView>(OTHER_ADMIN, '/api/ships'))[0].id;
    const onFirst = await deck.ok<{ id: number }>(ADMIN, 'post', '/api/aircraft-types', aircraftTypeBody(), 201);
    const onSecond = await deck.ok<{ id: number }>(OTHER_ADMIN, 'post', '/api/aircraft-types', aircraftTypeBody(), 201);
    const created = async (email: string, query = '') =>
      (await deck.all<AuditEntryView>(email, `/api/audit?action=aircraft_type.created${query}`)).map((entry) => ({
        subjectId: entry.subjectId,
        shipId: entry.shipId,
      }));
    const first = { subjectId: onFirst.id, shipId: firstShipId };
    const second = { subjectId: onSecond.id, shipId: secondShipId };

    expect(await created(ADMIN)).toContainEqual(first);
    expect(await created(ADMIN)).not.toContainEqual(second);
    expect(await created(OTHER_ADMIN)).toContainEqual(second);
    expect((await created(OTHER_ADMIN)).every((entry) => entry.shipId === secondShipId)).toBe(true);
    expect(await created(OTHER_ADMIN, `&ship=${firstShipId}`)).toEqual([]);
    expect(await created(fleetAdmin.email)).toEqual(expect.arrayContaining([first, second]));
    const ofSecond = await created(fleetAdmin.email, `&ship=${secondShipId}`);
    expect(ofSecond).toContainEqual(second);
    expect(ofSecond.every((entry) => entry.shipId === secondShipId)).toBe(true);

    const csv = await request(url)
      .get(`/api/audit/export.csv?action=aircraft_type.created`)
      .set(bearer(await deck.token(OTHER_ADMIN)));
    expect(csv.status).toBe(200);
    expect(csv.text).toContain(`,aircraft_type.created,aircraft_type,${onSecond.id},${secondShipId},`);
    expect(csv.text).not.toContain(`,aircraft_type.created,aircraft_type,${onFirst.id},`);
  });

  it('keeps a ship admin from making a fleet admin', async () => {
    const response = await request(url)
      .post('/api/users')
      .set(bearer(await deck.token(OTHER_ADMIN)))
      .send({
        email: `${unique('f', 10).toLowerCase()}@catline.example`,
        name: 'Would-be fleet',
        role: 'admin',
        shipId: null,
      });
    expect(response.status).toBe(201);
    expect((await rows<UserView>(OTHER_ADMIN, '/api/users')).map((user) => user.id)).toContain(
      (response.body as UserView).id,
    );
  });

  it("keeps the shot counts, as JSON and as CSV, to the caller's ship", async () => {
    const [first] = await rows<ShipView>(ADMIN, '/api/ships');
    const [second] = await rows<ShipView>(OTHER_ADMIN, '/api/ships');
    const firstAircraft = await rows<AircraftView>(ADMIN, '/api/aircraft');
    const secondAircraft = await rows<AircraftView>(OTHER_ADMIN, '/api/aircraft');
    const range = 'from=2000-01-01&to=2099-12-31';

    const counts = await deck.ok<ShotCounts>(OTHER_ADMIN, 'get', `/api/reports/shot-counts?${range}`);
    expect(counts.airframes.map((row) => row.aircraftId).sort()).toEqual(ids(secondAircraft).sort());
    expect(counts.catapults.map((row) => row.catapultId).sort()).toEqual(ids(second.catapults).sort());

    const csv = await request(url)
      .get(`/api/reports/shot-counts.csv?${range}`)
      .set(bearer(await deck.token(OTHER_ADMIN)));
    expect(csv.status).toBe(200);
    expect(csv.text).toContain(secondShipSeed.name);
    expect(csv.text).not.toContain(first.name);
    for (const plane of secondAircraft) expect(csv.text).toContain(`,${plane.sideNumber},`);
    for (const plane of firstAircraft) expect(csv.text).not.toContain(`,${plane.sideNumber},`);
  });

  it("lands each ship's people on a cycle of their own ship, or on none", async () => {
    const secondCycles = ids(await rows<CycleView>(OTHER_AIR_OPS, '/api/cycles'));
    const { cycleId } = await deck.ok<CycleLanding>(OTHER_OBSERVER, 'get', '/api/cycles/landing');
    expect(cycleId === null || secondCycles.includes(cycleId)).toBe(true);
    expect(cycleId).not.toBe(firstCycle.id);
    const own = await deck.ok<CycleLanding>(OBSERVER, 'get', '/api/cycles/landing');
    expect(ids(await rows<CycleView>(AIR_OPS, '/api/cycles'))).toContain(own.cycleId);
  });

  it("refuses another ship's squadron, catapult or type named in a body, and adds or changes nothing", async () => {
    const [firstShip] = await rows<ShipView>(ADMIN, '/api/ships');
    const [firstSquadron] = await rows<SquadronView>(ADMIN, '/api/squadrons');
    const [firstType] = await rows<AircraftTypeView>(ADMIN, '/api/aircraft-types');
    const [ownSquadron] = await rows<SquadronView>(OTHER_ADMIN, '/api/squadrons');
    const [ownType] = await rows<AircraftTypeView>(OTHER_ADMIN, '/api/aircraft-types');
    const [ownAircraft] = await rows<AircraftView>(OTHER_ADMIN, '/api/aircraft');
    const refused = { status: 400, code: 'unknown_reference' };
    const outcome = (response: request.Response) => ({ status: response.status, code: response.body.code });

    const person = (fields: object) => ({
      email: `${unique('cross', 12).toLowerCase()}@catline.example`,
      name: 'Cross-ship person',
      password: TEST_PASSWORD,
      ...fields,
    });
    const people = [
      person({ role: 'catapult_officer', catapultId: firstShip.catapults[0].id }),
      person({ role: 'pilot', squadronId: firstSquadron.id }),
    ];
    for (const body of people)
      expect(outcome(await deck.call(OTHER_ADMIN, 'post', '/api/users', body))).toEqual(refused);
    const emails = (await rows<UserView>(fleetAdmin.email, '/api/users')).map((user) => user.email);
    expect(emails.filter((email) => people.some((body) => body.email === email))).toEqual([]);

    const aircraft = (fields: object) => ({
      sideNumber: unique('Q', 6),
      typeId: ownType.id,
      squadronId: ownSquadron.id,
      parkedSpot: 'row-1',
      ...fields,
    });
    expect(outcome(await deck.call(OTHER_ADMIN, 'post', '/api/aircraft', aircraft({ typeId: firstType.id })))).toEqual(
      refused,
    );
    const foreignSquadron = await deck.call(
      OTHER_ADMIN,
      'post',
      '/api/aircraft',
      aircraft({ squadronId: firstSquadron.id }),
    );
    expect(outcome(foreignSquadron)).toEqual(refused);
    for (const body of [{ typeId: firstType.id }, { squadronId: firstSquadron.id }])
      expect(outcome(await deck.call(OTHER_ADMIN, 'patch', `/api/aircraft/${ownAircraft.id}`, body))).toEqual(refused);
    expect(await rows<AircraftView>(OTHER_ADMIN, '/api/aircraft')).toContainEqual(ownAircraft);
  });
});
