import { randomBytes } from 'node:crypto';
import type { AircraftTypeView, AircraftView, Role, SquadronView, UserView } from '@catline/contracts';
import request from 'supertest';
import { bearer } from './sign-in.js';

/** A name no other spec uses in the shared test database: the prefix and random letters, `length` long. */
export function unique(prefix: string, length = 8): string {
  const letters = randomBytes(16).toString('hex').toUpperCase();
  return (prefix + letters).slice(0, length);
}

async function created<T>(pending: request.Test, what: string): Promise<T> {
  const response = await pending;
  if (response.status !== 201)
    throw new Error(`Creating ${what} failed with ${response.status}: ${JSON.stringify(response.body)}`);
  return response.body as T;
}

export function createSquadron(baseUrl: string, adminToken: string): Promise<SquadronView> {
  const code = unique('SQ', 10);
  return created(
    request(baseUrl)
      .post('/api/squadrons')
      .set(bearer(adminToken))
      .send({ name: `Squadron ${code}`, code, email: `${code.toLowerCase()}@catline.example` }),
    'a squadron',
  );
}

/** A valid body for POST /api/aircraft-types (invented figures). */
export function aircraftTypeBody(designation = unique('T-', 12)) {
  return {
    designation,
    name: `Test type ${designation}`,
    maxGrossWeightLb: 40_000,
    operatingWeightLb: 22_000,
    crosswindLimitKt: 15,
    thrustLbf: 20_000,
    requiredExcessKt: 10,
    afterburnerFromLb: 36_000,
    maxEndSpeedKt: 170,
    trimBands: [
      { upToLb: 30_000, trimDeg: 10 },
      { upToLb: null, trimDeg: 12 },
    ],
    launchTable: [
      { grossWeightLb: 25_000, minLaunchAirspeedKt: 115 },
      { grossWeightLb: 40_000, minLaunchAirspeedKt: 135 },
    ],
  };
}

export function createAircraftType(baseUrl: string, adminToken: string): Promise<AircraftTypeView> {
  return created(
    request(baseUrl).post('/api/aircraft-types').set(bearer(adminToken)).send(aircraftTypeBody()),
    'an aircraft type',
  );
}

/** An aircraft of a demo type and squadron (ids 1) on the demo deck spot `bow-1`, unless told otherwise. */
export function createAircraft(
  baseUrl: string,
  adminToken: string,
  fields: Partial<{ typeId: number; squadronId: number; parkedSpot: string }> = {},
): Promise<AircraftView> {
  const body = { sideNumber: unique('X', 8), typeId: 1, squadronId: 1, parkedSpot: 'bow-1', ...fields };
  return created(request(baseUrl).post('/api/aircraft').set(bearer(adminToken)).send(body), 'an aircraft');
}

export const TEST_PASSWORD = 'correct horse battery';

/** A person of the role with TEST_PASSWORD (catapult officers run catapult id 1). */
export function createUser(baseUrl: string, adminToken: string, role: Role = 'observer'): Promise<UserView> {
  const name = unique('person', 14).toLowerCase();
  return created(
    request(baseUrl)
      .post('/api/users')
      .set(bearer(adminToken))
      .send({
        email: `${name}@catline.example`,
        name: `Test ${name}`,
        role,
        password: TEST_PASSWORD,
        ...(role === 'catapult_officer' ? { catapultId: 1 } : {}),
      }),
    'a person',
  );
}
