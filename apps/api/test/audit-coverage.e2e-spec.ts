import { type AuditAction, type AuditEntryView, type Page, ROLE_LABELS, ROLES, type Role } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import type { OpenAPIObject } from '@nestjs/swagger';
import request from 'supertest';
import { demoCatapults, demoDeckLayout, demoDeckSpots, demoShip } from '../src/database/seeds/demo-fleet.js';
import { type MatrixContext, type RouteExample, matrixRoutes } from './role-matrix/index.js';
import { uploadCsv } from './support/csv-upload.js';
import { createAircraftType } from './support/fleet-fixtures.js';
import { ADMIN } from './support/lineup-fixtures.js';
import { bearer, demoEmail, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

// Every route only an admin may call and that changes something must leave an audit entry naming who did
// what, with the record before and after. The routes come from the document the app serves, so a new
// admin write without a case below fails here, and so does a case whose route leaves no entry.

const WRITE_METHODS = ['post', 'put', 'patch', 'delete'];
const ADMIN_ONLY = `Only ${ROLE_LABELS.admin} may call it.`;

/** What the entry holds of the record: a new one (after only), a changed one (both), or neither. */
type Shape = 'created' | 'changed' | 'removed' | 'no record';

interface AuditCase {
  action: AuditAction;
  shape: Shape;
  /** A request that really changes a field (the role matrix's own example otherwise). */
  example?: (context: MatrixContext) => RouteExample | Promise<RouteExample>;
  /** Puts back what `example` changed, for the specs that run after this one. */
  undo?: (token: string, url: string) => Promise<unknown>;
}

const elevatorCycle = (cycleS: number) => ({
  deckSpots: demoDeckSpots,
  ...demoDeckLayout,
  elevators: demoDeckLayout.elevators.map((elevator, index) => (index === 0 ? { ...elevator, cycleS } : elevator)),
});

const CASES: Record<string, AuditCase> = {
  'POST /api/users': { action: 'person.created', shape: 'created' },
  'PATCH /api/users/{id}': { action: 'person.updated', shape: 'changed' },
  // A removed person stays on record, blocked: the entry says what that changed.
  'DELETE /api/users/{id}': { action: 'person.removed', shape: 'changed' },
  // Sending a link changes no field of the person: who and what only.
  'POST /api/users/{id}/invitation': { action: 'person.invited', shape: 'no record' },
  'POST /api/squadrons': { action: 'squadron.created', shape: 'created' },
  'PATCH /api/squadrons/{id}': { action: 'squadron.updated', shape: 'changed' },
  'DELETE /api/squadrons/{id}': { action: 'squadron.deleted', shape: 'removed' },
  'POST /api/aircraft': { action: 'aircraft.created', shape: 'created' },
  'PATCH /api/aircraft/{id}': { action: 'aircraft.updated', shape: 'changed' },
  'DELETE /api/aircraft/{id}': { action: 'aircraft.deleted', shape: 'removed' },
  'POST /api/aircraft-types': { action: 'aircraft_type.created', shape: 'created' },
  'PATCH /api/aircraft-types/{id}': { action: 'aircraft_type.updated', shape: 'changed' },
  'DELETE /api/aircraft-types/{id}': { action: 'aircraft_type.deleted', shape: 'removed' },
  'PUT /api/aircraft-types/{id}/launch-table': {
    action: 'launch_table.replaced',
    shape: 'changed',
    example: () => ({
      body: {
        rows: [
          { grossWeightLb: 26_000, minLaunchAirspeedKt: 119 },
          { grossWeightLb: 41_000, minLaunchAirspeedKt: 139 },
        ],
      },
    }),
  },
  'PUT /api/aircraft-types/{id}/stores-catalogue': { action: 'stores_catalogue.replaced', shape: 'changed' },
  'PUT /api/aircraft-types/{id}/setting-tables': { action: 'setting_tables.replaced', shape: 'changed' },
  'POST /api/aircraft-types/{id}/launch-table/imports/{uploadId}/confirm': {
    action: 'launch_table.replaced',
    shape: 'changed',
    example: async ({ baseUrl, tokenOf }) => {
      const type = await createAircraftType(baseUrl, tokenOf('admin'));
      const preview = await uploadCsv(
        baseUrl,
        tokenOf('admin'),
        `/api/aircraft-types/${type.id}/launch-table/preview`,
        {
          content: 'gross_weight_lb,min_launch_airspeed_kt\n26000,117\n41000,137\n',
        },
      ).expect(200);
      return { params: { id: type.id, uploadId: preview.body.uploadId as number } };
    },
  },
  'PATCH /api/ships/{shipId}': {
    action: 'ship.updated',
    shape: 'changed',
    example: () => ({ params: { shipId: 1 }, body: { pairGapS: demoShip.pairGapS + 1 } }),
    undo: (token, url) =>
      request(url).patch('/api/ships/1').set(bearer(token)).send({ pairGapS: demoShip.pairGapS }).expect(200),
  },
  'PUT /api/ships/{shipId}/deck-layout': {
    action: 'deck_layout.replaced',
    shape: 'changed',
    example: () => ({ params: { shipId: 1 }, body: elevatorCycle(demoDeckLayout.elevators[0].cycleS + 5) }),
    undo: (token, url) =>
      request(url)
        .put('/api/ships/1/deck-layout')
        .set(bearer(token))
        .send(elevatorCycle(demoDeckLayout.elevators[0].cycleS))
        .expect(200),
  },
  'PATCH /api/ships/{shipId}/catapults/{catapultId}': {
    action: 'catapult.updated',
    shape: 'changed',
    example: () => ({
      params: { shipId: 1, catapultId: 1 },
      body: { resetIntervalS: demoCatapults[0].resetIntervalS + 1 },
    }),
    undo: (token, url) =>
      request(url)
        .patch('/api/ships/1/catapults/1')
        .set(bearer(token))
        .send({ resetIntervalS: demoCatapults[0].resetIntervalS })
        .expect(200),
  },
};

/** Admin writes that change no data of the ship, and why they leave no entry. */
const NOT_AUDITED: Record<string, string> = {
  // It only holds the file for a confirm, which is audited; an unconfirmed upload expires.
  'POST /api/aircraft-types/{id}/launch-table/preview': 'a preview changes nothing',
};

const key = (method: string, path: string) => `${method.toUpperCase()} ${path}`;

function fillPath(path: string, params: Record<string, string | number> = {}): string {
  return path.replace(/\{(\w+)\}/g, (_placeholder, name: string) => encodeURIComponent(String(params[name])));
}

const isRecord = (value: unknown) => typeof value === 'object' && value !== null && Object.keys(value).length > 0;

describe('audit of every admin write', () => {
  let app: INestApplication;
  let url: string;
  let adminWrites: string[];
  const tokens = new Map<Role, string>();

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    for (const role of ROLES) tokens.set(role, await signIn(url, demoEmail(role)));
    const document = (await request(url).get('/api/docs-json').expect(200)).body as OpenAPIObject;
    adminWrites = Object.entries(document.paths).flatMap(([path, operations]) =>
      Object.entries(operations as Record<string, { description?: string }>)
        .filter(([method, operation]) => WRITE_METHODS.includes(method) && operation.description?.endsWith(ADMIN_ONLY))
        .map(([method]) => key(method, path)),
    );
  });

  afterAll(async () => {
    await app.close();
  });

  const admin = () => tokens.get('admin')!;

  /** The route called as the admin with the example. */
  function send(route: string, example: RouteExample): Promise<request.Response> {
    const [method, path] = route.split(' ');
    const verb = method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
    const agent = request(url);
    const call = agent[verb](fillPath(path, example.params))
      .set(example.headers ?? {})
      .set(bearer(admin()));
    return example.body === undefined ? call : call.send(example.body);
  }

  /** The role matrix's example of the route, built for an admin allowed to run it. */
  function matrixExample(route: string, build?: AuditCase['example']): Promise<RouteExample> | RouteExample {
    const row = matrixRoutes.find((candidate) => key(candidate.method, candidate.path) === route)!;
    const context: MatrixContext = { baseUrl: url, caller: 'admin', allowed: true, tokenOf: (of) => tokens.get(of)! };
    return (build ?? row.example)?.(context) ?? {};
  }

  /** The newest entry's id, so the entries a call adds are those after it. */
  async function lastEntryId(): Promise<number> {
    const page = (await request(url).get('/api/audit').query({ limit: 1 }).set(bearer(admin())).expect(200))
      .body as Page<AuditEntryView>;
    return page.items[0]?.id ?? 0;
  }

  it('has a case for every admin write the served document lists, and none for a route it lacks', () => {
    const known = [...Object.keys(CASES), ...Object.keys(NOT_AUDITED)];
    expect(adminWrites.length).toBeGreaterThan(10);
    expect(adminWrites.filter((route) => !known.includes(route))).toEqual([]);
    expect(known.filter((route) => !adminWrites.includes(route))).toEqual([]);
  });

  it.each(Object.entries(CASES))('%s leaves an entry of who, what, before and after', async (route, auditCase) => {
    const example = { ...(await matrixExample(route, auditCase.example)) };
    // A case's own example may change only the body of the matrix's target.
    example.params ??= (await matrixExample(route)).params;
    const mark = await lastEntryId();

    try {
      const response = await send(route, example);
      expect(response.status).toBeLessThan(300);

      const page = (
        await request(url).get('/api/audit').query({ action: auditCase.action, limit: 20 }).set(bearer(admin()))
      ).body as Page<AuditEntryView>;
      const added = page.items.filter((entry) => entry.id > mark);
      expect(added).toHaveLength(1);
      const [entry] = added;
      expect(entry).toMatchObject({ actorEmail: ADMIN, actorRole: 'admin', action: auditCase.action });
      const subjects = [...Object.values(example.params ?? {}).map(Number), (response.body as { id?: number }).id];
      expect(subjects).toContain(entry.subjectId);

      const shape = { before: isRecord(entry.before), after: isRecord(entry.after) };
      const expected: Record<Shape, typeof shape> = {
        created: { before: false, after: true },
        changed: { before: true, after: true },
        removed: { before: true, after: false },
        'no record': { before: false, after: false },
      };
      expect(shape).toEqual(expected[auditCase.shape]);
      if (auditCase.shape === 'created' || auditCase.shape === 'no record') expect(entry.before).toBeNull();
      if (auditCase.shape === 'removed' || auditCase.shape === 'no record') expect(entry.after).toBeNull();
      if (auditCase.shape === 'changed') expect(Object.keys(entry.after!)).toEqual(Object.keys(entry.before!));
    } finally {
      await auditCase.undo?.(admin(), url);
    }
  });

  it.each(Object.entries(NOT_AUDITED))('%s leaves no entry: %s', async (route) => {
    const example = await matrixExample(route);
    const mark = await lastEntryId();
    const response = await send(route, example);
    expect(response.status).toBeLessThan(300);
    expect(await lastEntryId()).toBe(mark);
  });
});
