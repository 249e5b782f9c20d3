import type { AircraftTypeView, CycleView, LineupCommandResult } from '@catline/contracts';
import { catapultWind, degrees, knots } from '@catline/launch-math';
import type { INestApplication } from '@nestjs/common';
import { aircraftTypeBody, createAircraft } from './support/fleet-fixtures.js';
import { ADMIN, AIR_OPS, LineupDriver, OBSERVER, launchKey, pilot } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

const MINUTE = 60_000;

describe('cycle conditions: wind readings, staleness, night and cases', () => {
  let app: INestApplication;
  let deck: LineupDriver;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    deck = new LineupDriver(started.url);
  });

  afterAll(async () => {
    await app.close();
  });

  const conditions = (cycle: CycleView, fields: object) =>
    deck.call(AIR_OPS, 'patch', `/api/cycles/${cycle.id}/conditions`, { basisVersion: cycle.version, ...fields });

  const changed = async (cycle: CycleView, fields: object) => {
    const response = await conditions(cycle, fields);
    if (response.status !== 200)
      throw new Error(`conditions answered ${response.status}: ${JSON.stringify(response.body)}`);
    return response.body as LineupCommandResult;
  };

  const cycleNow = (cycle: CycleView) => deck.ok<CycleView>(OBSERVER, 'get', `/api/cycles/${cycle.id}`);

  it('turns a wind read across the deck into true wind and back (Smith, Bourassa & Sharp 1999)', async () => {
    // SBS (1999) test 6: course 090 at 5 kt, relative wind 5 kt from 90 degrees off the bow -> true from 225 at
    // 7.0711 kt. SBS (1999) test 9: course 270 at 3 kt, relative 4 kt from 90 off the bow -> from 36.8699 at 5 kt.
    const cycle = await deck.createCycle({ shipCourseDeg: 90, shipSpeedKt: 5 });
    const result = await changed(cycle, { relativeWindBearingDeg: 90, relativeWindSpeedKt: 5 });
    const relativeRead = await cycleNow(cycle);
    expect(relativeRead.trueWindFromDeg).toBeCloseTo(225, 3); // SBS (1999) test 6: 225
    expect(relativeRead.trueWindSpeedKt).toBeCloseTo(7.0711, 3); // SBS (1999) test 6: 7.0711 kt
    expect(result.change).toMatchObject({
      kind: 'conditions_changed',
      summary: 'Conditions: wind 225° 7.1 kt',
      actor: { name: 'Priya Quennevar' },
    });
    expect(Date.parse(result.change.at)).toBeGreaterThan(Date.now() - MINUTE);
    // Read when entered: the reading's time and the change's are the same moment, give or take the commit.
    expect(Math.abs(Date.parse(relativeRead.windReadAt) - Date.parse(result.change.at))).toBeLessThan(5000);

    // Entering that true wind back gives the same wind across every catapult as the relative reading.
    const laneWind = async () =>
      (await deck.snapshot(cycle.id)).lanes.map((lane) => [lane.headwindKt, lane.crosswindKt]);
    const fromRelative = await laneWind();
    await changed(relativeRead, { shipSpeedKt: 5, trueWindFromDeg: 225, trueWindSpeedKt: 5 * Math.SQRT2 });
    const fromTrue = await laneWind();
    fromTrue.forEach(([headwind, crosswind], index) => {
      expect(headwind).toBeCloseTo(fromRelative[index][0], 6);
      expect(crosswind).toBeCloseTo(fromRelative[index][1], 6);
    });

    const other = await deck.createCycle({ shipCourseDeg: 270, shipSpeedKt: 3 });
    await changed(other, { relativeWindBearingDeg: 90, relativeWindSpeedKt: 4 });
    const test9 = await cycleNow(other);
    expect(test9.trueWindFromDeg).toBeCloseTo(36.8699, 3); // SBS (1999) test 9: 36.8699
    expect(test9.trueWindSpeedKt).toBeCloseTo(5, 3); // SBS (1999) test 9: 5 kt
  });

  it('rests the headwind on the lull of the reading', async () => {
    const cycle = await deck.createCycle({ shipCourseDeg: 0, shipSpeedKt: 20 });
    await changed(cycle, { relativeWindBearingDeg: 0, relativeWindSpeedKt: 30, windGustKt: 36, windLullKt: 24 });
    const read = await cycleNow(cycle);
    // Dead ahead at 20 kt: a relative 30 kt is 10 kt of true wind from ahead; the lull (24) is 4, the gust (36) 16.
    expect([read.trueWindFromDeg, read.trueWindSpeedKt]).toEqual([360, 10]);
    expect([read.windLullFromDeg, read.windLullKt]).toEqual([360, 4]);
    expect([read.windGustFromDeg, read.windGustKt]).toEqual([360, 16]);
    const ship = await deck.demoShip();
    const snapshot = await deck.snapshot(cycle.id);
    for (const lane of snapshot.lanes) {
      const axis = ship.catapults.find((catapult) => catapult.id === lane.catapultId)!.axisAngleDeg;
      const lull = catapultWind({ from: degrees(360), bearing: degrees(0), speed: knots(24) }, degrees(axis));
      expect(lane.headwindKt).toBeCloseTo(lull.headwind, 9);
    }
  });

  it.each([
    [{ relativeWindBearingDeg: 10, relativeWindSpeedKt: 30, trueWindSpeedKt: 12 }, 'not both at once'],
    [{ relativeWindBearingDeg: 10 }, 'needs both its bearing off the bow and its speed'],
    [{ trueWindSpeedKt: 12, windLullKt: 14 }, 'The lull (14 kt) cannot be above the steady wind (12 kt).'],
    [{ trueWindSpeedKt: 12, windGustKt: 10 }, 'The gust (10 kt) cannot be below the steady wind (12 kt).'],
    [{ windGustKt: 30 }, 'give the wind as well'],
    [
      { trueWindSpeedKt: 12, windReadAt: new Date(Date.now() + 10 * MINUTE).toISOString() },
      'cannot have been taken later than now',
    ],
  ])('refuses a reading that does not add up: %j', async (fields, words) => {
    const cycle = await deck.createCycle();
    const response = await conditions(cycle, fields);
    expect(response.status).toBe(400);
    expect(response.body.code).toBe('invalid_wind_reading');
    expect(response.body.message).toContain(words);
    expect((await cycleNow(cycle)).version).toBe(0);
  });

  it('flags a reading older than the ship allows; the launch waits for a new one or the air boss', async () => {
    const cycle = await deck.createCycle();
    // The demo ship leaves the age out: 30 minutes.
    expect(Date.parse(cycle.windStaleAt) - Date.parse(cycle.windReadAt)).toBe(30 * MINUTE);
    const slot = await deck.addSlot(cycle.id, 'C21', { pilotEmail: pilot(9) });
    await deck.place(cycle.id, slot.id, 1);
    await deck.start(cycle.id);
    const ready = await deck.readyToLaunch(cycle.id, slot.id, pilot(9));
    const started = await cycleNow(cycle);

    const readAt = new Date(Date.now() - 40 * MINUTE).toISOString();
    const old = await changed(started, { trueWindSpeedKt: started.trueWindSpeedKt, windReadAt: readAt });
    expect(old.change.patch.cycle).toMatchObject({ windReadAt: readAt });
    const stale = await cycleNow(cycle);
    expect(Date.parse(stale.windStaleAt)).toBeLessThan(Date.now());
    // The same figures read again move nothing under the agreed weight: no read-back asked for.
    const slotNow = await deck.slot(cycle.id, slot.id);
    expect(slotNow.reverifyCause).toBeNull();

    const refused = await deck.launch(cycle.id, slotNow, launchKey());
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({ code: 'wind_reading_stale' });
    const waived = await deck.waive(cycle.id, slot.id, 'wind_reading_stale', 'Anemometer out; reading by hand');
    expect(waived.status).toBe(200);
    const launched = await deck.launch(cycle.id, await deck.slot(cycle.id, slot.id), launchKey());
    expect(launched.status).toBe(200);
    expect(ready.id).toBe(slot.id);
  });

  const atlanta = { latitudeDeg: 33.8, longitudeDeg: -84.4 };
  // USNO: at 33.8 N 84.4 W on 6 September 2009 the sun sets at 23:56 UTC (7:56 p.m. EDT); night from 00:26.
  const times = (planned: string) => {
    const at = Date.parse(planned);
    return {
      plannedLaunchAt: planned,
      windowStartAt: new Date(at - 10 * MINUTE).toISOString(),
      windowEndAt: new Date(at + 40 * MINUTE).toISOString(),
    };
  };
  const night = times('2009-09-07T01:00:00.000Z');
  const day = times('2009-09-06T17:00:00.000Z');

  it('makes a cycle at night by the sun at its position Case III, and refuses Case I or II', async () => {
    const asDay = await deck.call(AIR_OPS, 'post', '/api/cycles', {
      ...(await deck.createCycleBody()),
      ...atlanta,
      ...night,
      weatherCase: 'III',
      night: false,
    });
    expect(asDay.status).toBe(409);
    expect(asDay.body).toMatchObject({
      code: 'night_by_position',
      message: expect.stringContaining('it is night at 01:00 UTC (night from 00:26 UTC to 10:44 UTC)'), // USNO: sunset 23:56Z + 30 min; sunrise 11:15Z - 30 min (suncalc: 11:14)
    });
    const created = await deck.createCycle({ ...atlanta, ...night, weatherCase: 'III', night: true });
    expect(created).toMatchObject({ ...atlanta, night: true, weatherCase: 'III' });

    const caseOne = await deck.call(AIR_OPS, 'post', '/api/cycles', {
      ...(await deck.createCycleBody()),
      ...atlanta,
      ...night,
      weatherCase: 'I',
      night: true,
    });
    expect(caseOne.status).toBe(409);
    expect(caseOne.body.code).toBe('night_needs_case_iii');
    expect(caseOne.body.message).toContain('a night cycle flies Case III, not Case I');

    const toCaseTwo = await conditions(created, { weatherCase: 'II' });
    expect(toCaseTwo.status).toBe(409);
    expect(toCaseTwo.body.code).toBe('night_needs_case_iii');
    const toDay = await conditions(created, { night: false });
    expect(toDay.status).toBe(409);
    expect(toDay.body.code).toBe('night_by_position');
    expect(toDay.body.message).toContain('it is night');

    // Moved to the afternoon, the sun is up: the cycle becomes a day cycle and may fly Case I.
    const moved = await changed(created, { ...day, weatherCase: 'I', night: false });
    expect(moved.change.patch.cycle).toMatchObject({ night: false, weatherCase: 'I' });
  });

  it('refuses a night entered by hand in Case I without a position', async () => {
    const cycle = await deck.createCycle();
    const response = await conditions(cycle, { night: true });
    expect(response.status).toBe(409);
    expect(response.body.code).toBe('night_needs_case_iii');
    expect((await changed(cycle, { night: true, weatherCase: 'III' })).change.patch.cycle).toMatchObject({
      night: true,
    });
  });

  it('gives the clearing turn by catapult side in Cases I and II and none in Case III, by day', async () => {
    const turnOn = async (weatherCase: 'I' | 'II' | 'III', catapult: number) => {
      const cycle = await deck.createCycle({ ...atlanta, ...day, weatherCase, night: false });
      const slot = await deck.addSlot(cycle.id, 'C24');
      await deck.place(cycle.id, slot.id, catapult);
      return (await deck.slot(cycle.id, slot.id)).figures!.clearingTurnDeg;
    };
    // The demo ship's profile: 10 degrees to starboard off the bow, 10 to port off the waist.
    expect(await turnOn('I', 1)).toBe(10);
    expect(await turnOn('II', 3)).toBe(-10);
    expect(await turnOn('III', 1)).toBe(0);
    expect(await turnOn('III', 3)).toBe(0);
  });

  it('gives a helicopter and a jet in one cycle each its own class’s departure for the cycle’s case', async () => {
    const admin = await deck.token(ADMIN);
    const helicopterType = await deck.ok<AircraftTypeView>(
      ADMIN,
      'post',
      '/api/aircraft-types',
      { ...aircraftTypeBody(), aircraftClass: 'helicopter' },
      201,
    );
    const helicopter = await createAircraft(deck.url, admin, { typeId: helicopterType.id });
    const { departures } = (await deck.demoShip()).profile;

    const cycle = await deck.createCycle({ ...atlanta, ...night, weatherCase: 'III', night: true });
    const jetSlot = await deck.addSlot(cycle.id, 'C25');
    const helicopterSlot = await deck.addSlot(cycle.id, helicopter.sideNumber, { grossWeightLb: 30_000 });
    const shown = async () => {
      const slots = (await deck.snapshot(cycle.id)).slots;
      const of = (id: number) => slots.find((slot) => slot.id === id)!;
      return [of(jetSlot.id), of(helicopterSlot.id)].map(({ aircraftClass, departure }) => ({
        aircraftClass,
        departure,
      }));
    };
    expect(await shown()).toEqual([
      { aircraftClass: 'jet', departure: departures.III.jet },
      { aircraftClass: 'helicopter', departure: departures.III.helicopter },
    ]);
    expect(departures.III.helicopter).not.toBe(departures.III.jet);

    // The admin's class is the one the departure follows.
    await deck.ok(ADMIN, 'patch', `/api/aircraft-types/${helicopterType.id}`, { aircraftClass: 'turboprop' });
    expect((await shown())[1]).toEqual({ aircraftClass: 'turboprop', departure: departures.III.turboprop });
  });
});
