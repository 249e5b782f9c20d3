import { expect, request, type APIRequestContext } from '@playwright/test';
import {
  DEMO_PASSWORD,
  nextPageOffset,
  type Page,
  type AircraftTypeView,
  type AircraftView,
  type CycleView,
  type LineupChange,
  type LineupCommandResult,
  type LineupSnapshot,
  type SessionResponse,
  type ShipView,
  type UserView,
} from '@catline/contracts';

export { DEMO_PASSWORD };
export const demoEmail = (who: string) => `${who}@catline.example`;

const baseURL = `http://127.0.0.1:${process.env.E2E_PORT ?? '3100'}`;

/** An API client signed in as one demo person: the tests set up their data the way the screens would. */
export async function apiAs(who: string, password = DEMO_PASSWORD): Promise<APIRequestContext> {
  const anonymous = await request.newContext({ baseURL });
  const response = await anonymous.post('/api/auth/login', { data: { email: demoEmail(who), password } });
  expect(response.status(), await response.text()).toBe(200);
  const session = (await response.json()) as SessionResponse;
  await anonymous.dispose();
  return request.newContext({ baseURL, extraHTTPHeaders: { Authorization: `Bearer ${session.accessToken}` } });
}

async function ok<T>(response: Awaited<ReturnType<APIRequestContext['get']>>): Promise<T> {
  expect(response.ok(), `${response.url()} → ${response.status()} ${await response.text()}`).toBe(true);
  return (await response.json()) as T;
}

/** Every row of a paged list (`path` may carry a query of its own), page after page. */
export async function allOf<T>(api: APIRequestContext, path: string): Promise<T[]> {
  const rows: T[] = [];
  for (let offset: number | null = 0; offset !== null;) {
    const page: Page<T> = await ok<Page<T>>(await api.get(`${path}${path.includes('?') ? '&' : '?'}offset=${offset}`));
    rows.push(...page.items);
    offset = nextPageOffset(page);
  }
  return rows;
}

/** A new aircraft type of invented figures, added by the admin, named `designation`. */
export async function addTrialType(designation: string): Promise<AircraftTypeView> {
  const api = await apiAs('admin');
  const created = await api.post('/api/aircraft-types', {
    data: {
      designation,
      name: 'Trial type',
      maxGrossWeightLb: 52_000,
      crosswindLimitKt: 15,
      thrustLbf: 20_000,
      requiredExcessKt: 15,
      afterburnerFromLb: null,
      maxEndSpeedKt: 170,
      trimBands: [{ upToLb: null, trimDeg: 12 }],
      launchTable: [
        { grossWeightLb: 34_000, minLaunchAirspeedKt: 124 },
        { grossWeightLb: 46_000, minLaunchAirspeedKt: 143 },
      ],
    },
  });
  const type = await ok<AircraftTypeView>(created);
  await api.dispose();
  return type;
}

export interface PlannedAircraft {
  side: string;
  grossWeightLb: number;
  /**
   * The demo pilot (`pilot`, `pilot2`…); left out, a demo pilot the plan names nowhere else, since an
   * aircraft without one cannot join a catapult; `null` for none (a spare brings none either).
   */
  pilot?: string | null;
  spare?: boolean;
  /** 'Training sortie' unless told: a spare is offered first by type, then by mission. */
  mission?: string;
  tanker?: boolean;
}

/**
 * Demo pilots (as signed in, e.g. `pilot7`) who hold no slot in any open cycle: the screens land a pilot
 * on an open cycle holding their slot, and earlier tests leave cycles open with pilots crewed in them.
 */
export async function pilotsWithoutOpenSlots(count: number): Promise<string[]> {
  const airops = await apiAs('airops');
  const open = (await allOf<CycleView>(airops, '/api/cycles')).filter((cycle) => cycle.state !== 'closed');
  const busy = new Set<number | null>();
  for (const cycle of open) for (const slot of (await lineupOf(airops, cycle.id)).slots) busy.add(slot.pilotId);
  const pilots = await allOf<UserView>(airops, '/api/users/pilots');
  await airops.dispose();
  const free = pilots.filter((pilot) => !busy.has(pilot.id)).map((pilot) => pilot.email.split('@')[0]);
  expect(free.length, 'demo pilots with no slot in an open cycle').toBeGreaterThanOrEqual(count);
  return free.slice(0, count);
}

/** Each aircraft's pilot id: the one named, or the next demo pilot nobody in the plan has (from the last). */
function crewOf(aircraft: PlannedAircraft[], pilots: UserView[]): (number | undefined)[] {
  const named = new Set(aircraft.map((planned) => planned.pilot && demoEmail(planned.pilot)));
  const free = pilots.filter((pilot) => !named.has(pilot.email)).reverse();
  return aircraft.map((planned) => {
    if (planned.pilot) return pilots.find((pilot) => pilot.email === demoEmail(planned.pilot!))?.id;
    if (planned.pilot === null || planned.spare) return undefined;
    const pilot = free.shift();
    expect(pilot, 'a free demo pilot for every aircraft').toBeDefined();
    return pilot!.id;
  });
}

/** The wind and the ship's way a cycle is planned in, when a test needs other than good wind. */
export interface PlannedWind {
  shipSpeedKt: number;
  trueWindFromDeg: number;
  trueWindSpeedKt: number;
}

export interface PlanOptions {
  aircraft: PlannedAircraft[];
  start?: boolean;
  night?: boolean;
  wind?: PlannedWind;
}

/** Air operations creates a cycle flying now (in good wind unless told), with the given aircraft in its deck pool. */
export async function planCycle({ aircraft, start = false, night = false, wind }: PlanOptions) {
  const airops = await apiAs('airops');
  const [ship] = await ok<ShipView[]>(await airops.get('/api/ships'));
  const cycles = await allOf<CycleView>(airops, '/api/cycles');
  const now = Date.now();
  const cycle = await ok<CycleView>(
    await airops.post('/api/cycles', {
      data: {
        shipId: ship.id,
        number: Math.max(0, ...cycles.map((existing) => existing.number)) + 1,
        plannedLaunchAt: new Date(now + 5 * 60_000).toISOString(),
        windowStartAt: new Date(now - 5 * 60_000).toISOString(),
        windowEndAt: new Date(now + 60 * 60_000).toISOString(),
        shipCourseDeg: 0,
        shipSpeedKt: 25,
        trueWindFromDeg: 0,
        trueWindSpeedKt: 12,
        ...wind,
        temperatureC: 18,
        pressureHpa: 1015,
        weatherCase: night ? 'III' : 'I',
        night,
      },
    }),
  );
  const fleet = await allOf<AircraftView>(airops, '/api/aircraft');
  const pilots = await allOf<UserView>(airops, '/api/users/pilots');
  const slotIds = new Map<string, number>();
  const crew = crewOf(aircraft, pilots);
  for (const [index, planned] of aircraft.entries()) {
    const plane = fleet.find((candidate) => candidate.sideNumber === planned.side);
    expect(plane, `aircraft ${planned.side} in the demo fleet`).toBeDefined();
    const result = await ok<LineupCommandResult>(
      await airops.post(`/api/cycles/${cycle.id}/slots`, {
        data: {
          aircraftId: plane!.id,
          pilotId: crew[index],
          mission: planned.mission ?? 'Training sortie',
          fuelLb: 9000,
          stores: 'Clean',
          grossWeightLb: planned.grossWeightLb,
          tanker: planned.tanker ?? false,
          earlyWarning: false,
          spare: planned.spare ?? false,
        },
      }),
    );
    const slot = result.change.patch.slots?.find((candidate) => candidate.sideNumber === planned.side);
    slotIds.set(planned.side, slot!.id);
  }
  if (start) await startLaunching(cycle.id);
  await airops.dispose();
  return { cycle, slotIds };
}

/**
 * The air boss stops whichever cycle of the ship of `cycleId` is launching: one cycle per ship launches, so
 * one an earlier test left launching would refuse the start of this one.
 */
export async function stopLaunchingBefore(cycleId: number) {
  const airboss = await apiAs('airboss');
  const cycles = await allOf<CycleView>(airboss, '/api/cycles');
  const cycle = cycles.find((candidate) => candidate.id === cycleId)!;
  for (const other of cycles.filter(
    (candidate) => candidate.shipId === cycle.shipId && candidate.state === 'executing',
  )) {
    await ok(await airboss.post(`/api/cycles/${other.id}/stop`, { data: { basisVersion: other.version } }));
  }
  await airboss.dispose();
  return cycle;
}

/** The air boss ticks the cycle's open launch prerequisites and starts launching it. */
export async function startLaunching(cycleId: number) {
  const cycle = await stopLaunchingBefore(cycleId);
  const airboss = await apiAs('airboss');
  for (const [index, prerequisite] of cycle.launchPrerequisites.entries()) {
    if (prerequisite.ticked) continue;
    const { version } = await lineupOf(airboss, cycleId);
    await ok(
      await airboss.put(`/api/cycles/${cycleId}/prerequisites/${index + 1}`, {
        data: { ticked: true, basisVersion: version },
      }),
    );
  }
  const { version } = await lineupOf(airboss, cycleId);
  await ok(await airboss.post(`/api/cycles/${cycleId}/start`, { data: { basisVersion: version } }));
  await airboss.dispose();
}

export async function lineupOf(api: APIRequestContext, cycleId: number) {
  return ok<LineupSnapshot>(await api.get(`/api/cycles/${cycleId}/lineup`));
}

export async function changesOf(api: APIRequestContext, cycleId: number) {
  return allOf<LineupChange>(api, `/api/cycles/${cycleId}/lineup/changes?since=0`);
}

/** Air operations enters the cycle's wind again, unchanged, as read `ageMs` ago. */
export async function enterWindReading(cycleId: number, ageMs: number) {
  const airops = await apiAs('airops');
  const { version, cycle } = await lineupOf(airops, cycleId);
  await ok(
    await airops.patch(`/api/cycles/${cycleId}/conditions`, {
      data: {
        basisVersion: version,
        trueWindFromDeg: cycle.trueWindFromDeg,
        trueWindSpeedKt: cycle.trueWindSpeedKt,
        windReadAt: new Date(Date.now() - ageMs).toISOString(),
      },
    }),
  );
  await airops.dispose();
}

/** The handler puts a slot at the end of a catapult's lane through the API. */
export async function placeInLane(handler: APIRequestContext, cycleId: number, slotId: number, catapultNumber: number) {
  const snapshot = await lineupOf(handler, cycleId);
  const lane = snapshot.lanes.find((candidate) => candidate.number === catapultNumber)!;
  const slot = snapshot.slots.find((candidate) => candidate.id === slotId)!;
  await ok(
    await handler.post(`/api/cycles/${cycleId}/lineup/moves`, {
      data: {
        slotId,
        slotVersion: slot.version,
        toCatapultId: lane.catapultId,
        toIndex: lane.slotIds.length,
        targetLaneOrder: lane.slotIds,
      },
    }),
  );
}

/** A launching cycle with an aircraft off, one on cat 1, aircraft waiting and one left in the pool. */
export async function launchingCycle(night = false) {
  const { cycle, slotIds } = await planCycle({
    start: true,
    night,
    aircraft: [
      { side: 'C21', grossWeightLb: 44_800, pilot: 'pilot' },
      { side: 'C22', grossWeightLb: 46_200 },
      { side: 'D33', grossWeightLb: 45_500 },
      { side: 'G43', grossWeightLb: 24_000 },
      { side: 'L47', grossWeightLb: 48_000 },
    ],
  });
  const handler = await apiAs('handler');
  for (const [side, catapult] of [
    ['C21', 1],
    ['C22', 1],
    ['D33', 2],
    ['G43', 3],
  ] as const) {
    await placeInLane(handler, cycle.id, slotIds.get(side)!, catapult);
  }
  await handler.dispose();
  return cycle;
}
