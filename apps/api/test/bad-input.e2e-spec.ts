import { ROLES, type Role } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import fc from 'fast-check';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { type MatrixContext, type MatrixRoute, type RouteExample, matrixRoutes } from './role-matrix/index.js';
import { LineupDriver } from './support/lineup-fixtures.js';
import { recreateOwnDatabase } from './support/own-database.js';
import { bearer, demoEmail, signIn } from './support/sign-in.js';
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
  fc.constantFrom('', ' ', '0', '-1', '1e309', 'null', 'true', '__proto__', '<script>alert(1)</script>', "' OR 1=1 --", '\u0000', '\ud800', '𝔘𝔫𝔦𝔠𝔬𝔡𝔢 ✈️'),
  fc.integer(),
  fc.constantFrom(-1, 0, 2 ** 31, 2 ** 53, Number.MAX_SAFE_INTEGER + 2, 1e308, -0, 0.5),
  fc.double(),
  fc.boolean(),
  fc.constant(null),
  fc.array(fc.anything({ maxDepth: 2 }), { maxLength: 5 }),
  fc.anything({ maxDepth: 3, withNullPrototype: true }),
);

/** A body: junk of any shape, or the route's own fields (and some made up) holding junk. */
function junkBody(example: object | undefined): fc.Arbitrary<unknown> {
  const keys = [...Object.keys(example ?? {}), 'id', 'role', '__proto__', 'constructor'];
  return fc.oneof(
    fc.anything({ maxDepth: 4 }),
    fc.dictionary(fc.constantFrom(...keys), junkValue, { maxKeys: keys.length }),
    example ? fc.record(Object.fromEntries(Object.keys(example).map((key) => [key, junkValue])), { requiredKeys: [] }) : fc.constant({}),
    fc.string({ unit: 'grapheme', minLength: 120_000, maxLength: 130_000 }).map((text) => ({ text })),
  );
}

/**
 * A path parameter: mostly the example's, sometimes junk. Never empty or a dot segment (those name another
 * route), and never digits, which could name a real row (deleting the people the examples sign in as).
 */
const junkParam = fc.oneof(
  fc.constantFrom('0', '-1', '1.5', 'abc', '99999999999999999999', '%00', '..%2F..', '🛩', ' ', 'null'),
  fc.string({ minLength: 1, maxLength: 30 }).filter((text) => text !== '.' && text !== '..' && !/\d/.test(text)),
);

interface Fuzzed {
  body: unknown;
  /** Raw text sent as application/json, when set (malformed JSON). */
  raw?: string;
  params: Record<string, string>;
  withToken: boolean;
}

describe(`bad input to every write route and socket event (${RUNS} tries each, seed ${SEED})`, () => {
  let app: INestApplication;
  let url: string;
  let dataSource: DataSource;
  let tables: string[];
  const tokens = new Map<Role, string>();

  const sharedDatabase = process.env.DB_NAME;

  // A database of its own: valid requests among the junk (a ship's pair gap, a catapult's reset time)
  // would otherwise change the demo rows that the specs after this one rely on.
  beforeAll(async () => {
    process.env.DB_NAME = (await recreateOwnDatabase('fuzz')).DB_NAME;
    ({ app, url } = await startTestApp());
    dataSource = app.get(DataSource);
    tables = dataSource.entityMetadatas.map((metadata) => metadata.tableName);
    for (const role of ROLES) tokens.set(role, await signIn(url, demoEmail(role)));
  });

  afterAll(async () => {
    await app.close();
    process.env.DB_NAME = sharedDatabase;
  });

  /** Every table's content checksum: any write anywhere changes it. */
  async function fingerprint(): Promise<string> {
    const rows = (await dataSource.query(`CHECKSUM TABLE ${tables.map((table) => `\`${table}\``).join(', ')}`)) as { Table: string; Checksum: string }[];
    return rows.map((row) => `${row.Table}=${row.Checksum}`).join(' ');
  }

  const callerOf = (route: MatrixRoute): Role | null => (route.allowed === 'public' ? null : route.allowed[0]);

  async function exampleOf(route: MatrixRoute, caller: Role | null): Promise<RouteExample> {
    const context: MatrixContext = { baseUrl: url, caller, allowed: true, tokenOf: (role) => tokens.get(role)! };
    return (await route.example?.(context)) ?? {};
  }

  function send(route: MatrixRoute, caller: Role | null, example: RouteExample, fuzzed: Fuzzed) {
    const path = route.path.replace(/\{(\w+)\}/g, (_whole, name: string) => encodeURIComponent(fuzzed.params[name] ?? String(example.params?.[name] ?? 1)));
    const pending = request(url)[route.method.toLowerCase() as 'post'](path);
    if (caller && fuzzed.withToken) pending.set(bearer(tokens.get(caller)!));
    // Serialised here: superagent itself cannot send a bare number or boolean as a body.
    const text = fuzzed.raw ?? JSON.stringify(fuzzed.body);
    return text === undefined ? pending : pending.set('Content-Type', 'application/json').send(text);
  }

  it.each(writeRoutes.map((route) => [`${route.method} ${route.path}`, route] as const))(
    '%s answers junk with a 4xx and changes nothing',
    async (_name, route) => {
      const caller = callerOf(route);
      const example = await exampleOf(route, caller);
      const placeholders = [...route.path.matchAll(/\{(\w+)\}/g)].map((match) => match[1]);
      const fuzzed: fc.Arbitrary<Fuzzed> = fc.record({
        body: junkBody(example.body),
        raw: fc.option(fc.constantFrom('{', '{"a":', '[1,2', 'null', '"text"', '{"__proto__":{"role":"admin"}}', '\u0000'), { freq: 8, nil: undefined }),
        params: fc.record(Object.fromEntries(placeholders.map((name) => [name, junkParam])), { requiredKeys: [] }) as fc.Arbitrary<Record<string, string>>,
        withToken: fc.nat(4).map((n) => caller === null || n !== 0),
      });
      const failures: string[] = [];
      await fc.assert(
        fc.asyncProperty(fuzzed, async (input) => {
          const before = await fingerprint();
          const response = await send(route, caller, example, input);
          if (response.status >= 500) failures.push(`${response.status} ${JSON.stringify(response.body).slice(0, 300)}`);
          if (response.status >= 300 && (await fingerprint()) !== before) failures.push(`refused ${response.status} yet changed the database`);
          // Without a token: 401, unless the body parser refused the body first (malformed JSON 400, too large 413).
          const plainObject = input.raw === undefined && typeof input.body === 'object' && input.body !== null && !Array.isArray(input.body);
          const parserRefusal = !plainObject && [400, 413].includes(response.status);
          if (caller && !input.withToken && response.status !== 401 && !parserRefusal && response.status !== 413) {
            failures.push(`answered ${response.status} without a token`);
          }
          if (response.status >= 400 && typeof response.body?.message !== 'string') failures.push(`${response.status} without a message`);
        }),
        { numRuns: RUNS, seed: SEED, endOnFailure: true },
      );
      expect(failures).toEqual([]);
      expect((await request(url).get('/api/health')).status).toBe(200);
    },
    120_000,
  );

  it('answers junk socket events with a refusal or not at all, keeps the connection and changes nothing', async () => {
    const origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
    const deck = new LineupDriver(url, (email) => tokens.get(ROLES.find((role) => demoEmail(role) === email)!));
    const cycle = await deck.createCycle();
    const socket: ClientSocket = openSocket(url, { token: tokens.get('pilot')!, origin });
    await connected(socket);
    const raw = socket as unknown as { timeout(ms: number): { emitWithAck(event: string, ...args: unknown[]): Promise<unknown> }; emit(event: string, ...args: unknown[]): void };
    const answers: unknown[] = [];
    try {
      await fc.assert(
        fc.asyncProperty(
          fc.constantFrom('cycle:join', 'cycle:leave', 'session:refresh', 'lineup:move', 'slot:launch', 'cycle:close', '__proto__', ''),
          fc.oneof(junkValue, fc.record({ cycleId: fc.oneof(junkValue, fc.constant(cycle.id)), sinceVersion: junkValue, accessToken: junkValue }, { requiredKeys: [] })),
          fc.boolean(),
          async (event, payload, withAck) => {
            const before = await fingerprint();
            if (withAck) answers.push(await raw.timeout(300).emitWithAck(event, payload).catch(() => 'no answer'));
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
    const bad = answers.filter((answer) => answer !== 'no answer' && !(typeof answer === 'object' && answer !== null && 'ok' in answer));
    expect(bad).toEqual([]);
    expect(answers.filter((answer) => (answer as { code?: string }).code === 'internal_error')).toEqual([]);
    expect((await request(url).get('/api/health')).status).toBe(200);
  }, 180_000);
});
