import { CHANGES_PAGE_SIZE, PAGE_SIZE, type Page, type PageSize } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { readChangeLog, versionProblems } from './support/change-log.js';
import { bearer, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

// Demo cycle 1 is closed and flown: its change log holds every change from the first version on.
const FLOWN_CYCLE = 1;

const LISTS: { path: string; size: PageSize }[] = [
  { path: '/api/cycles', size: PAGE_SIZE },
  { path: '/api/users', size: PAGE_SIZE },
  { path: '/api/users/pilots', size: PAGE_SIZE },
  { path: '/api/aircraft', size: PAGE_SIZE },
  { path: '/api/audit', size: PAGE_SIZE },
  { path: `/api/cycles/${FLOWN_CYCLE}/lineup/changes?since=0`, size: CHANGES_PAGE_SIZE },
];

describe('lists that grow answer a page at a time', () => {
  let app: INestApplication;
  let url: string;
  let admin: string;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
    admin = await signIn(url, 'admin@catline.example');
  });

  afterAll(async () => {
    await app.close();
  });

  const read = (path: string, query: string) =>
    request(url)
      .get(`${path}${path.includes('?') ? '&' : '?'}${query}`)
      .set(bearer(admin));
  const page = async (path: string, query = ''): Promise<Page<{ id?: number; version?: number }>> => {
    const response = await read(path, query);
    expect(response.status).toBe(200);
    return response.body;
  };
  const key = (row: { id?: number; version?: number }) => row.id ?? row.version;

  it.each(LISTS)(
    '$path: the default page, then pages that follow on without gap or overlap',
    async ({ path, size }) => {
      const first = await page(path);
      expect(first).toMatchObject({ limit: size.default, offset: 0 });
      expect(first.items.length).toBe(Math.min(size.default, first.total));
      expect(first.total).toBeGreaterThanOrEqual(3);

      const [one, two, three] = [
        await page(path, 'limit=1'),
        await page(path, 'limit=1&offset=1'),
        await page(path, 'limit=2&offset=1'),
      ];
      expect(one.items.map(key)).toEqual([key(first.items[0])]);
      expect(three.items.map(key)).toEqual([key(two.items[0]), key(first.items[2])]);
      expect(await page(path, `offset=${first.total}`)).toMatchObject({ items: [], total: first.total });
      expect((await page(path, `limit=${size.max}`)).items.length).toBe(Math.min(size.max, first.total));
    },
  );

  it.each(LISTS)('$path: refuses a limit or offset out of range with a sentence', async ({ path, size }) => {
    for (const limit of ['0', String(size.max + 1), 'many', '1.5']) {
      const response = await read(path, `limit=${limit}`);
      expect(response.status).toBe(400);
      expect(response.body.message).toContain(`limit must be a whole number from 1 to ${size.max}`);
    }
    const response = await read(path, 'offset=-1');
    expect(response.status).toBe(400);
    expect(response.body.message).toContain('offset must be a whole number from 0');
  });

  it('catches up on a change log longer than a page, page after page from the last version read', async () => {
    const whole = await page(`/api/cycles/${FLOWN_CYCLE}/lineup/changes?since=0`, `limit=${CHANGES_PAGE_SIZE.max}`);
    expect(whole.total).toBeGreaterThan(6);
    const log = await readChangeLog(url, admin, FLOWN_CYCLE, { limit: 3 });
    expect(log.map((change) => change.version)).toEqual(whole.items.map(key));
    expect(versionProblems(log)).toEqual([]);
  });
});
