import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import {
  type AuditEntryView,
  type Page as ApiPage,
  type ShipView,
  type SquadronView,
  shipIsoTime,
  shipTimeZone,
} from '@catline/contracts';
import { parse } from 'csv-parse/sync';
import { apiAs } from './support/demo-api.js';
import { openAs } from './support/screens.js';

// The admin's Audit screen narrows the trail by day (on the ship's clock) and action, and the CSV it
// exports holds exactly the entries the screen's filter matches.

const DAY_MS = 86_400_000;

/** The rows of the CSV the screen's Export button downloads, by column name. */
async function exportedRows(page: Page): Promise<AuditCsvRow[]> {
  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Export CSV' }).click();
  const file = await (await download).path();
  // The caution lines (# …) open every Catline CSV; the table starts after them.
  const text = (await readFile(file, 'utf8'))
    .replace(/^\uFEFF/, '')
    .split('\r\n')
    .filter((line) => !line.startsWith('# '))
    .join('\r\n');
  return parse(text, { columns: true, skip_empty_lines: true }) as AuditCsvRow[];
}

interface AuditCsvRow {
  id: string;
  at: string;
  action: string;
  'subject id': string;
  'ship id': string;
}

test('the admin filters the audit trail by day and action and exports the same entries as CSV', async ({ browser }) => {
  const api = await apiAs('admin');
  const [ship] = (await (await api.get('/api/ships')).json()) as ShipView[];
  const zone = shipTimeZone(ship.profile);
  const tag = String(Date.now() % 100_000);
  const created = await api.post('/api/squadrons', {
    data: { name: `Audit Wing ${tag}`, code: `AW-${tag}`, email: `aw${tag}@catline.example` },
  });
  expect(created.status()).toBe(201);
  const squadron = (await created.json()) as SquadronView;
  const today = shipIsoTime(new Date(), zone).slice(0, 10);
  const yesterday = shipIsoTime(new Date(Date.now() - DAY_MS), zone).slice(0, 10);

  const page = await openAs(browser, 'admin', '/audit');
  const entries = page.getByTestId('audit-entry');
  await expect(entries.first()).toBeVisible();

  await page.getByLabel('Action').selectOption('squadron.created');
  await page.getByLabel('From day').fill(yesterday);
  await page.getByLabel('To day (included)').fill(yesterday);
  await expect(page.getByText('No entries match.')).toBeVisible();

  await page.getByLabel('From day').fill(today);
  await expect(page.getByLabel('To day (included)')).toHaveValue(yesterday);
  await expect(page.getByText('The range ends before it starts')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Export CSV' })).toHaveCount(0);

  await page.getByLabel('To day (included)').fill(today);
  await expect(entries.filter({ hasText: `Squadron AW-${tag}` })).toHaveCount(1);
  const shown = await entries.count();
  for (let row = 0; row < shown; row += 1) await expect(entries.nth(row)).toContainText('squadron.created');

  const rows = await exportedRows(page);

  // What the filter must hold, asked of the API without the days: the entries whose day on the ship's clock is today.
  const all = (await (
    await api.get('/api/audit', { params: { action: 'squadron.created', limit: 200 } })
  ).json()) as ApiPage<AuditEntryView>;
  const matching = all.items.filter((entry) => shipIsoTime(entry.at, zone).startsWith(today));
  expect(rows.map((row) => Number(row.id))).toEqual(matching.map((entry) => entry.id));
  expect(rows.length).toBeGreaterThanOrEqual(shown);
  expect(rows.every((row) => row.action === 'squadron.created')).toBe(true);
  expect(rows.every((row) => row.at.startsWith(today))).toBe(true);
  expect(rows.map((row) => Number(row['subject id']))).toContain(squadron.id);
  await api.dispose();
});

test("a fleet admin narrows the trail to one ship, and the CSV holds that ship's entries only", async ({ browser }) => {
  const fleetApi = await apiAs('fleet');
  const [first, second] = (await (await fleetApi.get('/api/ships')).json()) as ShipView[];
  const tag = String(Date.now() % 100_000);
  for (const ship of [first, second]) {
    const created = await fleetApi.post('/api/squadrons', {
      data: {
        shipId: ship.id,
        name: `Ship ${ship.id} Wing`,
        code: `S${ship.id}-${tag}`,
        email: `s${tag}@catline.example`,
      },
    });
    expect(created.status()).toBe(201);
  }

  const page = await openAs(browser, 'fleet', '/audit');
  await page.getByLabel('Action').selectOption('squadron.created');
  await page.getByLabel('Ship').selectOption({ label: `${second.name} (${second.hullCode})` });
  const entries = page.getByTestId('audit-entry');
  await expect(entries.filter({ hasText: `S${second.id}-${tag}` })).toHaveCount(1);
  await expect(entries.filter({ hasText: `S${first.id}-${tag}` })).toHaveCount(0);

  const rows = await exportedRows(page);
  expect(rows.length).toBeGreaterThan(0);
  expect(rows.every((row) => row['ship id'] === String(second.id) && row.action === 'squadron.created')).toBe(true);
  await fleetApi.dispose();
});
