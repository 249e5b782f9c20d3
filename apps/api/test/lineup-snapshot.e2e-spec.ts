import type { AircraftTypeView, AircraftView, CycleView, LineupSnapshot, ShipView } from '@catline/contracts';
import {
  afterburnerRequired,
  airDensity,
  catapultWind,
  celsius,
  celsiusToKelvin,
  degrees,
  densityRatio,
  epochMs,
  knots,
  launchFigures,
  megajoulesToJoules,
  metres,
  pascals,
  pounds,
  poundsForce,
  projectLaunchTimes,
  relativeWind,
  seconds,
  takeOffTrim,
  type AircraftProfile,
} from '@catline/launch-math';
import type { INestApplication } from '@nestjs/common';
import { applyLineupChanges, DEFAULT_SETTING_CROSS_CHECK_TOLERANCE, isLandingAreaInUse } from '@catline/contracts';
import { LineupDriver, OBSERVER } from './support/lineup-fixtures.js';
import { readChangeLog } from './support/change-log.js';
import { startTestApp } from './support/test-app.js';

// Most check values here are @catline/launch-math's own results for the seeded data: the snapshot must
// carry exactly what the package computes (the package's tests name the published sources). One case is
// worked by hand instead, so the API's wiring of the wind to each catapult is checked from outside the code.

function profileOf(type: AircraftTypeView): AircraftProfile {
  return {
    maxGrossWeight: pounds(type.maxGrossWeightLb),
    crosswindLimit: knots(type.crosswindLimitKt),
    thrust: poundsForce(type.thrustLbf),
    requiredExcess: knots(type.requiredExcessKt),
    minimumLaunchAirspeed: type.launchTable.map((row) => ({
      grossWeight: pounds(row.grossWeightLb),
      airspeed: knots(row.minLaunchAirspeedKt),
    })),
    // A stored band holds weights up to and including its upper bound.
    trimBands: type.trimBands.map((band, i) => ({
      fromGrossWeight: pounds(i === 0 ? 0 : type.trimBands[i - 1].upToLb! + 1),
      trim: degrees(band.trimDeg),
    })),
    trimWeightStep: pounds(1),
    afterburnerFromGrossWeight: type.afterburnerFromLb === null ? null : pounds(type.afterburnerFromLb),
  };
}

const bySort = <T>(items: T[], key: (item: T) => number) => [...items].sort((a, b) => key(a) - key(b));

describe('lineup snapshot of the demo cycles', () => {
  let app: INestApplication;
  let deck: LineupDriver;
  let cycles: CycleView[];

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    deck = new LineupDriver(started.url);
    cycles = await deck.all<CycleView>(OBSERVER, '/api/cycles');
  });

  afterAll(async () => {
    await app.close();
  });

  const demoCycle = (number: number) => cycles.find((cycle) => cycle.number === number)!;

  it('seeds a day cycle in case I with a deck pool, filled lanes and a slot for the demo pilot', async () => {
    const snapshot = await deck.snapshot(demoCycle(2).id);
    expect(snapshot.cycle).toMatchObject({ state: 'planning', weatherCase: 'I', night: false });
    expect(snapshot.slots.length).toBeGreaterThanOrEqual(18);
    expect(snapshot.pool.length).toBeGreaterThanOrEqual(10);
    expect(snapshot.lanes.every((lane) => lane.slotIds.length > 0)).toBe(true);
    expect(snapshot.slots.some((slot) => slot.pilotName === 'Kit Marrowby')).toBe(true);
    const night = await deck.snapshot(demoCycle(3).id);
    expect(night.cycle).toMatchObject({ state: 'planning', weatherCase: 'III', night: true });
    expect(night.pool.length).toBe(night.slots.length);
  });

  it('carries the figures @catline/launch-math computes for every aircraft in a lane', async () => {
    const snapshot = await deck.snapshot(demoCycle(2).id);
    const ship = (await deck.ok<ShipView[]>(OBSERVER, 'get', '/api/ships'))[0];
    const types = await deck.ok<AircraftTypeView[]>(OBSERVER, 'get', '/api/aircraft-types');
    const { cycle } = snapshot;
    const relative = relativeWind(
      { course: degrees(cycle.shipCourseDeg), speed: knots(cycle.shipSpeedKt) },
      { from: degrees(cycle.trueWindFromDeg), speed: knots(cycle.trueWindSpeedKt) },
    );
    const sigma = densityRatio(
      airDensity(celsiusToKelvin(celsius(cycle.temperatureC)), pascals(cycle.pressureHpa * 100)),
    );
    let checked = 0;
    for (const lane of snapshot.lanes) {
      const catapult = ship.catapults.find((candidate) => candidate.id === lane.catapultId)!;
      const wind = catapultWind(relative, degrees(catapult.axisAngleDeg));
      expect([lane.headwindKt, lane.crosswindKt, lane.crosswindSide]).toEqual([
        wind.headwind,
        wind.crosswind,
        wind.side,
      ]);
      for (const slotId of lane.slotIds) {
        const slot = snapshot.slots.find((candidate) => candidate.id === slotId)!;
        const type = types.find((candidate) => candidate.id === slot.typeId)!;
        const profile = profileOf(type);
        const weight = pounds(slot.grossWeightLb);
        const configuration = slot.stores.trim() === '' ? 'clean' : 'stores';
        const table = type.settingTables.find(
          (candidate) => candidate.catapultNumber === catapult.number && candidate.configuration === configuration,
        )!;
        const figures = launchFigures({
          aircraft: profile,
          catapult: {
            strokeLength: metres(catapult.strokeM),
            energyAtMinSetting: megajoulesToJoules(catapult.energyMinMj),
            energyAtMaxSetting: megajoulesToJoules(catapult.energyMaxMj),
            maxSetting: catapult.settingCount - 1,
          },
          grossWeight: weight,
          conditions: { wind, densityRatio: sigma, closedReason: null },
          approved: {
            table: {
              recommendedExcess: knots(table.recommendedExcessKt),
              rows: table.rows.map((row) => ({ upToWeight: pounds(row.upToLb), setting: row.setting })),
            },
            crossCheckTolerance: DEFAULT_SETTING_CROSS_CHECK_TOLERANCE,
          },
        });
        expect(slot.figures).toEqual({
          headwindKt: wind.headwind,
          crosswindKt: wind.crosswind,
          crosswindSide: wind.side,
          catapultSetting: figures.setting?.setting ?? null,
          crossCheckSetting: figures.crossCheck?.setting ?? null,
          crossCheckFlagged: figures.crossCheck?.flagged ?? null,
          endSpeedKt: figures.endSpeed,
          requiredAirspeedKt: figures.requiredAirspeed,
          requiredWindOverDeckKt: figures.requiredWindOverDeck,
          marginKt: figures.margin,
          excessWindOverDeckKt: figures.excessWindOverDeck,
          recommendedExcessKt: figures.recommendedExcess,
          go: true,
          reasons: [],
          clearingTurnDeg: ship.profile.clearingTurnDeg[catapult.position],
        });
        expect(slot.trimDeg).toBe(takeOffTrim(profile, weight));
        expect(slot.afterburnerRequired).toBe(afterburnerRequired(profile, weight));
        expect(slot.departure).toBe(ship.profile.departures.I[type.aircraftClass]);
        checked += 1;
      }
    }
    expect(checked).toBe(8);
  });

  it('splits the wind over the deck along and across each catapult as worked by hand', async () => {
    // Hand computation (plane trigonometry, no source needed beyond it): steaming north at 20 kt into a true
    // wind from 090° at 20 kt, the wind over the deck is the sum of two equal winds at right angles: from 045°
    // relative at 20·√2 = 28.284 kt. Cat 1's axis points 1.5° to starboard, so that wind meets it 43.5° off
    // the axis; cat 3's points 7.5° to port, 52.5° off. Along the axis: 28.284 · cos(angle); across it:
    // 28.284 · sin(angle), from starboard. The WKD-41's crosswind limit is 15 kt (demo-fleet.ts): both are over.
    const cycle = await deck.createCycle({
      shipCourseDeg: 0,
      shipSpeedKt: 20,
      trueWindFromDeg: 90,
      trueWindSpeedKt: 20,
    });
    const bow = await deck.addSlot(cycle.id, 'C21', { grossWeightLb: 44_000 });
    const waist = await deck.addSlot(cycle.id, 'C22', { grossWeightLb: 44_000 });
    await deck.place(cycle.id, bow.id, 1);
    await deck.place(cycle.id, waist.id, 3);
    const snapshot = await deck.snapshot(cycle.id);
    const lane = (number: number) => snapshot.lanes.find((candidate) => candidate.number === number)!;
    const handWorked = [
      { lane: lane(1), slotId: bow.id, headwindKt: 20.517, crosswindKt: 19.47 },
      { lane: lane(3), slotId: waist.id, headwindKt: 17.218, crosswindKt: 22.439 },
    ];
    for (const { lane: worked, slotId, headwindKt, crosswindKt } of handWorked) {
      expect(worked.headwindKt).toBeCloseTo(headwindKt, 2);
      expect(worked.crosswindKt).toBeCloseTo(crosswindKt, 2);
      expect(worked.crosswindSide).toBe('starboard');
      const figures = snapshot.slots.find((slot) => slot.id === slotId)!.figures!;
      expect(figures.go).toBe(false);
      expect(figures.reasons.map((reason) => reason.code)).toContain('crosswind_over_limit');
    }
  });

  it('projects launch times as @catline/launch-math does, from taxi arrival, priority and catapult timing', async () => {
    const snapshot = await deck.snapshot(demoCycle(2).id);
    const ship = (await deck.ok<ShipView[]>(OBSERVER, 'get', '/api/ships'))[0];
    const aircraft = await deck.all<AircraftView>(OBSERVER, '/api/aircraft');
    const start = Date.parse(snapshot.cycle.plannedLaunchAt);
    const notBefore: Record<string, ReturnType<typeof epochMs>> = {};
    const priorities: Record<string, 'first' | 'normal' | 'last'> = {};
    for (const lane of snapshot.lanes) {
      const number = ship.catapults.find((catapult) => catapult.id === lane.catapultId)!.number;
      for (const slotId of lane.slotIds) {
        const slot = snapshot.slots.find((candidate) => candidate.id === slotId)!;
        const spot = aircraft.find((row) => row.id === slot.aircraftId)!.parkedSpot;
        notBefore[slotId] = epochMs(
          start + ship.deckSpots.find((deckSpot) => deckSpot.name === spot)!.taxiS[number] * 1000,
        );
        priorities[slotId] = slot.tanker || slot.earlyWarning ? 'first' : slot.spare ? 'last' : 'normal';
      }
    }
    const projection = projectLaunchTimes({
      cycleStart: epochMs(start),
      window: {
        start: epochMs(Date.parse(snapshot.cycle.windowStartAt)),
        end: epochMs(Date.parse(snapshot.cycle.windowEndAt)),
      },
      catapults: ship.catapults.map((catapult) => ({
        id: String(catapult.id),
        number: catapult.number,
        position: catapult.position,
        pairId: String(catapult.pair),
        resetInterval: seconds(catapult.resetIntervalS),
        up: catapult.status === 'up',
      })),
      landingAreaInUse: isLandingAreaInUse(snapshot.cycle.landingArea),
      lanes: Object.fromEntries(snapshot.lanes.map((lane) => [String(lane.catapultId), lane.slotIds.map(String)])),
      pairMinimumGap: seconds(ship.pairGapS),
      notBefore,
      priorities,
    });
    for (const projected of projection.slots) {
      const slot = snapshot.slots.find((candidate) => String(candidate.id) === projected.slotId)!;
      expect([slot.projectedLaunchAt, slot.missesWindow]).toEqual([
        new Date(projected.time).toISOString(),
        projected.missesWindow,
      ]);
    }
    expect(projection.slots).toHaveLength(8);
    expect(snapshot.lastLaunchAt).toBe(new Date(projection.lastLaunch!).toISOString());
    expect(
      snapshot.slots
        .filter((slot) => slot.catapultId === null)
        .every((slot) => slot.projectedLaunchAt === null && slot.figures === null),
    ).toBe(true);
  });

  it('keeps the flown cycle whole: a history that replays to its final lineup', async () => {
    const closed = demoCycle(1);
    const final = await deck.snapshot(closed.id);
    const changes = await readChangeLog(deck.url, await deck.token(OBSERVER), closed.id);

    expect(changes.map((change) => change.version)).toEqual(Array.from({ length: final.version }, (_, i) => i + 1));
    const kinds = new Set(changes.map((change) => change.kind));
    for (const kind of [
      'slot_added',
      'slot_moved',
      'weight_acknowledged',
      'aircraft_down',
      'cycle_started',
      'slot_advanced',
      'slot_suspended',
      'slot_launched',
      'cycle_closed',
    ] as const) {
      expect(kinds).toContain(kind);
    }
    const times = changes.map((change) => Date.parse(change.at));
    expect(times).toEqual([...times].sort((a, b) => a - b));
    expect(final.cycle.state).toBe('closed');
    expect(final.slots.filter((slot) => slot.status === 'launched').every((slot) => slot.launchedAt !== null)).toBe(
      true,
    );
    expect(final.slots.find((slot) => slot.sideNumber === 'C24')!.status).toBe('down');

    const empty: LineupSnapshot = {
      cycle: final.cycle,
      lanes: [],
      pool: [],
      slots: [],
      readinessSteps: final.readinessSteps, // the ship's list: no change carries it
      lastLaunchAt: null,
      version: 0,
    };
    const replayed = applyLineupChanges(empty, changes);
    const normal = (snapshot: LineupSnapshot) => ({
      ...snapshot,
      lanes: bySort(snapshot.lanes, (lane) => lane.catapultId),
      slots: bySort(snapshot.slots, (slot) => slot.id),
    });
    expect(normal(replayed)).toEqual(normal(final));
  });
});
