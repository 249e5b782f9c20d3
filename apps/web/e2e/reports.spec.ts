import { readFile } from 'node:fs/promises';
import { expect, test, type Page } from '@playwright/test';
import {
  LAUNCH_CAUTION,
  type CycleReplay,
  type CycleReport,
  type CycleView,
  type LineupSnapshot,
  type ShotCounts,
} from '@catline/contracts';
import { allOf, apiAs } from './support/demo-api.js';
import { expectNoSidewaysOverflow, openAs } from './support/screens.js';

// The seeded demo day: cycle 1 was flown and closed three hours ago, cycle 2 is planned with a lineup.
async function demo() {
  const observer = await apiAs('observer');
  const cycles = await allOf<CycleView>(observer, '/api/cycles');
  const flown = cycles.find((cycle) => cycle.number === 1 && cycle.state === 'closed')!;
  const planned = cycles.find((cycle) => cycle.number === 2)!;
  const report = (await (await observer.get(`/api/cycles/${flown.id}/report`)).json()) as CycleReport;
  const replay = (await (await observer.get(`/api/cycles/${flown.id}/replay`)).json()) as CycleReplay;
  const lineup = (await (await observer.get(`/api/cycles/${planned.id}/lineup`)).json()) as LineupSnapshot;
  await observer.dispose();
  return { flown, planned, report, replay, lineup };
}

/** The launches table as text: side, catapult, planned and launched cells of every row. */
async function tableRows(page: Page) {
  const table = page.getByRole('table', { name: 'Launches, planned against actual' });
  await expect(table).toBeVisible();
  return table.locator('tbody tr').evaluateAll((rows) =>
    rows.map((row) => {
      const cells = [...row.querySelectorAll('td')].map((cell) => cell.textContent?.trim() ?? '');
      return { cat: cells[0], side: cells[1], planned: cells[4], launched: cells[5] };
    }),
  );
}

const marks = (page: Page, kind: 'launch-mark' | 'planned-mark') =>
  page
    .locator(`[data-testid="${kind}"]`)
    .evaluateAll((nodes) => nodes.map((node) => node.getAttribute('aria-label') ?? ''));

test('the report of the flown cycle draws the same launches in its chart as its table lists', async ({ browser }) => {
  const { flown, report } = await demo();
  const page = await openAs(browser, 'observer', `/reports?cycle=${flown.id}`);
  await expect(page.getByTestId('launch-timeline')).toBeVisible();
  await expect(page.getByTestId('report-totals')).toContainText(
    `${report.totals.launched} of ${report.totals.aircraft}`,
  );

  const rows = await tableRows(page);
  const launchedRows = rows.filter((row) => row.launched !== '—');
  const plannedRows = rows.filter((row) => row.planned !== '—');
  expect(launchedRows).toHaveLength(report.totals.launched);
  // Each dot says which aircraft left which catapult when: the same words the table's row gives.
  expect((await marks(page, 'launch-mark')).sort()).toEqual(
    launchedRows.map((row) => `${row.side} launched ${row.launched} on cat ${row.cat}`).sort(),
  );
  expect((await marks(page, 'planned-mark')).sort()).toEqual(
    plannedRows.map((row) => `${row.side} planned ${row.planned} on cat ${row.cat}`).sort(),
  );

  // The chart is named and described for people who cannot see it.
  const figure = page.getByTestId('launch-timeline');
  await expect(figure.locator('figcaption')).toHaveText(
    `Cycle ${flown.number}: planned and actual launch times per catapult`,
  );
  await expect(page.getByTestId('timeline-summary')).toContainText('Cat 1: 3 of 3 launched');
  const surface = figure.locator('.recharts-wrapper > svg.recharts-surface');
  await expect(surface.locator(':scope > title')).toHaveText(
    `Cycle ${flown.number}: planned and actual launch times per catapult`,
  );
  await expect(surface.locator(':scope > desc')).toHaveText(await page.getByTestId('timeline-summary').innerText());

  await expect(page.getByRole('region', { name: 'Suspends', exact: true })).toContainText('Launch bar not seated');
  await expect(page.getByRole('region', { name: 'Down aircraft and spares', exact: true })).toContainText('C24 (CWR)');
  await expect(page.getByRole('region', { name: 'Down aircraft and spares', exact: true })).toContainText('C31 (CWR)');
  await expectNoSidewaysOverflow(page);
  await page.screenshot({ path: 'test-results/reports/report-1366x768.png', fullPage: true });

  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Slots (CSV)' }).click(),
  ]);
  expect(download.suggestedFilename()).toBe(`cycle-${flown.number}-slots.csv`);
  const csv = await readFile((await download.path())!, 'utf8');
  const [caution, header, ...csvRows] = csv
    .replace(/^\uFEFF/, '')
    .split('\r\n')
    .filter(Boolean);
  expect(caution).toBe(`# ${LAUNCH_CAUTION}`);
  expect(header).toMatch(/^slot_id,side_number,type,squadron,/);
  expect(csvRows).toHaveLength(flown.slotCount);
  await page.context().close();

  const phone = await openAs(browser, 'pilot', `/reports?cycle=${flown.id}`, { width: 390, height: 844 });
  await expect(phone.getByTestId('launch-timeline')).toBeVisible();
  expect(await marks(phone, 'launch-mark')).toHaveLength(report.totals.launched);
  await expectNoSidewaysOverflow(phone);
  await phone.screenshot({ path: 'test-results/reports/report-390x844.png', fullPage: true });
  await phone.context().close();
});

test('the replay steps through the change log with the slider, the buttons and the keys', async ({ browser }) => {
  const { flown, replay } = await demo();
  const total = replay.changes.length;
  const page = await openAs(browser, 'handler', `/reports/replay?cycle=${flown.id}`);
  const current = page.getByTestId('replay-change');
  await expect(current).toContainText(`Change ${total} of ${total}`);
  await expect(page.getByTestId('caution-line')).toBeVisible();
  await page.screenshot({ path: 'test-results/reports/replay-end-1366x768.png', fullPage: true });

  await page.keyboard.press('Home');
  await expect(current).toContainText(`Start · change 0 of ${total}`);
  await expect(page.getByTestId('replay-slot')).toHaveCount(0);
  await page.keyboard.press('ArrowRight');
  const first = replay.changes[0];
  await expect(current).toContainText(`Change 1 of ${total}`);
  await expect(current).toContainText(first.summary);
  await expect(current).toContainText(first.actor.name);
  await expect(page.getByTestId('replay-slot')).toHaveCount(1);

  // The step that marked C24 down: C24 leaves cat 3 and the spare C31 takes its place.
  const down = replay.changes.findIndex((change) => change.kind === 'aircraft_down') + 1;
  const cat3 = page.getByTestId('replay-lane').nth(2);
  await page.getByRole('slider', { name: 'Step through the change log' }).fill(String(down - 1));
  await expect(current).toContainText(`Change ${down - 1} of ${total}`);
  await expect(cat3.locator('[data-side-number="C24"]')).toBeVisible();
  await page.getByRole('button', { name: 'Next', exact: true }).click();
  await expect(current).toContainText(replay.changes[down - 1].summary);
  await expect(cat3.locator('[data-side-number="C24"]')).toHaveCount(0);
  await expect(cat3.locator('[data-side-number="C31"]')).toHaveAttribute('data-changed', '');
  await expect(page.getByTestId('replay-out')).toContainText('C24 (down)');
  await page.screenshot({ path: 'test-results/reports/replay-down-1366x768.png', fullPage: true });

  await page.getByRole('button', { name: 'Previous', exact: true }).click();
  await expect(current).toContainText(`Change ${down - 1} of ${total}`);
  await page.keyboard.press('End');
  await expect(current).toContainText(`Change ${total} of ${total}`);
  await expect(
    page.locator('[data-testid="replay-slot"] [data-testid="slot-status"]', { hasText: 'Launched' }),
  ).toHaveCount(9);
  await page.getByRole('button', { name: new RegExp(`^${replay.changes[2].version} ·`) }).click();
  await expect(current).toContainText(`Change 3 of ${total}`);
  await expectNoSidewaysOverflow(page);
  await page.context().close();

  const tablet = await openAs(browser, 'observer', `/reports/replay?cycle=${flown.id}`, { width: 1024, height: 768 });
  await expect(tablet.getByTestId('replay-change')).toContainText(`Change ${total} of ${total}`);
  await expectNoSidewaysOverflow(tablet);
  await tablet.screenshot({ path: 'test-results/reports/replay-1024x768.png', fullPage: true });
  await tablet.context().close();
});

test('the launch sheet lists every lane in order with its figures and prints without the app around it', async ({
  browser,
}) => {
  const { planned, lineup } = await demo();
  const page = await openAs(browser, 'airops', `/reports/launch-sheet?cycle=${planned.id}`);
  const sheet = page.getByTestId('launch-sheet');
  await expect(sheet).toBeVisible();
  await expect(sheet.getByTestId('caution-line')).toBeVisible();
  await expect(sheet.getByTestId('sheet-lane')).toHaveCount(lineup.lanes.length);
  for (const [index, lane] of lineup.lanes.entries()) {
    const sides = lane.slotIds.map((id) => lineup.slots.find((slot) => slot.id === id)!.sideNumber);
    await expect(sheet.getByTestId('sheet-lane').nth(index).getByTestId('sheet-row')).toHaveCount(sides.length);
    for (const [place, side] of sides.entries()) {
      await expect(sheet.getByTestId('sheet-lane').nth(index).getByTestId('sheet-row').nth(place)).toHaveAttribute(
        'data-side-number',
        side,
      );
    }
  }
  const first = lineup.slots.find((slot) => slot.id === lineup.lanes[0].slotIds[0])!;
  const row = sheet.locator(`[data-testid="sheet-row"][data-side-number="${first.sideNumber}"]`);
  await expect(row).toContainText(`${first.grossWeightLb.toLocaleString('en-GB')} lb`);
  await expect(row).toContainText(String(first.figures!.catapultSetting));
  await expect(row).toContainText(first.figures!.go ? 'GO' : 'NO-GO');
  await page.screenshot({ path: 'test-results/reports/launch-sheet-screen-1366x768.png', fullPage: true });

  await page.emulateMedia({ media: 'print' });
  // The printable width of each paper at 96 px per inch, less the sheet's 12 mm margins.
  for (const paper of [
    { name: 'a4', width: 703, height: 1032 }, // 210 × 297 mm (ISO 216)
    { name: 'letter', width: 725, height: 965 }, // 8.5 × 11 in (ANSI A)
  ]) {
    await page.setViewportSize({ width: paper.width, height: paper.height });
    await expect(page.locator('#root header')).toBeHidden();
    await expect(page.getByRole('navigation', { name: 'Screens' })).toBeHidden();
    await expect(page.getByRole('button', { name: 'Print' })).toBeHidden();
    await expect(sheet.getByTestId('caution-line')).toBeVisible();
    await expectNoSidewaysOverflow(page);
    await page.screenshot({ path: `test-results/reports/launch-sheet-print-${paper.name}.png`, fullPage: true });
  }
  await page.context().close();
});

test('shot counts over a range of days match the API, export as CSV and refuse a backward range', async ({
  browser,
}) => {
  const day = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);
  const range = { from: day(-1), to: day(1) };
  const observer = await apiAs('observer');
  const counts = (await (
    await observer.get(`/api/reports/shot-counts?from=${range.from}&to=${range.to}`)
  ).json()) as ShotCounts;
  await observer.dispose();
  expect(counts.totalLaunches).toBeGreaterThanOrEqual(9);

  const page = await openAs(browser, 'observer', `/reports/shot-counts?from=${range.from}&to=${range.to}`);
  await expect(page.getByText('Launches in range').first()).toBeVisible();
  const perCatapult = page.getByRole('table', { name: 'Shot counts per catapult' });
  for (const [index, catapult] of counts.catapults.entries()) {
    await expect(perCatapult.locator('tbody tr').nth(index).locator('td').nth(2)).toHaveText(String(catapult.launches));
  }
  const busiest = [...counts.airframes].sort((a, b) => b.launches - a.launches)[0];
  await expect(page.getByRole('table', { name: 'Shot counts per airframe' }).locator('tbody tr').first()).toContainText(
    busiest.sideNumber,
  );
  await expectNoSidewaysOverflow(page);
  await page.screenshot({ path: 'test-results/reports/shot-counts-1366x768.png', fullPage: true });

  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Export CSV' }).click(),
  ]);
  expect(download.suggestedFilename()).toBe(`shot-counts-${range.from}-to-${range.to}.csv`);
  const [caution, ...lines] = (await readFile((await download.path())!, 'utf8')).split('\r\n').filter(Boolean);
  expect(caution).toBe(`\uFEFF# ${LAUNCH_CAUTION}`);
  expect(lines).toHaveLength(1 + counts.airframes.length + counts.catapults.length);

  await page.goto(`/reports/shot-counts?from=${range.to}&to=${range.from}`);
  await expect(page.getByRole('alert')).toContainText(
    `The range ends before it starts: to (${range.from}) is earlier than from (${range.to}).`,
  );
  await page.context().close();
});
