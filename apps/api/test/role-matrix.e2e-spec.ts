import { type LineupSnapshot, ROLES, type Role } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import request from 'supertest';
import { secondShipPeople } from '../src/database/seeds/demo-second-ship.js';
import { type MatrixContext, type MatrixRoute, matrixRoutes } from './role-matrix/index.js';
import { DocumentedAnswers } from './support/documented-answers.js';
import { bearer, demoEmail, signIn } from './support/sign-in.js';
import { connected, join, openSocket } from './support/socket-client.js';
import { startTestApp } from './support/test-app.js';

const key = (method: string, path: string) => `${method.toUpperCase()} ${path}`;

/** Every HTTP route of the running app, read from its OpenAPI document (which lists every controller route). */
function appRoutes(app: INestApplication): string[] {
  const document = SwaggerModule.createDocument(app, new DocumentBuilder().build());
  return Object.entries(document.paths).flatMap(([path, operations]) =>
    Object.keys(operations as object)
      .filter((method) => ['get', 'post', 'put', 'patch', 'delete'].includes(method))
      .map((method) => key(method, path)),
  );
}

function fillPath(path: string, params: Record<string, string | number> = {}): string {
  return path.replace(/\{(\w+)\}/g, (_placeholder, name: string) => {
    if (params[name] === undefined) throw new Error(`The example for ${path} gives no value for {${name}}`);
    return encodeURIComponent(String(params[name]));
  });
}

/**
 * What a route names of the first ship, read by that ship's admin: the cycle's lineup version for a route
 * under a cycle, otherwise the row of the path's first id (`/api/users/{id}/invitation` reads `/api/users/{id}`).
 */
function ownerRead(route: MatrixRoute, params: Record<string, string | number> = {}): string {
  if (params.cycleId !== undefined) return `/api/cycles/${params.cycleId}/lineup`;
  return fillPath(/^\/api\/[\w-]+\/\{\w+\}/.exec(route.path)![0], params);
}

/** Rows that name a row of a ship in their path, and the roles they admit. */
const shipRowRoutes = matrixRoutes.flatMap((route) =>
  route.allowed !== 'public' && route.path.includes('{')
    ? route.allowed.map((role) => [key(route.method, route.path), role, route] as const)
    : [],
);

const isAllowed = (route: MatrixRoute, caller: Role | null) =>
  route.allowed === 'public' || (caller !== null && route.allowed.includes(caller));

describe('role matrix', () => {
  let app: INestApplication;
  let url: string;
  const tokens = new Map<Role, string>();
  /** The people of the demo's second ship, one of each role, who must reach nothing of the first ship. */
  const secondShipTokens = new Map<Role, string>();
  let documented: DocumentedAnswers;
  /** How the answers the rows got disagree with the document, gathered for the last test. */
  const undocumented = new Set<string>();

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    documented = await DocumentedAnswers.of(url);
    for (const role of ROLES) tokens.set(role, await signIn(url, demoEmail(role)));
    for (const person of secondShipPeople) secondShipTokens.set(person.role, await signIn(url, person.email));
  });

  afterAll(async () => {
    await app.close();
  });

  async function call(route: MatrixRoute, caller: Role | null): Promise<request.Response> {
    const context: MatrixContext = {
      baseUrl: url,
      caller,
      allowed: isAllowed(route, caller),
      tokenOf: (role) => tokens.get(role)!,
    };
    const example = (await route.example?.(context)) ?? {};
    const method = route.method.toLowerCase() as 'get';
    const target = request(url)[method](fillPath(route.path, example.params));
    const headers = example.headers ?? {};
    const pending = target.query(example.query ?? {}).set(headers);
    if (caller && !('Authorization' in headers)) pending.set(bearer(tokens.get(caller)!));
    return example.body === undefined ? pending : pending.send(example.body);
  }

  it('has a row for every route of the app, and no row for a route it lacks', () => {
    const routes = appRoutes(app);
    const rows = matrixRoutes.map((route) => key(route.method, route.path));
    expect(routes.filter((route) => !rows.includes(route))).toEqual([]);
    expect(rows.filter((row) => !routes.includes(row))).toEqual([]);
    expect(rows.filter((row, i) => rows.indexOf(row) !== i)).toEqual([]);
  });

  it('lets no row count 401 or 403 as an acceptable refusal', () => {
    expect(matrixRoutes.filter((route) => route.refusals?.some((status) => status === 401 || status === 403))).toEqual(
      [],
    );
  });

  it.each(
    matrixRoutes.flatMap((route) =>
      Object.entries(route.notOwner ?? {}).map(
        ([role, email]) => [key(route.method, route.path), role as Role, email, route] as const,
      ),
    ),
  )('%s refuses a second %s, who does not own the target', async (_name, role, notOwner, route) => {
    const context: MatrixContext = { baseUrl: url, caller: role, allowed: true, tokenOf: (of) => tokens.get(of)! };
    const example = await route.example!(context);
    const { cycleId, slotId } = example.params as { cycleId: number; slotId: number };
    const before = await request(url)
      .get(`/api/cycles/${cycleId}/lineup`)
      .set(bearer(tokens.get('observer')!));
    const response = await request(url)
      .post(fillPath(route.path, example.params))
      .set(bearer(await signIn(url, notOwner)))
      .send(example.body);
    const after = await request(url)
      .get(`/api/cycles/${cycleId}/lineup`)
      .set(bearer(tokens.get('observer')!));
    expect({ status: response.status, code: response.body.code }).toEqual({
      status: 403,
      code: expect.stringMatching(/^not_your_(catapult|slot)$/),
    });
    const slotOf = (snapshot: request.Response) =>
      (snapshot.body as LineupSnapshot).slots.find((slot) => slot.id === slotId);
    expect(slotOf(after)).toEqual(slotOf(before));
    expect((after.body as LineupSnapshot).version).toBe((before.body as LineupSnapshot).version);
  });

  // The two-ship matrix: each route naming a first-ship row, called by the second ship's person of every role
  // it admits, with the example a refused caller gets (the first ship's shared rows; no fresh cycle each).
  it.each(shipRowRoutes)(
    "%s refuses the second ship's %s a first-ship row and leaves it as it was",
    async (...[, role, route]) => {
      const context: MatrixContext = { baseUrl: url, caller: role, allowed: false, tokenOf: (of) => tokens.get(of)! };
      const example = (await route.example?.(context)) ?? {};
      const read = async () => {
        const answer = await request(url)
          .get(ownerRead(route, example.params))
          .set(bearer(tokens.get('admin')!));
        return {
          status: answer.status,
          body: example.params?.cycleId === undefined ? answer.body : answer.body.version,
        };
      };
      const before = await read();
      const method = route.method.toLowerCase() as 'get';
      const target = request(url)[method](fillPath(route.path, example.params));
      const pending = target
        .query(example.query ?? {})
        .set(example.headers ?? {})
        .set(bearer(secondShipTokens.get(role)!));
      const response = example.body === undefined ? await pending : await pending.send(example.body);
      const refused = response.status === 403 || response.status === 404;
      expect(refused ? 'refused' : `${response.status} ${JSON.stringify(response.body)}`).toBe('refused');
      expect(await read()).toEqual(before);
    },
  );

  it("refuses cycle:join of a first-ship cycle to the second ship's people of every role", async () => {
    const origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
    const [cycle] = (
      await request(url)
        .get('/api/cycles')
        .set(bearer(tokens.get('observer')!))
    ).body.items as {
      id: number;
    }[];
    const answers: Record<string, unknown> = {};
    for (const [role, token] of secondShipTokens) {
      const socket = openSocket(url, { token, origin });
      try {
        await connected(socket);
        answers[role] = await join(socket, { cycleId: cycle.id });
      } finally {
        socket.disconnect();
      }
    }
    const notFound = { ok: false, code: 'not_found', message: `Cycle ${cycle.id} does not exist.` };
    expect(answers).toEqual(Object.fromEntries(ROLES.map((role) => [role, notFound])));
  });

  it.each(matrixRoutes.map((route) => [key(route.method, route.path), route] as const))(
    '%s answers each role as the matrix says',
    async (_name, route) => {
      const outcomes: string[] = [];
      const expected: string[] = [];
      for (const caller of [null, ...ROLES]) {
        const response = await call(route, caller);
        const who = caller ?? 'nobody';
        for (const problem of documented.problems(route.method, route.path, response)) undocumented.add(problem);
        if (!isAllowed(route, caller)) {
          expected.push(`${who}: ${caller ? 403 : 401}`);
          outcomes.push(`${who}: ${response.status}`);
        } else {
          const accepted =
            (response.status >= 200 && response.status < 300) || (route.refusals ?? []).includes(response.status);
          expected.push(`${who}: admitted`);
          outcomes.push(`${who}: ${accepted ? 'admitted' : `${response.status} ${JSON.stringify(response.body)}`}`);
        }
      }
      expect(outcomes).toEqual(expected);
    },
  );

  // After the rows: every answer they got, success or refusal, is one the document describes.
  it('got only answers the document describes: a listed status, a body of its schema, a listed code', () => {
    expect([...undocumented]).toEqual([]);
  });
});
