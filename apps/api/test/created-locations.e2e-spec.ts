import type { LineupCommandResult } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import type { OpenAPIObject } from '@nestjs/swagger';
import { DocumentedAnswers } from './support/documented-answers.js';
import { aircraftTypeBody, TEST_PASSWORD, unique } from './support/fleet-fixtures.js';
import { AIR_OPS, LineupDriver } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

const ADMIN = 'admin@catline.example';

interface Creation {
  /** Who creates (and then reads what was created). */
  as: string;
  /** The path to post to, and a valid body. */
  request: (deck: LineupDriver) => Promise<{ path: string; body: object }>;
  /** What a GET of the Location answers: the created view, as the creation's body holds it. */
  created: (answer: unknown, body: object) => unknown;
}

const itself = (answer: unknown) => answer;

// One row per operation the document answers 201 for ("POST <path as documented>").
const CREATIONS: Record<string, Creation> = {
  'POST /api/users': {
    as: ADMIN,
    request: async () => {
      const name = unique('located', 14).toLowerCase();
      return {
        path: '/api/users',
        body: { email: `${name}@catline.example`, name: `Test ${name}`, role: 'observer', password: TEST_PASSWORD },
      };
    },
    created: itself,
  },
  'POST /api/squadrons': {
    as: ADMIN,
    request: async () => {
      const code = unique('LQ', 10);
      return { path: '/api/squadrons', body: { name: `Squadron ${code}`, code, email: 'located@catline.example' } };
    },
    created: itself,
  },
  'POST /api/aircraft-types': {
    as: ADMIN,
    request: async () => ({ path: '/api/aircraft-types', body: aircraftTypeBody() }),
    created: itself,
  },
  'POST /api/aircraft': {
    as: ADMIN,
    request: async () => ({
      path: '/api/aircraft',
      body: { sideNumber: unique('L', 8), typeId: 1, squadronId: 1, parkedSpot: 'bow-1' },
    }),
    created: itself,
  },
  'POST /api/cycles': {
    as: AIR_OPS,
    request: async (deck) => ({ path: '/api/cycles', body: await deck.createCycleBody() }),
    created: itself,
  },
  'POST /api/cycles/{cycleId}/slots': {
    as: AIR_OPS,
    request: async (deck) => ({
      path: `/api/cycles/${(await deck.createCycle()).id}/slots`,
      body: {
        aircraftId: await deck.aircraftId('D37'),
        pilotId: null,
        mission: 'Located sortie',
        fuelLb: 9_000,
        stores: '',
        grossWeightLb: 42_000,
        tanker: false,
        earlyWarning: false,
        spare: false,
      },
    }),
    // The command answers the change; the slot it added is the one of the aircraft it names.
    created: (answer, body) =>
      (answer as LineupCommandResult).change.patch.slots!.find(
        (slot) => slot.aircraftId === (body as { aircraftId: number }).aircraftId,
      ),
  },
};

/** The documented path (`/api/cycles/{cycleId}`) an address (`/api/cycles/12`) is an instance of, if any. */
function documentedPathOf(document: OpenAPIObject, address: string): string | undefined {
  return Object.keys(document.paths).find((path) =>
    new RegExp(`^${path.replace(/\./g, '\\.').replace(/\{\w+\}/g, '\\d+')}$`).test(address),
  );
}

describe('every creation names what it created, and the name can be read', () => {
  let app: INestApplication;
  let deck: LineupDriver;
  let document: OpenAPIObject;
  let documented: DocumentedAnswers;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    deck = new LineupDriver(started.url);
    document = (await deck.call(ADMIN, 'get', '/api/docs-json')).body as OpenAPIObject;
    documented = await DocumentedAnswers.of(started.url);
  });

  afterAll(async () => {
    await app.close();
  });

  it('has a row here for each operation the document answers 201 for', () => {
    const documented = Object.entries(document.paths).flatMap(([path, operations]) =>
      Object.entries(operations as Record<string, { responses?: Record<string, unknown> }>)
        .filter(([, operation]) => operation.responses?.['201'])
        .map(([method]) => `${method.toUpperCase()} ${path}`),
    );
    expect(documented.sort()).toEqual(Object.keys(CREATIONS).sort());
  });

  it.each(Object.entries(CREATIONS))(
    '%s: 201, and a GET of its Location answers 200 with it',
    async (operation, creation) => {
      const { path, body } = await creation.request(deck);
      const answer = await deck.call(creation.as, 'post', path, body);
      expect(answer.status).toBe(201);
      expect(documented.problems('POST', operation.split(' ')[1], answer)).toEqual([]);
      const location = answer.headers.location as string;
      expect(documentedPathOf(document, location)).toBeDefined();
      expect(document.paths[documentedPathOf(document, location)!].get).toBeDefined();

      const read = await deck.call(creation.as, 'get', location);
      expect(read.status).toBe(200);
      expect(documented.problems('GET', documentedPathOf(document, location)!, read)).toEqual([]);
      expect(read.body).toEqual(creation.created(answer.body, body));
    },
  );
});
