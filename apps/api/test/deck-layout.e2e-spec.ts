import type { ReplaceDeckLayoutRequest, ShipView, SlotView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { demoDeckLayout, demoDeckSpots } from '../src/database/seeds/demo-fleet.js';
import { secondShipDeckLayout, secondShipDeckSpots, secondShipPeople } from '../src/database/seeds/demo-second-ship.js';
import { ADMIN, HANDLER, HANGAR_BAY_A, LineupDriver, OBSERVER } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

const SECOND_SHIP_ADMIN = secondShipPeople.find((person) => person.role === 'admin')!.email;

// The demo ship's deck is put back after every change: other specs share the database.
const demoDeck: ReplaceDeckLayoutRequest = JSON.parse(JSON.stringify({ deckSpots: demoDeckSpots, ...demoDeckLayout }));

describe("the admin's deck layout", () => {
  let app: INestApplication;
  let driver: LineupDriver;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    driver = new LineupDriver(started.url);
  });

  afterEach(async () => {
    const response = await put(demoDeck);
    if (response.status !== 200) throw new Error(`Putting the demo deck back answered ${response.status}`);
  });

  afterAll(async () => {
    await app.close();
  });

  const put = (body: object, by = ADMIN) => driver.call(by, 'put', '/api/ships/1/deck-layout', body);
  const ship = async (): Promise<ShipView> => (await driver.call(OBSERVER, 'get', '/api/ships/1')).body;
  const deckWith = (change: Partial<ReplaceDeckLayoutRequest>): ReplaceDeckLayoutRequest => ({
    ...demoDeck,
    ...change,
  });
  const spotsWith = (name: string, change: object) =>
    demoDeck.deckSpots.map((spot) => (spot.name === name ? { ...spot, ...change } : spot));

  /** A fresh cycle with one demo aircraft, in hangar bay A. */
  async function cycleWith(side: string): Promise<{ cycleId: number; slot: SlotView }> {
    const cycle = await driver.createCycle();
    return { cycleId: cycle.id, slot: await driver.addSlotInHangar(cycle.id, side) };
  }

  it('replaces the deck, and the projection then times an aircraft from it', async () => {
    const { cycleId, slot } = await cycleWith('L47');
    await driver.place(cycleId, slot.id, 1);
    const before = Date.parse((await driver.slot(cycleId, slot.id)).projectedLaunchAt!);
    // Demo deck: bay-A to cat 1 by lift-fwd is a 50 s trip + 90 s taxi = 140 s (lift-aft: 65 + 200 s).
    // With lift-fwd's trip at 20 s it is 20 + 90 = 110 s: the launch is projected 30 s sooner.
    const elevators = [{ ...demoDeck.elevators[0], cycleS: 20 }, demoDeck.elevators[1]];
    const response = await put(deckWith({ elevators }));
    expect(response.status).toBe(200);
    expect(response.body.deckLayout.elevators[0]).toEqual({
      name: 'lift-fwd',
      cycleS: 20,
      taxiS: demoDeck.elevators[0].taxiS,
    });
    expect((await ship()).deckLayout.elevators).toEqual(elevators);
    const audit = await driver.call(ADMIN, 'get', '/api/audit?action=deck_layout.replaced&limit=1');
    expect(audit.body.items[0]).toMatchObject({
      actorEmail: ADMIN,
      subjectType: 'ship',
      subjectId: 1,
      summary: `Deck layout of ${(await ship()).name} replaced`,
      before: { deckLayout: { elevators: demoDeck.elevators } },
      after: { deckLayout: { elevators } },
    });
    const after = Date.parse((await driver.slot(cycleId, slot.id)).projectedLaunchAt!);
    expect((before - after) / 1000).toBe(30);
  });

  it('is for the admin only', async () => {
    const response = await put(demoDeck, HANDLER);
    expect(response.status).toBe(403);
  });

  it.each([
    [
      'a spot named twice',
      deckWith({ deckSpots: [...demoDeck.deckSpots, { ...demoDeck.deckSpots[0], area: 'Bow' }] }),
      ['spot bow-1: The name bow-1 is given to more than one spot; each needs its own.'],
    ],
    [
      'an elevator named twice',
      deckWith({ elevators: [...demoDeck.elevators, demoDeck.elevators[0]] }),
      ['elevator lift-fwd: The name lift-fwd is given to more than one elevator; each needs its own.'],
    ],
    [
      'a hangar bay named twice',
      deckWith({ hangarBays: [...demoDeck.hangarBays, demoDeck.hangarBays[1]] }),
      ['hangar bay bay-B: The name bay-B is given to more than one hangar bay; each needs its own.'],
    ],
    [
      'a clear-before naming a spot the deck lacks',
      deckWith({ deckSpots: spotsWith('aft-4', { clearBefore: ['aft-9'] }) }),
      ['spot aft-4: Spot aft-4 waits for spot aft-9, which the deck does not have.'],
    ],
    [
      'a clear-before naming a spot of another area',
      deckWith({ deckSpots: spotsWith('aft-4', { clearBefore: ['mid-4'] }) }),
      [
        'spot aft-4: Spot aft-4 waits for spot mid-4, which is in another area; only spots of its own row can stand in front of it.',
      ],
    ],
    [
      'a clear-before circle',
      deckWith({ deckSpots: spotsWith('aft-3', { clearBefore: ['aft-4'] }) }),
      ['spot aft-3: Spots aft-3 → aft-4 → aft-3 wait for each other in a circle, so none of them could taxi out.'],
    ],
    [
      'a spot without a taxi time to a catapult',
      deckWith({ deckSpots: spotsWith('mid-2', { taxiS: { 1: 110, 2: 100 } }) }),
      ['spot mid-2: The spot mid-2 needs a taxi time to catapult 3, 4.'],
    ],
    [
      'a negative taxi time',
      deckWith({ deckSpots: spotsWith('mid-2', { taxiS: { 1: 110, 2: 100, 3: -5, 4: 100 } }) }),
      ['spot mid-2: The taxi time from the spot mid-2 to catapult 3 is -5 s; it cannot be below 0.'],
    ],
    [
      'an elevator trip out of range',
      deckWith({ elevators: [{ ...demoDeck.elevators[0], cycleS: 2 }, demoDeck.elevators[1]] }),
      ['elevator lift-fwd: Elevator lift-fwd takes 2 s per trip; a trip must take 5 to 600 s.'],
    ],
    [
      'a hangar bay served by an elevator the deck lacks',
      deckWith({ hangarBays: [{ name: 'bay-A', elevators: ['lift-mid'] }, demoDeck.hangarBays[1]] }),
      ['hangar bay bay-A: Hangar bay bay-A is served by elevator lift-mid, which the deck does not have.'],
    ],
    [
      'a landing-area catapult the ship lacks',
      deckWith({ landingAreaCatapults: [3, 4, 7] }),
      ['landing area: The landing area names catapult 7, which the ship does not have.'],
    ],
  ])('refuses %s with 422, a sentence, and changes nothing', async (_case, body, details) => {
    const before = await ship();
    const response = await put(body);
    expect(response.status).toBe(422);
    expect(response.body).toEqual({
      statusCode: 422,
      code: 'deck_layout_invalid',
      message: details.map((detail) => detail.slice(detail.indexOf(': ') + 2)).join(' '),
      details,
    });
    expect(await ship()).toEqual(before);
  });

  it("refuses the second ship's layout naming a catapult only the first ship has, with 422, changing nothing", async () => {
    const [other] = (await driver.call(SECOND_SHIP_ADMIN, 'get', '/api/ships')).body as ShipView[];
    const read = async () => (await driver.call(SECOND_SHIP_ADMIN, 'get', `/api/ships/${other.id}`)).body;
    const before = await read();
    const response = await driver.call(SECOND_SHIP_ADMIN, 'put', `/api/ships/${other.id}/deck-layout`, {
      deckSpots: secondShipDeckSpots,
      ...secondShipDeckLayout,
      landingAreaCatapults: [3],
    });
    expect(response.status).toBe(422);
    expect(response.body.message).toBe('The landing area names catapult 3, which the ship does not have.');
    expect(await read()).toEqual(before);
  });

  it('refuses a malformed layout with 400 before the deck rules', async () => {
    const response = await put({ ...demoDeck, elevators: [{ name: 'lift-fwd', cycleS: '50', taxiS: {} }] });
    expect(response.status).toBe(400);
    expect(response.body.code).toBe('validation_failed');
  });

  it('refuses removing a spot where an aircraft of a cycle not closed stands, with 409 naming it', async () => {
    const stern3 = { name: 'stern-3', area: 'Stern', taxiS: { 1: 230, 2: 220, 3: 140, 4: 130 } };
    expect((await put(deckWith({ deckSpots: [...demoDeck.deckSpots, stern3] }))).status).toBe(200);
    const { cycleId, slot } = await cycleWith('L48');
    await driver.towed(cycleId, slot.id, { kind: 'spot', name: 'stern-3' });
    const before = await ship();
    const response = await put(demoDeck);
    expect(response.status).toBe(409);
    expect(response.body.code).toBe('spot_in_use');
    expect(response.body.message).toContain('L48 (spot stern-3, cycle ');
    expect(await ship()).toEqual(before);
    await driver.towed(cycleId, slot.id, HANGAR_BAY_A);
  });

  it('refuses removing an elevator an aircraft of a cycle not closed is on, with 409 naming it', async () => {
    const { cycleId, slot } = await cycleWith('L49');
    await driver.towed(cycleId, slot.id, { kind: 'elevator', name: 'lift-aft' });
    const response = await put(
      deckWith({
        elevators: [demoDeck.elevators[0]],
        hangarBays: [{ name: 'bay-A', elevators: ['lift-fwd'] }],
      }),
    );
    expect(response.status).toBe(409);
    expect(response.body.message).toMatch(/^Aircraft of cycles not yet closed are on positions this change removes: /);
    expect(response.body.message).toContain('L49 (elevator lift-aft, cycle ');
    await driver.towed(cycleId, slot.id, HANGAR_BAY_A);
  });
});
