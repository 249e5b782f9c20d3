import type { CycleView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { fleetAdmin, secondShipPeople } from '../src/database/seeds/demo-second-ship.js';
import { LineupDriver, OBSERVER } from './support/lineup-fixtures.js';
import { type ClientSocket, connected, eventually, openSocket } from './support/socket-client.js';
import { startTestApp } from './support/test-app.js';

const OTHER_OBSERVER = secondShipPeople.find((person) => person.role === 'observer')!.email;

// Lists and pickers of cycles follow a cycle's status without joining it: 'cycle:status' goes to every
// socket of the cycle's ship and to the fleet admins, never to another ship's people.
describe("cycle:status to the ship's sockets", () => {
  let app: INestApplication;
  let deck: LineupDriver;
  const sockets: ClientSocket[] = [];

  beforeAll(async () => {
    let url: string;
    ({ app, url } = await startTestApp());
    deck = new LineupDriver(url);
  });

  afterAll(async () => {
    for (const socket of sockets) socket.disconnect();
    await deck.stopLaunching((await deck.demoShip()).id);
    await app.close();
  });

  /** A socket of the person, joined to no cycle, keeping every cycle status it is sent. */
  const statusesOf = async (email: string): Promise<CycleView[]> => {
    const origin = app.get(ConfigService).get<string>('WEB_ORIGINS')!.split(',')[0].trim();
    const socket = openSocket(deck.url, { token: await deck.token(email), origin });
    sockets.push(socket);
    const received: CycleView[] = [];
    socket.on('cycle:status', (cycle) => received.push(cycle));
    await connected(socket);
    return received;
  };

  it('sends a started and a stopped cycle to its ship and the fleet admin, and nothing to the other ship', async () => {
    const cycle = await deck.createCycle();
    const ownShip = await statusesOf(OBSERVER);
    const fleet = await statusesOf(fleetAdmin.email);
    const otherShip = await statusesOf(OTHER_OBSERVER);

    await deck.start(cycle.id);
    const states = (received: CycleView[]) => received.filter((seen) => seen.id === cycle.id).map((seen) => seen.state);
    await eventually(() => states(ownShip).includes('executing'), 5_000, "the own ship's status");
    await eventually(() => states(fleet).includes('executing'), 5_000, "the fleet admin's status");

    await deck.stopLaunching(cycle.shipId);
    await eventually(() => states(ownShip).at(-1) === 'planning', 5_000, 'the stop');
    expect(states(otherShip)).toEqual([]);
  });
});
