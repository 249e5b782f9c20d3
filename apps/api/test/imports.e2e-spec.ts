import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import {
  LAUNCH_CAUTION,
  type AirPlanPreview,
  type AircraftTypeView,
  type CycleView,
  type LaunchTablePreview,
  type LineupCommandResult,
} from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { type CsvFile, uploadCsv } from './support/csv-upload.js';
import { createAircraftType } from './support/fleet-fixtures.js';
import { AIR_OPS, LineupDriver, OBSERVER } from './support/lineup-fixtures.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

const HEADER = 'side_number,pilot_email,mission,fuel_lb,stores,gross_weight_lb,tanker,early_warning,spare';
const csv = (...lines: string[]) => [HEADER, ...lines].join('\n');
const COLUMNS_TEXT =
  'side_number, pilot_email, mission, fuel_lb, stores, gross_weight_lb, tanker, early_warning, spare';
const sha256 = (content: string | Buffer) => createHash('sha256').update(content).digest('hex');

// The first bytes of a PNG image: a NUL among them, as in most binary files.
const PNG = Buffer.from([
  0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00, 0x00, 0x0d, 0x49, 0x48, 0x44, 0x52,
]);

describe('air plan and launch table import', () => {
  let app: INestApplication;
  let url: string;
  let driver: LineupDriver;
  let airOps: string;
  let admin: string;
  let database: DataSource;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    driver = new LineupDriver(url);
    airOps = await driver.token(AIR_OPS);
    admin = await signIn(url, 'admin@catline.example');
    database = app.get(DataSource);
  });

  afterAll(async () => {
    await app.close();
  });

  const preview = (cycleId: number, file: CsvFile) =>
    uploadCsv(url, airOps, `/api/cycles/${cycleId}/air-plan/preview`, file);
  const confirm = (cycleId: number, uploadId: number, basisVersion: number) =>
    driver.call(AIR_OPS, 'post', `/api/cycles/${cycleId}/air-plan/imports/${uploadId}/confirm`, { basisVersion });
  const uploadsOf = (cycleId: number) =>
    database.query<
      {
        file_name: string;
        result: string;
        problem_count: number;
        sha256: string;
        size_bytes: number;
        uploaded_by_id: number;
      }[]
    >(
      'SELECT file_name, result, problem_count, sha256, size_bytes, uploaded_by_id FROM uploads WHERE cycle_id = ? ORDER BY id',
      [cycleId],
    );

  describe('files with problems', () => {
    let cycle: CycleView;
    beforeAll(async () => {
      cycle = await driver.createCycle();
    });

    it.each([
      [
        'a wrong header',
        csv('C21,,Strike training,11500,,45000,no,no,no').replace('side_number', 'side'),
        [
          { row: 1, column: null, value: 'side', reason: `Unknown column "side"; the columns are ${COLUMNS_TEXT}.` },
          {
            row: 1,
            column: 'side_number',
            value: null,
            reason: 'The column side_number is missing from the header line.',
          },
        ],
      ],
      [
        'a missing column',
        'side_number,pilot_email,mission,fuel_lb,stores,tanker,early_warning,spare\nC21,,Strike training,11500,,no,no,no',
        [
          {
            row: 1,
            column: 'gross_weight_lb',
            value: null,
            reason: 'The column gross_weight_lb is missing from the header line.',
          },
        ],
      ],
      [
        'text in a number column',
        csv('C21,,Strike training,a lot,,45000,no,no,no'),
        [{ row: 2, column: 'fuel_lb', value: 'a lot', reason: 'Must be a whole number (digits only), in lb.' }],
      ],
      [
        'an unknown side number',
        csv('C21,,Strike training,11500,,45000,no,no,no', '999,,Strike training,11500,,45000,no,no,no'),
        [{ row: 3, column: 'side_number', value: '999', reason: 'No aircraft has the side number 999.' }],
      ],
      [
        'the same aircraft twice',
        csv(
          'C21,,Strike training,11500,,45000,no,no,no',
          'C22,,Strike training,11500,,45000,no,no,no',
          'C21,,Tanker,15000,,49000,yes,no,no',
        ),
        [
          {
            row: 4,
            column: 'side_number',
            value: 'C21',
            reason: 'C21 is already on line 2; an aircraft flies once in a cycle.',
          },
        ],
      ],
      [
        'a negative weight',
        csv('C21,,Strike training,11500,,-45000,no,no,no'),
        [{ row: 2, column: 'gross_weight_lb', value: '-45000', reason: 'Cannot be negative.' }],
      ],
      [
        'a weight over the type maximum',
        csv('C21,,Strike training,11500,,52000,no,no,no'),
        [
          {
            row: 2,
            column: 'gross_weight_lb',
            value: '52000',
            reason: 'Over the WKD-41 maximum gross weight of 51000 lb.',
          },
        ],
      ],
      [
        'an e-mail nobody signs in with, and one pilot on two aircraft',
        csv(
          'C21,ghost@catline.example,Strike training,11500,,45000,no,no,no',
          'C22,pilot@catline.example,A,1,,45000,no,no,no',
          'C23,PILOT@catline.example,B,1,,45000,no,no,no',
        ),
        [
          {
            row: 2,
            column: 'pilot_email',
            value: 'ghost@catline.example',
            reason: 'Nobody signs in with this e-mail.',
          },
          {
            row: 4,
            column: 'pilot_email',
            value: 'pilot@catline.example',
            reason: 'Kit Marrowby already flies C22 on line 3.',
          },
        ],
      ],
      [
        'a line with a cell too few',
        csv('C21,,Strike training,11500,45000,no,no,no'),
        [{ row: 2, column: null, value: null, reason: 'This line has 8 cells; the header line has 9.' }],
      ],
      [
        'an empty file',
        '',
        [
          {
            row: 1,
            column: null,
            value: null,
            reason: `The file is empty: it needs the header line (${HEADER}) and a line per aircraft.`,
          },
        ],
      ],
    ])('reports %s line by line and keeps it as rejected', async (_name, content, problems) => {
      const response = await preview(cycle.id, { content });
      expect(response.status).toBe(200);
      const body = response.body as AirPlanPreview;
      expect(body.result).toBe('rejected');
      expect(body.problems).toEqual(problems);
      const refused = await confirm(cycle.id, body.uploadId, cycle.version);
      expect(refused.status).toBe(409);
      expect(refused.body.code).toBe('upload_not_importable');
      expect(refused.body.message).toMatch(/problems? in its preview, so nothing of it is imported/);
    });

    it.each([
      [
        'a binary file',
        { content: PNG },
        415,
        'not_csv',
        'The file holds binary data, not CSV text; save the sheet as CSV (UTF-8) and upload that.',
      ],
      [
        'a spreadsheet file',
        { content: 'a,b', fileName: 'plan.xlsx' },
        415,
        'not_csv',
        '"plan.xlsx" is not a .csv file; save the sheet as CSV (UTF-8) and upload that.',
      ],
      [
        'an image type',
        { content: 'a,b', contentType: 'image/png' },
        415,
        'not_csv',
        'The file was sent as image/png, not as CSV text (text/csv).',
      ],
      [
        'text that is not UTF-8',
        { content: Buffer.from(csv('C21,,Café,1,,45000,no,no,no'), 'latin1') },
        415,
        'not_csv',
        'The file is not UTF-8 text; save the sheet as CSV (UTF-8) and upload that.',
      ],
      [
        'a file over the size limit',
        {
          content: csv(
            ...Array.from(
              { length: 5_000 },
              () => 'C21,,Strike training with a long mission name,11500,,45000,no,no,no',
            ),
          ),
        },
        413,
        'file_too_large',
        'The file is larger than 256 KB; nothing was read. Split it or remove what is not needed.',
      ],
    ])('refuses %s', async (_name, file: CsvFile, status, code, message) => {
      const response = await preview(cycle.id, file);
      expect({ status: response.status, code: response.body.code, message: response.body.message }).toEqual({
        status,
        code,
        message,
      });
    });

    it('refuses a request without a file', async () => {
      const response = await request(url)
        .post(`/api/cycles/${cycle.id}/air-plan/preview`)
        .set(bearer(airOps))
        .field('note', 'no file');
      expect(response.status).toBe(400);
      expect(response.body).toMatchObject({
        code: 'file_missing',
        message: 'Attach the CSV file in the form field "file".',
      });
    });

    it('kept every file it read, imported none of them and left the cycle as it was', async () => {
      const kept = await uploadsOf(cycle.id);
      // Ten previews and four files that were not CSV text; the over-size file was never received whole.
      expect(kept).toHaveLength(14);
      expect(kept.every((upload) => upload.result === 'rejected' && upload.problem_count > 0)).toBe(true);
      expect(kept.find((upload) => upload.size_bytes === PNG.length)?.sha256).toBe(sha256(PNG));
      const snapshot = await driver.snapshot(cycle.id);
      expect({ slots: snapshot.slots.length, version: snapshot.version }).toEqual({ slots: 0, version: cycle.version });
    });
  });

  it('imports a file with a byte-order mark and Windows line ends into the deck pool as one change', async () => {
    const cycle = await driver.createCycle();
    const content = `\uFEFF${HEADER}\r\nC21,pilot@catline.example,Strike training,11500,4 practice bombs,45400,no,no,no\r\n\r\nL48,,Airborne early warning,11000,,51900,no,yes,yes\r\n`;
    const response = await preview(cycle.id, {
      content,
      fileName: 'day-plan.csv',
      contentType: 'application/vnd.ms-excel',
    });
    expect(response.status).toBe(200);
    const body = response.body as AirPlanPreview;
    expect(body).toMatchObject({ fileName: 'day-plan.csv', result: 'accepted', problems: [] });
    expect(body.rows).toEqual([
      {
        row: 2,
        sideNumber: 'C21',
        pilotEmail: 'pilot@catline.example',
        mission: 'Strike training',
        fuelLb: 11_500,
        stores: '4 practice bombs',
        grossWeightLb: 45_400,
        tanker: false,
        earlyWarning: false,
        spare: false,
        typeDesignation: 'WKD-41',
        squadronCode: 'CWR',
        pilotName: 'Kit Marrowby',
      },
      {
        row: 4,
        sideNumber: 'L48',
        pilotEmail: null,
        mission: 'Airborne early warning',
        fuelLb: 11_000,
        stores: '',
        grossWeightLb: 51_900,
        tanker: false,
        earlyWarning: true,
        spare: true,
        typeDesignation: 'FGD-63',
        squadronCode: 'LNB',
        pilotName: null,
      },
    ]);

    const imported = await confirm(cycle.id, body.uploadId, cycle.version);
    expect(imported.status).toBe(200);
    const result = imported.body as LineupCommandResult;
    expect(result).toMatchObject({
      version: cycle.version + 1,
      change: {
        kind: 'air_plan_imported',
        summary: 'Air plan day-plan.csv imported: 2 aircraft added to the deck pool',
      },
    });
    const snapshot = await driver.snapshot(cycle.id);
    expect(snapshot.version).toBe(cycle.version + 1);
    expect(snapshot.pool).toHaveLength(2);
    expect(
      snapshot.slots.map(({ sideNumber, pilotName, grossWeightLb, spare, earlyWarning, stores }) => ({
        sideNumber,
        pilotName,
        grossWeightLb,
        spare,
        earlyWarning,
        stores,
      })),
    ).toEqual([
      {
        sideNumber: 'C21',
        pilotName: 'Kit Marrowby',
        grossWeightLb: 45_400,
        spare: false,
        earlyWarning: false,
        stores: '4 practice bombs',
      },
      { sideNumber: 'L48', pilotName: null, grossWeightLb: 51_900, spare: true, earlyWarning: true, stores: '' },
    ]);
    await expect(uploadsOf(cycle.id)).resolves.toEqual([
      expect.objectContaining({ result: 'imported', problem_count: 0, sha256: sha256(content) }),
    ]);

    const again = await confirm(cycle.id, body.uploadId, snapshot.version);
    expect(again.status).toBe(409);
    expect(again.body).toMatchObject({
      code: 'upload_not_importable',
      message: `day-plan.csv (upload ${body.uploadId}) is already imported.`,
    });
  });

  it('refuses a confirm on a stale cycle version and imports nothing', async () => {
    const cycle = await driver.createCycle();
    const { uploadId } = (await preview(cycle.id, { content: csv('C23,,Strike training,11500,,45000,no,no,no') }))
      .body as AirPlanPreview;
    await driver.addSlot(cycle.id, 'C24');
    const refused = await confirm(cycle.id, uploadId, cycle.version);
    expect(refused.status).toBe(409);
    expect(refused.body.code).toBe('stale_basis');
    expect((await driver.snapshot(cycle.id)).slots.map((slot) => slot.sideNumber)).toEqual(['C24']);
  });

  it('checks the lines again at the confirm and imports nothing when one no longer fits', async () => {
    const cycle = await driver.createCycle();
    const { uploadId } = (
      await preview(cycle.id, {
        content: csv('C25,,Strike training,11500,,45000,no,no,no', 'C26,,Strike training,11500,,45000,no,no,no'),
      })
    ).body as AirPlanPreview;
    await driver.addSlot(cycle.id, 'C26');
    const { version } = await driver.snapshot(cycle.id);
    const refused = await confirm(cycle.id, uploadId, version);
    expect(refused.status).toBe(409);
    expect(refused.body).toMatchObject({
      code: 'import_out_of_date',
      details: [`Line 3: C26 is already in cycle ${cycle.number}.`],
    });
    expect((await driver.snapshot(cycle.id)).slots.map((slot) => slot.sideNumber)).toEqual(['C26']);
  });

  it('serves a template that previews clean, and the demo example fits the seeded day cycle', async () => {
    const template = await request(url).get('/api/air-plan/template').set(bearer(airOps));
    expect(template.status).toBe(200);
    expect(template.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(template.headers['content-disposition']).toBe('attachment; filename="air-plan-template.csv"');
    // A byte-order mark first, as in every CSV the API writes, so a spreadsheet opens it as UTF-8; then the
    // launch caution as a # line the import skips.
    expect(template.text.split('\r\n').slice(0, 2)).toEqual([`\uFEFF# ${LAUNCH_CAUTION}`, HEADER]);
    const fresh = await driver.createCycle();
    await expect(
      preview(fresh.id, { content: template.text }).then((response) => response.body.problems),
    ).resolves.toEqual([]);

    const cycles = await driver.all<CycleView>(OBSERVER, '/api/cycles');
    const day = cycles.find((cycle) => cycle.number === 2)!;
    const example = readFileSync(new URL('../src/database/seeds/air-plan-example.csv', import.meta.url));
    const response = await preview(day.id, { content: example, fileName: 'air-plan-example.csv' });
    expect(response.body).toMatchObject({ result: 'accepted', problems: [] });
    expect((response.body as AirPlanPreview).rows).toHaveLength(9);
  });

  describe('launch table', () => {
    let type: AircraftTypeView;
    beforeAll(async () => {
      type = await createAircraftType(url, admin);
    });
    const previewTable = (content: string) =>
      uploadCsv(url, admin, `/api/aircraft-types/${type.id}/launch-table/preview`, { content, fileName: 'table.csv' });
    const confirmTable = (uploadId: number) =>
      request(url).post(`/api/aircraft-types/${type.id}/launch-table/imports/${uploadId}/confirm`).set(bearer(admin));

    it('refuses a table whose weights do not rise, and changes nothing', async () => {
      const response = await previewTable(
        'gross_weight_lb,min_launch_airspeed_kt\r\n25000,115\r\n30000,122\r\n30000,124\r\n',
      );
      expect(response.status).toBe(200);
      expect(response.body as LaunchTablePreview).toMatchObject({
        result: 'rejected',
        problems: [
          {
            row: 4,
            column: 'gross_weight_lb',
            value: '30000',
            reason: 'Must be heavier than line 3 (30000 lb): the weights must rise from line to line.',
          },
        ],
      });
      expect((await confirmTable(response.body.uploadId)).status).toBe(409);
      const unchanged = await request(url).get(`/api/aircraft-types/${type.id}`).set(bearer(admin));
      expect(unchanged.body.launchTable).toEqual(type.launchTable);
    });

    it('replaces the whole table on the confirm of a clean preview', async () => {
      const response = await previewTable(
        'min_launch_airspeed_kt,gross_weight_lb\n112.5,20000\n121,25000\n133,31000\n',
      );
      expect(response.body).toMatchObject({ result: 'accepted', problems: [] });
      const confirmed = await confirmTable(response.body.uploadId);
      expect(confirmed.status).toBe(200);
      const table = [
        { grossWeightLb: 20_000, minLaunchAirspeedKt: 112.5 },
        { grossWeightLb: 25_000, minLaunchAirspeedKt: 121 },
        { grossWeightLb: 31_000, minLaunchAirspeedKt: 133 },
      ];
      expect((confirmed.body as AircraftTypeView).launchTable).toEqual(table);
      const stored = await request(url).get(`/api/aircraft-types/${type.id}`).set(bearer(admin));
      expect(stored.body.launchTable).toEqual(table);
    });
  });
});
