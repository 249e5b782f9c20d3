import { zoneName, type ShipProfile, type ShipView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { parse } from 'csv-parse/sync';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { ADMIN, AIR_OPS, LineupDriver, OBSERVER, launchKey, pilot } from './support/lineup-fixtures.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

// +04:00 all year (IANA tz database, file "asia": "Zone Asia/Dubai ... 4:00 - +04"), so the ship's clock
// is UTC plus four hours, worked here by plain arithmetic rather than by the formatter under test.
const SHIP_ZONE = 'Asia/Dubai';
const FOUR_HOURS_MS = 4 * 3_600_000;
const onBoard = (iso: string) => new Date(Date.parse(iso) + FOUR_HOURS_MS).toISOString();
const clockOnBoard = (iso: string) => onBoard(iso).slice(11, 19);
const isoOnBoard = (iso: string) => `${onBoard(iso).slice(0, 19)}+04:00`;

function readCsv(text: string): Record<string, string>[] {
  const lines = text.replace(/^\uFEFF/, '').split('\r\n');
  // Every Catline CSV opens with the launch caution as a comment line.
  return parse(lines.filter((line) => !line.startsWith('# ')).join('\r\n'), { columns: true });
}

describe("times in the ship's zone, named, in mail and exports", () => {
  let app: INestApplication;
  let url: string;
  let deck: LineupDriver;
  let admin: string;
  let ship: ShipView;

  const setProfile = async (profile: ShipProfile) => {
    const response = await request(url).patch(`/api/ships/${ship.id}`).set(bearer(admin)).send({ profile });
    expect(response.status).toBe(200);
    return response.body as ShipView;
  };

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    deck = new LineupDriver(url);
    admin = await signIn(url, ADMIN);
    ship = (await deck.ok<ShipView[]>(OBSERVER, 'get', '/api/ships'))[0];
    expect(ship.profile.timeZone ?? 'UTC').not.toBe(SHIP_ZONE);
    expect((await setProfile({ ...ship.profile, timeZone: SHIP_ZONE })).profile.timeZone).toBe(SHIP_ZONE);
  });

  afterAll(async () => {
    // The other specs share the demo ship and expect it on its own zone.
    if (ship) await setProfile(ship.profile);
    await app?.close();
  });

  it('refuses a zone Intl does not know, with a message a person understands', async () => {
    const response = await request(url)
      .patch(`/api/ships/${ship.id}`)
      .set(bearer(admin))
      .send({ profile: { ...ship.profile, timeZone: 'Mid/Ocean' } });
    expect(response.status).toBe(400);
    expect(JSON.stringify(response.body)).toContain('timeZone must be a time zone name');
  });

  it("tells the squadron's summary mail and the cycle's CSV exports in the ship's zone, and names it", async () => {
    const pilotEmail = pilot(7);
    const {
      cycle,
      slots: [first],
    } = await deck.executingCycle({ 1: [{ side: 'C21', pilotEmail }] });
    expect(cycle.timeZone).toBe(SHIP_ZONE);
    const ready = await deck.readyToLaunch(cycle.id, first.id, pilotEmail);
    expect((await deck.launch(cycle.id, ready, launchKey())).status).toBe(200);
    const launchedAt = (await deck.slot(cycle.id, first.id)).launchedAt!;
    // The last aircraft off closes the cycle and queues the summaries; close it by hand if it is still open.
    const { cycle: after, version } = await deck.snapshot(cycle.id);
    if (after.state !== 'closed')
      await deck.ok(AIR_OPS, 'post', `/api/cycles/${cycle.id}/close`, { basisVersion: version });

    const zone = zoneName(SHIP_ZONE, launchedAt);
    expect(zone).not.toBe('UTC');
    const [mail] = await app
      .get(DataSource)
      .query<{ body_text: string }[]>('SELECT body_text FROM mail_outbox WHERE dedupe_key LIKE ?', [
        `cycle-summary:${cycle.id}:%`,
      ]);
    expect(mail.body_text).toContain(`launched ${clockOnBoard(launchedAt)} ${zone} from cat 1`);
    expect(mail.body_text).toContain(
      `Planned launch ${onBoard(cycle.plannedLaunchAt).slice(0, 10)} ${clockOnBoard(cycle.plannedLaunchAt).slice(0, 5)} ${zone}`,
    );

    const slots = readCsv((await request(url).get(`/api/cycles/${cycle.id}/slots.csv`).set(bearer(admin))).text);
    expect(slots.find((row) => row.side_number === 'C21')).toMatchObject({
      launched_at: isoOnBoard(launchedAt),
      time_zone: SHIP_ZONE,
    });
    const changes = readCsv((await request(url).get(`/api/cycles/${cycle.id}/changes.csv`).set(bearer(admin))).text);
    const log = (await deck.snapshot(cycle.id)).version;
    expect(changes).toHaveLength(log);
    for (const row of changes) {
      expect(row.at).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\+04:00$/);
      expect(row.time_zone).toBe(SHIP_ZONE);
    }
  });
});
