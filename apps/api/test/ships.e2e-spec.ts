import type { ShipView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { demoDeckSpots, demoShip } from '../src/database/seeds/demo-fleet.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

// Changes to the demo ship are put back in the same test: other specs share the database.
describe('ships and catapults', () => {
  let app: INestApplication;
  let url: string;
  let admin: string;
  let observer: string;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    admin = await signIn(url, 'admin@catline.example');
    observer = await signIn(url, 'observer@catline.example');
  });

  afterAll(async () => {
    await app.close();
  });

  const ship = async (): Promise<ShipView> => (await request(url).get('/api/ships/1').set(bearer(observer))).body;
  const patchShip = (body: object) => request(url).patch('/api/ships/1').set(bearer(admin)).send(body);
  const patchCatapult = (shipId: number, id: number, body: object) =>
    request(url).patch(`/api/ships/${shipId}/catapults/${id}`).set(bearer(admin)).send(body);

  it('lists the ship with its four catapults in number order', async () => {
    const response = await request(url).get('/api/ships').set(bearer(observer));
    expect(response.status).toBe(200);
    expect(response.body).toHaveLength(1);
    expect(response.body[0]).toMatchObject({
      name: demoShip.name,
      hullCode: demoShip.hullCode,
      pairGapS: 10,
      profile: demoShip.profile,
    });
    expect(response.body[0].deckSpots).toEqual(JSON.parse(JSON.stringify(demoDeckSpots)));
    expect(
      response.body[0].catapults.map((c: { number: number; position: string }) => `${c.number}${c.position}`),
    ).toEqual(['1bow', '2bow', '3waist', '4waist']);
  });

  it('answers 404 with a message for an unknown ship', async () => {
    const response = await request(url).get('/api/ships/999').set(bearer(observer));
    expect(response.status).toBe(404);
    expect(response.body).toEqual({
      statusCode: 404,
      code: 'ship_not_found',
      message: 'There is no ship with id 999.',
    });
  });

  it('changes the ship and its profile', async () => {
    const profile = { ...demoShip.profile, clearingTurnDeg: { bow: 12, waist: -8 } };
    const response = await patchShip({ pairGapS: 12, profile });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ pairGapS: 12, profile });
    expect(await ship()).toMatchObject({ pairGapS: 12, profile });

    expect((await patchShip({ pairGapS: demoShip.pairGapS, profile: demoShip.profile })).status).toBe(200);
  });

  it.each([
    ['a negative pair gap', { pairGapS: -1 }, /pairGapS must not be less than 0/],
    [
      'a clearing turn past 180 degrees',
      { profile: { ...demoShip.profile, clearingTurnDeg: { bow: 200, waist: -10 } } },
      /bow must not be greater than 180/,
    ],
    ['a profile without departures', { profile: { clearingTurnDeg: { bow: 10, waist: -10 } } }, /departures/],
    [
      'a case without a helicopter departure',
      {
        profile: {
          ...demoShip.profile,
          departures: { ...demoShip.profile.departures, II: { ...demoShip.profile.departures.II, helicopter: ' ' } },
        },
      },
      /departures.II.helicopter should not be empty/,
    ],
    [
      'a case given one text for every class',
      { profile: { ...demoShip.profile, departures: { ...demoShip.profile.departures, I: 'Climb ahead.' } } },
      /departures.I must be an object/,
    ],
    ['a null name', { name: null }, /name must be a string/],
    [
      'a deck spot with a taxi time past an hour',
      { deckSpots: [{ name: 'bow-1', taxiS: { 1: 3601, 2: 60, 3: 150, 4: 170 } }] },
      /taxiS must map catapult numbers/,
    ],
    ['an extra field', { catapults: [] }, /property catapults should not exist/],
  ])('refuses %s with a 400 and changes nothing', async (_case, body, message) => {
    const before = await ship();
    const response = await patchShip(body);
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(message);
    expect(await ship()).toEqual(before);
  });

  // The same deck rules as the whole layout's replacement (deck-layout.e2e-spec.ts), against the elevators held.
  it.each([
    [
      'a deck spot with a negative taxi time',
      {
        deckSpots: demoDeckSpots.map((spot) =>
          spot.name === 'bow-1' ? { ...spot, taxiS: { ...spot.taxiS, 1: -5 } } : spot,
        ),
      },
      'The taxi time from the spot bow-1 to catapult 1 is -5 s; it cannot be below 0.',
    ],
    [
      'a deck spot missing a catapult',
      { deckSpots: demoDeckSpots.map((spot) => (spot.name === 'mid-1' ? { ...spot, taxiS: { 1: 60 } } : spot)) },
      'The spot mid-1 needs a taxi time to catapult 2, 3, 4.',
    ],
    [
      'a deck spot listed twice',
      { deckSpots: [...demoDeckSpots, demoDeckSpots[0]] },
      'The name bow-1 is given to more than one spot; each needs its own.',
    ],
  ])('refuses %s with a 422 and changes nothing', async (_case, body, message) => {
    const before = await ship();
    const response = await patchShip(body);
    expect(response.status).toBe(422);
    expect(response.body).toMatchObject({ code: 'deck_layout_invalid', message });
    expect(await ship()).toEqual(before);
  });

  it('refuses removing deck spots where aircraft are parked, with 409 naming them', async () => {
    const before = await ship();
    const response = await patchShip({ deckSpots: demoDeckSpots.filter((spot) => spot.name !== 'bow-1') });
    expect(response.status).toBe(409);
    expect(response.body.code).toBe('spot_in_use');
    expect(response.body.message).toMatch(/^Aircraft are parked on spots this change removes: C21 \(bow-1\)/);
    expect(await ship()).toEqual(before);
  });

  it('changes a catapult configuration and keeps its status and shot count out of reach', async () => {
    const catapult = (await ship()).catapults[2];
    const response = await patchCatapult(1, catapult.id, { resetIntervalS: 70, axisAngleDeg: -8 });
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ ...catapult, resetIntervalS: 70, axisAngleDeg: -8 });
    expect(
      (
        await patchCatapult(1, catapult.id, {
          resetIntervalS: catapult.resetIntervalS,
          axisAngleDeg: catapult.axisAngleDeg,
        })
      ).status,
    ).toBe(200);

    const status = await patchCatapult(1, catapult.id, { status: 'down', shotCount: 0 });
    expect(status.status).toBe(400);
    expect(status.body.details).toEqual(['property status should not exist', 'property shotCount should not exist']);
  });

  it.each([
    ['an axis angle past 180 degrees', { axisAngleDeg: -181 }, /axisAngleDeg must not be less than -180/],
    ['a zero stroke', { strokeM: 0 }, /strokeM must be a positive number/],
    ['a text reset interval', { resetIntervalS: '55' }, /resetIntervalS must be an integer number/],
    ['an unknown position', { position: 'stern' }, /position must be bow or waist/],
    [
      'a highest energy below the lowest',
      { energyMaxMj: 10 },
      /The highest energy \(10 MJ\) must be above the lowest \(18 MJ\)/,
    ],
  ])('refuses a catapult with %s and changes nothing', async (_case, body, message) => {
    const before = await ship();
    const response = await patchCatapult(1, before.catapults[0].id, body);
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(message);
    expect(await ship()).toEqual(before);
  });

  it.each([
    [
      'a required step left out',
      ['taxiing', 'on_catapult', 'weight_agreed', 'setting_set', 'pilot_ready'],
      'Catapult 3: These readiness steps cannot be left out: tensioned.',
    ],
    [
      'launch-order broken (tension before the setting)',
      ['on_catapult', 'weight_agreed', 'tensioned', 'setting_set'],
      'Catapult 3: Readiness steps must keep the trade’s order.',
    ],
    [
      'a step twice',
      ['on_catapult', 'weight_agreed', 'setting_set', 'tensioned', 'tensioned'],
      'Catapult 3: A readiness step is listed twice.',
    ],
  ])(
    "refuses a catapult's own readiness steps with %s, in a sentence, and changes nothing",
    async (_case, steps, message) => {
      const before = await ship();
      const response = await patchCatapult(1, before.catapults[2].id, { readinessSteps: steps });
      expect(response.status).toBe(400);
      expect(response.body).toMatchObject({ code: 'invalid_configuration', message });
      expect(await ship()).toEqual(before);
    },
  );

  it('refuses an unknown readiness step by name', async () => {
    const before = await ship();
    const response = await patchCatapult(1, before.catapults[2].id, { readinessSteps: ['on_catapult', 'hook_up'] });
    expect(response.status).toBe(400);
    expect(response.body.details).toEqual([expect.stringMatching(/^readinessSteps must each be one of taxiing, /)]);
  });

  it('answers 404 for a catapult that is not on the ship', async () => {
    const response = await patchCatapult(2, 1, { resetIntervalS: 60 });
    expect(response.status).toBe(404);
    expect(response.body.message).toBe('Ship 2 has no catapult with id 1.');
  });
});
