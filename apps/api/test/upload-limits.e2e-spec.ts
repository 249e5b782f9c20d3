import type { AirPlanPreview, CycleView } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { DataSource } from 'typeorm';
import { uploadCsv } from './support/csv-upload.js';
import { AIR_OPS, LineupDriver } from './support/lineup-fixtures.js';
import { startTestApp } from './support/test-app.js';

const HEADER = 'side_number,pilot_email,mission,fuel_lb,stores,gross_weight_lb,tanker,early_warning,spare';

/** A header line of `count` unknown one-letter columns, as the probe sent: `x,x,x,…`, two bytes a column. */
const wideHeader = (count: number) => `${Array.from({ length: count }, () => 'x').join(',')}\n`;

describe('upload limits', () => {
  let app: INestApplication;
  let url: string;
  let driver: LineupDriver;
  let airOps: string;
  let database: DataSource;
  let cycle: CycleView;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    driver = new LineupDriver(url);
    airOps = await driver.token(AIR_OPS);
    database = app.get(DataSource);
    cycle = await driver.createCycle();
  });

  afterAll(async () => {
    await app.close();
  });

  const preview = (content: string) => uploadCsv(url, airOps, `/api/cycles/${cycle.id}/air-plan/preview`, { content });
  const storedBytes = async () => {
    const [row] = await database.query<{ bytes: string | null }[]>(
      'SELECT MAX(LENGTH(problems) + COALESCE(LENGTH(parsed_rows), 0)) AS bytes FROM uploads WHERE cycle_id = ?',
      [cycle.id],
    );
    return Number(row.bytes ?? 0);
  };

  it.each([
    ['120 KB with 60,000 unknown columns', 60_000],
    ['240 KB with 120,000 unknown columns', 120_000],
  ])(
    'refuses a header of %s with a short 400, before reading the lines, and stores no large row',
    async (_what, columns) => {
      const content = wideHeader(columns);
      const response = await preview(content);
      expect(response.status).toBe(400);
      expect(response.body.code).toBe('header_too_wide');
      expect(response.body.message).toMatch(/header line has \d+ columns; the air plan layout has 9/);
      expect(JSON.stringify(response.body).length).toBeLessThan(2_000);
      expect(await storedBytes()).toBeLessThan(4_000);
    },
  );

  it('answers and keeps the first 100 problems and the count of all of them', async () => {
    // 200 lines, each with a fuel figure in words and a flag that is neither yes nor no: 400 problems.
    const lines = Array.from({ length: 200 }, (_, i) => `ZZ${i},,Strike,lots,,45000,maybe,no,no`);
    const response = await preview([HEADER, ...lines].join('\n'));
    expect(response.status).toBe(200);
    const body = response.body as AirPlanPreview;
    expect(body.result).toBe('rejected');
    expect(body.problemCount).toBe(400);
    expect(body.problems).toHaveLength(100);
    expect(body.problems[0].row).toBe(2);
    expect(await storedBytes()).toBeLessThan(60_000);
  });

  it('cuts a long cell in a problem to 100 characters', async () => {
    const long = 'M'.repeat(50_000);
    const response = await preview([HEADER, `ZZ1,,${long},1000,,45000,no,no,no`].join('\n'));
    expect(response.status).toBe(200);
    const problem = (response.body as AirPlanPreview).problems.find((candidate) => candidate.column === 'mission');
    expect(problem?.value).toBe(`${'M'.repeat(100)}…`);
    expect(JSON.stringify(response.body).length).toBeLessThan(5_000);
  });

  it('forgets rejected uploads after a day, and keeps accepted and imported ones', async () => {
    await preview([HEADER, 'ZZ9,,Strike,lots,,45000,no,no,no'].join('\n'));
    await database.query('UPDATE uploads SET uploaded_at = uploaded_at - INTERVAL 2 DAY WHERE cycle_id = ?', [
      cycle.id,
    ]);
    const kept = await database.query<{ n: string }[]>(
      "SELECT COUNT(*) AS n FROM uploads WHERE cycle_id = ? AND result <> 'rejected'",
      [cycle.id],
    );

    await preview([HEADER, 'ZZ10,,Strike,lots,,45000,no,no,no'].join('\n'));

    const rows = await database.query<{ result: string; old: number }[]>(
      'SELECT result, uploaded_at < NOW(3) - INTERVAL 1 DAY AS old FROM uploads WHERE cycle_id = ?',
      [cycle.id],
    );
    expect(rows.filter((row) => row.result === 'rejected' && Number(row.old) === 1)).toEqual([]);
    expect(rows.filter((row) => row.result === 'rejected')).toHaveLength(1);
    expect(rows.filter((row) => row.result !== 'rejected')).toHaveLength(Number(kept[0].n));
  });
});
