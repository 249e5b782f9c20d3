import type { Page, UploadView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { secondShipPeople } from '../src/database/seeds/demo-second-ship.js';
import { uploadCsv } from './support/csv-upload.js';
import { createAircraftType } from './support/fleet-fixtures.js';
import { ADMIN, AIR_OPS, LineupDriver } from './support/lineup-fixtures.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

const AIR_PLAN_HEADER = 'side_number,pilot_email,mission,fuel_lb,stores,gross_weight_lb,tanker,early_warning,spare';
const GOOD_PLAN = `${AIR_PLAN_HEADER}\nC21,,Strike training,11500,,45000,no,no,no\n`;
const BAD_PLAN = `${AIR_PLAN_HEADER}\nZZ99,,Strike training,11500,,45000,no,no,no\n`;

// Issue 25: uploads are a list that grows with every preview; each target's uploads page like the others.
describe('the uploads of a cycle or an aircraft type, a page at a time', () => {
  let app: INestApplication;
  let url: string;
  let deck: LineupDriver;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    deck = new LineupDriver(url);
  });

  afterAll(async () => {
    await app.close();
  });

  const list = async (token: string, path: string, query = '') => {
    const response = await request(url).get(`${path}${query}`).set(bearer(token));
    return { status: response.status, body: response.body as Page<UploadView> & { code?: string } };
  };

  it("lists a cycle's air plans newest first with their outcome, pages them, and hides them from another ship", async () => {
    const airOps = await signIn(url, AIR_OPS);
    const cycle = await deck.createCycle();
    const preview = (content: string, fileName: string) =>
      uploadCsv(url, airOps, `/api/cycles/${cycle.id}/air-plan/preview`, { content, fileName });
    const elsewhere = await deck.createCycle();
    await uploadCsv(url, airOps, `/api/cycles/${elsewhere.id}/air-plan/preview`, { content: GOOD_PLAN }).expect(200);
    const first = (await preview(GOOD_PLAN, 'first.csv')).body.uploadId as number;
    await preview(BAD_PLAN, 'second.csv').expect(200);
    await preview(GOOD_PLAN, 'third.csv').expect(200);
    await request(url)
      .post(`/api/cycles/${cycle.id}/air-plan/imports/${first}/confirm`)
      .set(bearer(airOps))
      .send({ basisVersion: cycle.version })
      .expect(200);
    const path = `/api/cycles/${cycle.id}/air-plan/imports`;

    const all = await list(airOps, path);
    expect(all.status).toBe(200);
    expect(all.body).toMatchObject({ total: 3, limit: 50, offset: 0 });
    expect(all.body.items.map(({ fileName, result }) => `${fileName} ${result}`)).toEqual([
      'third.csv accepted',
      'second.csv rejected',
      'first.csv imported',
    ]);
    expect(all.body.items[1].problemCount).toBe(1);
    expect(all.body.items[2].importedAt).not.toBeNull();

    const second = await list(airOps, path, '?limit=1&offset=1');
    expect(second.body.items.map((upload) => upload.fileName)).toEqual(['second.csv']);
    const tooMany = await list(airOps, path, '?limit=201');
    expect(tooMany.status).toBe(400);

    const otherShip = secondShipPeople.find((person) => person.role === 'air_operations')!.email;
    const hidden = await list(await signIn(url, otherShip), path);
    expect(hidden.status).toBe(404);
  });

  it("lists an aircraft type's launch tables to the admin of its ship only", async () => {
    const admin = await signIn(url, ADMIN);
    const type = await createAircraftType(url, admin);
    await uploadCsv(url, admin, `/api/aircraft-types/${type.id}/launch-table/preview`, {
      content: 'gross_weight_lb,min_launch_airspeed_kt\n25000,115\n40000,135\n',
      fileName: 'table.csv',
    }).expect(200);
    const path = `/api/aircraft-types/${type.id}/launch-table/imports`;

    const own = await list(admin, path);
    expect(own.body.items.map(({ fileName, result }) => `${fileName} ${result}`)).toEqual(['table.csv accepted']);
    const otherAdmin = secondShipPeople.find((person) => person.role === 'admin')!.email;
    expect((await list(await signIn(url, otherAdmin), path)).status).toBe(404);
  });
});
