import type { AircraftView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { Cycle } from '../src/database/entities/cycle.entity.js';
import { Slot } from '../src/database/entities/slot.entity.js';
import { createAircraft, unique } from './support/fleet-fixtures.js';
import { readAllPages } from './support/paged-list.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

describe('aircraft', () => {
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

  const list = (): Promise<AircraftView[]> => readAllPages(url, admin, '/api/aircraft');
  const post = (body: object) => request(url).post('/api/aircraft').set(bearer(admin)).send(body);
  const patch = (id: number, body: object) => request(url).patch(`/api/aircraft/${id}`).set(bearer(admin)).send(body);

  it('lists the fleet by side number with type and squadron', async () => {
    const fleet = await list();
    expect(fleet.find((aircraft) => aircraft.sideNumber === 'L47')).toMatchObject({
      typeDesignation: 'FGD-63',
      squadronCode: 'LNB',
      parkedSpot: 'stern-1',
    });
    const sides = fleet.map((aircraft) => aircraft.sideNumber);
    expect(sides).toEqual([...sides].sort());
  });

  it('adds an aircraft, serviceable unless told otherwise', async () => {
    const sideNumber = unique('N', 8);
    const response = await post({ sideNumber, typeId: 2, squadronId: 3, parkedSpot: 'aft-2' });
    expect(response.status).toBe(201);
    expect(response.body).toEqual({
      id: expect.any(Number),
      sideNumber,
      typeId: 2,
      typeDesignation: 'MSD-26',
      squadronId: 3,
      squadronCode: 'GSB',
      parkedSpot: 'aft-2',
      serviceable: true,
      catapultShots: 0,
    });
  });

  it('refuses a side number already in use with a readable 409', async () => {
    const before = await list();
    const response = await post({ sideNumber: 'C21', typeId: 1, squadronId: 1, parkedSpot: 'bow-1' });
    expect(response.status).toBe(409);
    expect(response.body).toEqual({
      statusCode: 409,
      code: 'side_number_taken',
      message: 'Side number C21 is already taken by another aircraft.',
    });
    expect(await list()).toEqual(before);
  });

  it.each([
    ['an unknown type', { typeId: 999_999 }, /There is no aircraft type with id 999999/],
    ['an unknown squadron', { squadronId: 999_999 }, /There is no squadron with id 999999/],
    ['an unknown deck spot', { parkedSpot: 'hangar-9' }, /There is no deck spot named hangar-9; pick one of bow-1/],
    ['a missing type', { typeId: undefined }, /typeId must be an integer number/],
    ['a type id given as text', { typeId: '1' }, /typeId must be an integer number/],
    ['a side number with spaces', { sideNumber: '1 2' }, /sideNumber must be 1 to 8 letters, digits or dashes/],
    ['a shot count', { catapultShots: 3 }, /property catapultShots should not exist/],
  ])('refuses %s with a 400 and adds nothing', async (_case, change, message) => {
    const before = await list();
    const response = await post({
      sideNumber: unique('B', 8),
      typeId: 1,
      squadronId: 1,
      parkedSpot: 'bow-1',
      ...change,
    });
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(message);
    expect(await list()).toEqual(before);
  });

  it('moves an aircraft and marks it unserviceable', async () => {
    const aircraft = await createAircraft(url, admin);
    const response = await patch(aircraft.id, { parkedSpot: 'stern-2', serviceable: false });
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ ...aircraft, parkedSpot: 'stern-2', serviceable: false });
  });

  it('refuses renumbering onto a taken side number and changes nothing', async () => {
    const aircraft = await createAircraft(url, admin);
    const response = await patch(aircraft.id, { sideNumber: 'C22' });
    expect(response.status).toBe(409);
    expect((await list()).find((a) => a.id === aircraft.id)).toEqual(aircraft);
  });

  it('deletes an aircraft no cycle uses', async () => {
    const aircraft = await createAircraft(url, admin);
    expect((await request(url).delete(`/api/aircraft/${aircraft.id}`).set(bearer(admin))).status).toBe(204);
    expect((await list()).map((a) => a.id)).not.toContain(aircraft.id);
  });

  it('refuses deleting an aircraft that is in a cycle lineup with 409, keeping it', async () => {
    const aircraft = await createAircraft(url, admin);
    // Written straight to the database: this spec must not depend on the cycle routes.
    const dataSource = app.get(DataSource);
    const now = new Date();
    const cycle = await dataSource.getRepository(Cycle).save({
      shipId: 1,
      number: 900_000 + aircraft.id,
      plannedLaunchAt: now,
      windowStartAt: now,
      windowEndAt: now,
      shipCourseDeg: 90,
      shipSpeedKt: 20,
      trueWindFromDeg: 90,
      trueWindSpeedKt: 10,
      windGustFromDeg: 90,
      windGustKt: 10,
      windLullFromDeg: 90,
      windLullKt: 10,
      temperatureC: 15,
      weatherCase: 'I',
    });
    await dataSource
      .getRepository(Slot)
      .save({ cycleId: cycle.id, aircraftId: aircraft.id, mission: 'Test', fuelLb: 8_000, grossWeightLb: 38_000 });

    const response = await request(url).delete(`/api/aircraft/${aircraft.id}`).set(bearer(admin));
    expect(response.status).toBe(409);
    expect(response.body.message).toBe(
      `Aircraft ${aircraft.sideNumber} appears in 1 cycle lineup(s), which keep its record; mark it unserviceable instead of deleting it.`,
    );
    expect((await list()).map((a) => a.id)).toContain(aircraft.id);
  });

  it('answers 404 for an unknown aircraft', async () => {
    expect((await patch(999_999, { serviceable: false })).status).toBe(404);
    expect((await request(url).delete('/api/aircraft/999999').set(bearer(admin))).status).toBe(404);
  });
});
