import type { CycleLanding, CycleView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { createUser, TEST_PASSWORD } from './support/fleet-fixtures.js';
import {
  ADMIN,
  AIR_BOSS,
  catapultOfficer,
  deckEdgeOperator,
  HANDLER,
  LineupDriver,
  OBSERVER,
} from './support/lineup-fixtures.js';
import { signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

// Where each person's screens open without ?cycle=: two cycles of the demo ship, one launching, one planned.
describe('GET /cycles/landing', () => {
  let app: INestApplication;
  let url: string;
  let deck: LineupDriver;
  let launching: CycleView;
  let planned: CycleView;

  beforeAll(async () => {
    const started = await startTestApp();
    app = started.app;
    url = started.url;
    deck = new LineupDriver(url);
    launching = await deck.createCycle();
    planned = await deck.createCycle();
    // An aircraft on catapult 1 in the planned cycle only: its crew still belongs on the launching one.
    const lined = await deck.addSlot(planned.id, 'C21');
    await deck.place(planned.id, lined.id, 1);
    await deck.start(launching.id);
  });

  afterAll(async () => {
    await deck.stopLaunching(launching.shipId);
    await app.close();
  });

  const landingOf = async (token: string) => {
    const response = await deck.callWith(token, 'get', '/api/cycles/landing');
    expect(response.status).toBe(200);
    return (response.body as CycleLanding).cycleId;
  };

  it.each([HANDLER, AIR_BOSS, OBSERVER, catapultOfficer(1), deckEdgeOperator(1)])(
    "lands %s on the ship's launching cycle",
    async (email) => {
      expect(await landingOf(await deck.token(email))).toBe(launching.id);
    },
  );

  it('lands a pilot on the planned cycle holding their only slot, and on the launching one once it holds one too', async () => {
    const person = await createUser(url, await deck.token(ADMIN), 'pilot');
    const token = await signIn(url, person.email, TEST_PASSWORD);
    expect(await landingOf(token)).toBe(launching.id);

    await deck.addSlot(planned.id, 'C22', { pilotEmail: person.email });
    expect(await landingOf(token)).toBe(planned.id);

    await deck.addSlot(launching.id, 'C23', { pilotEmail: person.email });
    expect(await landingOf(token)).toBe(launching.id);
  });

  it('refuses a caller without a token', async () => {
    const response = await deck.callWith('', 'get', '/api/cycles/landing');
    expect(response.status).toBe(401);
  });
});
