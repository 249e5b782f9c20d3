import { ROLES, type Role } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import fc from 'fast-check';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { type MatrixContext, type MatrixRoute, type RouteExample, matrixRoutes } from './role-matrix/index.js';
import { type RecordedAnswer, recordAnswers } from './support/answer-recorder.js';
import { DocumentedAnswers } from './support/documented-answers.js';
import { secondShip, secondShipPeople } from '../src/database/seeds/demo-second-ship.js';
import { LineupDriver } from './support/lineup-fixtures.js';
import { recreateOwnDatabase } from './support/own-database.js';
import { bearer, demoEmail, signIn, TOKEN_RENEWAL_MS } from './support/sign-in.js';
import { type ClientSocket, connected, openSocket } from './support/socket-client.js';
import { startTestApp } from './support/test-app.js';

// `npm test` tries 10 requests per write route; `npm run soak` sets RELIABILITY_FUZZ_RUNS=150.
const RUNS = Number(process.env.RELIABILITY_FUZZ_RUNS ?? 10);
const SEED = Number(process.env.RELIABILITY_SEED ?? Date.now() % 1_000_000);

const writeRoutes = matrixRoutes.filter((route) => route.method !== 'GET');

/** Wrong types, huge and unusual strings, unicode, nesting: values no field of ours accepts as they are. */
const junkValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.string({ unit: 'grapheme', maxLength: 40 }),
  fc.string({ unit: 'binary', minLength: 2_000, maxLength: 6_000 }),
  fc.constantFrom(
    '',
    ' ',
    '0',
    '-1',
    '1e309',
    'null',
    'true',
    '__proto__',
    '<script>alert(1)</script>',
    "' OR 1=1 --",
    '\u0000',
    '\ud800',
    '𝔘𝔫𝔦𝔠𝔬𝔡𝔢 ✈️',
  ),
  fc.integer(),
  fc.constantFrom(-1, 0, 2 ** 31, 2 ** 53, Number.MAX_SAFE_INTEGER + 2, 1e308, -0, 0.5),
  fc.double(),
  fc.boolean(),
  fc.constant(null),
  fc.array(fc.anything({ maxDepth: 2 }), { maxLength: 5 }),
  fc.anything({ maxDepth: 3, withNullPrototype: true }),
);

/**
 * What makes a request junk for certain, so that no answer but a 4xx is right: a field the route does not
 * know, one of its fields holding a value of the wrong JSON type, a path id that is no id, malformed JSON,
 * or no token. (Real ids of other rows are tried one by one, below.)
 */
type Fault = 'unknown_field' | 'wrong_type' | 'bad_param' | 'malformed' | 'no_token';

/** The kinds of row a request names by id; each is given a real row that is not the request's. */
type IdKind = 'slot' | 'catapult' | 'aircraft' | 'pilot' | 'person' | 'squadron' | 'aircraftType' | 'ship' | 'cycle';

/** The ids a request names, by path placeholder or top-level body field. */
const ID_FIELDS: Record<string, IdKind> = {
  slotId: 'slot',
  spareSlotId: 'slot',
  catapultId: 'catapult',
  toCatapultId: 'catapult',
  aircraftId: 'aircraft',
  pilotId: 'pilot',
  squadronId: 'squadron',
  typeId: 'aircraftType',
  shipId: 'ship',
  cycleId: 'cycle',
};

/** What a path's bare `{id}` names, by the path it is in. */
const PATH_ID_KINDS: [prefix: string, kind: IdKind][] = [
  ['/api/aircraft-types/', 'aircraftType'],
  ['/api/aircraft/', 'aircraft'],
  ['/api/users/', 'person'],
  ['/api/squadrons/', 'squadron'],
];

/** One id of a request, where it is and what it names. */
interface NamedId {
  in: 'path' | 'body';
  name: string;
  kind: IdKind;
}

function namedIds(route: MatrixRoute, example: RouteExample): NamedId[] {
  const placeholders = [...route.path.matchAll(/\{(\w+)\}/g)].map((match) => match[1]);
  const inPath = placeholders.flatMap((name): NamedId[] => {
    const kind = name === 'id' ? PATH_ID_KINDS.find(([prefix]) => route.path.startsWith(prefix))?.[1] : ID_FIELDS[name];
    return kind ? [{ in: 'path', name, kind }] : [];
  });
  const body = typeof example.body === 'object' && example.body !== null ? example.body : {};
  const inBody = Object.entries(body).flatMap(([name, value]): NamedId[] =>
    ID_FIELDS[name] && (value === null || typeof value === 'number')
      ? [{ in: 'body', name, kind: ID_FIELDS[name] }]
      : [],
  );
  return [...inPath, ...inBody];
}

/** A value of another JSON type than `value`: no validator of ours takes it in its place. */
function wrongTypeFor(value: unknown): unknown {
  if (typeof value === 'string') return { text: value };
  if (typeof value === 'number') return 'not a number';
  if (typeof value === 'boolean') return 'yes';
  if (Array.isArray(value)) return 'not a list';
  // null stands for an absent id or text: an object with a field nobody declares fits neither.
  if (value === null) return { catlineJunk: true };
  return 12;
}

/** A path parameter that is no id: never empty, a dot segment (another route) or digits (a real row). */
const junkParam = fc.oneof(
  fc.constantFrom('0x10', '1e3', ' 4', '-1', '1.5', 'abc', '99999999999999999999', '%00', '..%2F..', '🛩', ' ', 'null'),
  fc.string({ minLength: 1, maxLength: 30 }).filter((text) => text !== '.' && text !== '..' && !/\d/.test(text)),
);

/** An aircraft of the second ship for its own cycle, as air operations add one. */
const SECOND_SHIP_SLOT = {
  pilotId: null,
  mission: 'Training',
  fuelLb: 4_000,
  stores: '',
  grossWeightLb: 18_500,
  tanker: false,
  earlyWarning: false,
  spare: false,
};

interface Fuzzed {
  fault: Fault;
  value: unknown;
  /** Index into the example's body keys or the path's placeholders. */
  pick: number;
  param: string;
  raw: string;
}

describe(`bad input to every write route and socket event (${RUNS} tries each, seed ${SEED})`, () => {
  let app: INestApplication;
  let url: string;
  let dataSource: DataSource;
  let tables: string[];
  let answers: RecordedAnswer[];
  let documented: DocumentedAnswers;
  const tokens = new Map<Role, string>();
  let signedInAt = 0;
  let firstShip: LineupDriver;
  let elsewhere: Record<IdKind, number[]>;
  /** How many ids of other rows were tried, by kind. */
  const triedKinds = new Map<IdKind, number>();

  const sharedDatabase = process.env.DB_NAME;

  // A database of its own: valid requests among the junk (a ship's pair gap, a catapult's reset time)
  // would otherwise change the demo rows that the specs after this one rely on.
  beforeAll(async () => {
    process.env.DB_NAME = (await recreateOwnDatabase('fuzz')).DB_NAME;
    ({ app, url } = await startTestApp());
    answers = recordAnswers(app);
    documented = await DocumentedAnswers.of(url);
    dataSource = app.get(DataSource);
    tables = dataSource.entityMetadatas.map((metadata) => metadata.tableName);
    await signInEveryRole();
    firstShip = new LineupDriver(url, (email) => tokens.get(ROLES.find((role) => demoEmail(role) === email)!));
    elsewhere = await rowsElsewhere();
  });

  // The soak's 150 tries a route outlast one access token: every role signs in afresh well before it ends.
  beforeEach(async () => {
    if (Date.now() - signedInAt > TOKEN_RENEWAL_MS) await signInEveryRole();
  });

  afterAll(async () => {
    await app.close();
    process.env.DB_NAME = sharedDatabase;
  });

  async function signInEveryRole() {
    for (const role of ROLES) tokens.set(role, await signIn(url, demoEmail(role)));
    signedInAt = Date.now();
  }

  /** Every table's content checksum: any write anywhere changes it. */
  async function fingerprint(): Promise<string> {
    const rows = (await dataSource.query(`CHECKSUM TABLE ${tables.map((table) => `\`${table}\``).join(', ')}`)) as {
      Table: string;
      Checksum: string;
    }[];
    return rows.map((row) => `${row.Table}=${row.Checksum}`).join(' ');
  }

  /**
   * Real rows no request of the first ship's people may reach: the second ship's (a cycle of its own with
   * one aircraft is made here), and a slot of another cycle of the first ship.
   */
  async function rowsElsewhere(): Promise<Record<IdKind, number[]>> {
    const [{ id: shipId }] = (await dataSource.query('SELECT id FROM ships WHERE name = ?', [secondShip.name])) as {
      id: number;
    }[];
    const ids = async (table: string, where = '') =>
      (
        (await dataSource.query(`SELECT id FROM \`${table}\` WHERE ship_id = ? ${where} ORDER BY id LIMIT 1`, [
          shipId,
        ])) as {
          id: number;
        }[]
      ).map((row) => row.id);
    const aircraft = await ids('aircraft');
    const airOps = await signIn(url, secondShipPeople.find((person) => person.role === 'air_operations')!.email);
    const { number: _number, ...cycleBody } = await firstShip.createCycleBody();
    const cycle = await request(url)
      .post('/api/cycles')
      .set(bearer(airOps))
      .send({ ...cycleBody, shipId, number: 7_001 })
      .expect(201);
    await request(url)
      .post(`/api/cycles/${cycle.body.id}/slots`)
      .set(bearer(airOps))
      .send({ ...SECOND_SHIP_SLOT, aircraftId: aircraft[0] })
      .expect(201);
    const [slot] = (await dataSource.query('SELECT id FROM slots WHERE cycle_id = ?', [cycle.body.id])) as {
      id: number;
    }[];
    const otherCycle = await firstShip.createCycle();
    const sameShipSlot = await firstShip.addSlot(otherCycle.id, 'C21');
    return {
      slot: [sameShipSlot.id, slot.id],
      catapult: await ids('catapults'),
      aircraft,
      pilot: await ids('users', "AND role = 'pilot'"),
      person: await ids('users', "AND role = 'observer'"),
      squadron: await ids('squadrons'),
      aircraftType: await ids('aircraft_types'),
      ship: [shipId],
      cycle: [cycle.body.id as number],
    };
  }

  async function exampleOf(route: MatrixRoute, caller: Role | null): Promise<RouteExample> {
    const context: MatrixContext = { baseUrl: url, caller, allowed: true, tokenOf: (role) => tokens.get(role)! };
    return (await route.example?.(context)) ?? {};
  }

  /**
   * The faults a route can be given: malformed JSON any route; field faults need a JSON body, id faults
   * path ids, no token a guarded route.
   */
  function faultsOf(route: MatrixRoute, caller: Role | null, example: RouteExample): Fault[] {
    const jsonBody = typeof example.body === 'object' && example.body !== null && !Array.isArray(example.body);
    const placeholders = [...route.path.matchAll(/\{(\w+)\}/g)].map((match) => match[1]);
    return [
      'malformed',
      ...(jsonBody ? (['unknown_field'] as const) : []),
      ...(jsonBody && Object.keys(example.body!).length > 0 ? (['wrong_type'] as const) : []),
      ...(placeholders.length > 0 ? (['bad_param'] as const) : []),
      ...(caller ? (['no_token'] as const) : []),
    ];
  }

  const pathOf = (route: MatrixRoute, params: Record<string, string | number>) =>
    route.path.replace(/\{(\w+)\}/g, (_whole, name: string) => encodeURIComponent(String(params[name] ?? 1)));

  /** The route's valid example as `caller` sends it, with the id `named` swapped for `id`. */
  function sendWithId(route: MatrixRoute, caller: Role, example: RouteExample, named: NamedId, id: number) {
    const params = { ...(example.params ?? {}), ...(named.in === 'path' ? { [named.name]: id } : {}) };
    const body = { ...(example.body ?? {}), ...(named.in === 'body' ? { [named.name]: id } : {}) };
    const call = request(url)[route.method.toLowerCase() as 'post'](pathOf(route, params));
    const pending = call.set(bearer(tokens.get(caller)!));
    return example.body === undefined ? pending : pending.send(body);
  }

  async function send(route: MatrixRoute, caller: Role | null, example: RouteExample, fuzzed: Fuzzed) {
    const params: Record<string, string | number> = { ...(example.params ?? {}) };
    const placeholders = [...route.path.matchAll(/\{(\w+)\}/g)].map((match) => match[1]);
    if (fuzzed.fault === 'bad_param') params[placeholders[fuzzed.pick % placeholders.length]] = fuzzed.param;
    const pending = request(url)[route.method.toLowerCase() as 'post'](pathOf(route, params));
    if (caller && fuzzed.fault !== 'no_token') pending.set(bearer(tokens.get(caller)!));
    const body = { ...(example.body ?? {}) } as Record<string, unknown>;
    if (fuzzed.fault === 'unknown_field') body.catlineJunk = fuzzed.value;
    if (fuzzed.fault === 'wrong_type') {
      const keys = Object.keys(body);
      const key = keys[fuzzed.pick % keys.length];
      body[key] = wrongTypeFor(body[key]);
    }
    if (fuzzed.fault === 'malformed') return pending.set('Content-Type', 'application/json').send(fuzzed.raw);
    return example.body === undefined
      ? pending
      : pending.set('Content-Type', 'application/json').send(JSON.stringify(body));
  }

  // Every role the route admits is tried, each with its own valid example spoiled by one certain fault.
  const callsOf = (route: MatrixRoute) =>
    (route.allowed === 'public' ? [null] : route.allowed).map(
      (caller) => [`${route.method} ${route.path} as ${caller ?? 'nobody'}`, route, caller] as const,
    );

  it.each(writeRoutes.flatMap(callsOf))(
    '%s answers junk with a 4xx and changes nothing',
    async (_name, route, caller) => {
      const example = await exampleOf(route, caller);
      const faults = faultsOf(route, caller, example);
      const fuzzed: fc.Arbitrary<Fuzzed> = fc.record({
        fault: fc.constantFrom(...faults),
        value: fc.oneof(junkValue, fc.string({ unit: 'grapheme', minLength: 120_000, maxLength: 130_000 })),
        pick: fc.nat(20),
        param: junkParam,
        raw: fc.constantFrom('{', '{"a":', '[1,2', '{"__proto__":{"role":"admin"}', '\u0000', '{"a":1}}'),
      });
      const failures: string[] = [];
      await fc.assert(
        fc.asyncProperty(fuzzed, async (input) => {
          const before = await fingerprint();
          const response = await send(route, caller, example, input);
          const what = `${input.fault}: ${response.status} ${JSON.stringify(response.body).slice(0, 300)}`;
          if (response.status < 400 || response.status >= 500) failures.push(what);
          else if ((await fingerprint()) !== before) failures.push(`${what}, yet the database changed`);
          if (input.fault === 'no_token' && response.status !== 401) failures.push(`${what} (no token must be 401)`);
          if (typeof response.body?.message !== 'string') failures.push(`${what} without a message`);
        }),
        { numRuns: RUNS, seed: SEED, endOnFailure: true },
      );
      expect(failures).toEqual([]);
      expect((await request(url).get('/api/health')).status).toBe(200);
    },
    120_000,
  );

  // Each id a route takes, swapped for the id of a real row that is not the caller's to name: a slot of
  // another cycle, the second ship's cycle, catapult, aircraft, pilot, person, squadron, type or the ship.
  const guardedCallsOf = (route: MatrixRoute) =>
    route.allowed === 'public'
      ? []
      : route.allowed.map((caller) => [`${route.method} ${route.path} as ${caller}`, route, caller] as const);

  it.each(writeRoutes.flatMap(guardedCallsOf))(
    '%s refuses real ids of rows that are not its own with a 4xx, changing nothing',
    async (_name, route, caller) => {
      const example = await exampleOf(route, caller);
      const failures: string[] = [];
      for (const named of namedIds(route, example)) {
        for (const id of elsewhere[named.kind]) {
          const before = await fingerprint();
          const response = await sendWithId(route, caller, example, named, id);
          const what = `${named.name} = ${named.kind} ${id} of another row: ${response.status} ${JSON.stringify(response.body).slice(0, 300)}`;
          if (response.status < 400 || response.status >= 500 || response.status === 401) failures.push(what);
          else if ((await fingerprint()) !== before) failures.push(`${what}, yet the database changed`);
          if (typeof response.body?.message !== 'string') failures.push(`${what} without a message`);
          triedKinds.set(named.kind, (triedKinds.get(named.kind) ?? 0) + 1);
        }
      }
      expect(failures).toEqual([]);
    },
    120_000,
  );

  it('tried an id of another row of every kind', () => {
    const kinds: IdKind[] = [
      'slot',
      'catapult',
      'aircraft',
      'pilot',
      'person',
      'squadron',
      'aircraftType',
      'ship',
      'cycle',
    ];
    expect(kinds.filter((kind) => !triedKinds.has(kind))).toEqual([]);
  });

  it('answers junk socket events with a refusal or not at all, keeps the connection and changes nothing', async () => {
    const origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
    const cycle = await firstShip.createCycle();
    const socket: ClientSocket = openSocket(url, { token: tokens.get('pilot')!, origin });
    await connected(socket);
    const raw = socket as unknown as {
      timeout(ms: number): { emitWithAck(event: string, ...args: unknown[]): Promise<unknown> };
      emit(event: string, ...args: unknown[]): void;
    };
    const answers: unknown[] = [];
    try {
      await fc.assert(
        fc.asyncProperty(
          fc.constantFrom(
            'cycle:join',
            'cycle:leave',
            'session:refresh',
            'lineup:move',
            'slot:launch',
            'cycle:close',
            '__proto__',
            '',
          ),
          fc.oneof(
            junkValue,
            fc.record(
              { cycleId: fc.oneof(junkValue, fc.constant(cycle.id)), sinceVersion: junkValue, accessToken: junkValue },
              { requiredKeys: [] },
            ),
          ),
          fc.boolean(),
          async (event, payload, withAck) => {
            const before = await fingerprint();
            if (withAck)
              answers.push(
                await raw
                  .timeout(300)
                  .emitWithAck(event, payload)
                  .catch(() => 'no answer'),
              );
            else raw.emit(event, payload);
            expect(socket.connected).toBe(true);
            expect(await fingerprint()).toBe(before);
          },
        ),
        { numRuns: RUNS * 10, seed: SEED, endOnFailure: true },
      );
    } finally {
      socket.disconnect();
    }
    // Every answer is a refusal with a message, or a join/leave that did what it says for a valid request.
    const bad = answers.filter(
      (answer) => answer !== 'no answer' && !(typeof answer === 'object' && answer !== null && 'ok' in answer),
    );
    expect(bad).toEqual([]);
    expect(answers.filter((answer) => (answer as { code?: string }).code === 'internal_error')).toEqual([]);
    expect((await request(url).get('/api/health')).status).toBe(200);
  }, 180_000);

  // After the junk: each refusal it got is one its operation documents, with that status's codes.
  it('got only refusals the document lists for each operation', () => {
    expect(documented.problemsOf(answers)).toEqual([]);
  });
});
