import { expect, test } from '@playwright/test';
import type { CycleView } from '@catline/contracts';
import { allOf, apiAs, launchingCycle } from './support/demo-api.js';
import { axeViolations } from './support/axe.js';
import { card, lane, openAs, pool } from './support/screens.js';

for (const night of [false, true]) {
  test(`the lineup board has no axe violation by ${night ? 'night' : 'day'}`, async ({ browser }) => {
    const cycle = await launchingCycle(night);
    const page = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
    await expect(card(lane(page, 1), 'C21')).toBeVisible();
    await expect(page.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
    expect(await axeViolations(page)).toEqual([]);

    await page.getByRole('button', { name: 'Actions for C22' }).click();
    await expect(page.getByRole('menuitem', { name: 'Mark down…' })).toBeVisible();
    expect(await axeViolations(page), 'with a card menu open').toEqual([]);
    await page.keyboard.press('Escape');
    await page.context().close();
  });
}

test('a draggable card is named by what it shows', async ({ browser }) => {
  const cycle = await launchingCycle(false);
  const page = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  const handle = card(pool(page), 'L47').getByRole('button', { name: /^L47\b/ });
  await expect(handle).toBeVisible();
  await expect(handle).toHaveAccessibleName(/L47.*Planned.*FGD-63.*48,000 lb/);
  await page.context().close();
});

test('an observer’s cards, which cannot be moved, are named by side number, type and status', async ({ browser }) => {
  const cycle = await launchingCycle(false);
  const page = await openAs(browser, 'observer', `/lineup?cycle=${cycle.id}`);
  const inLane = card(lane(page, 1), 'C21');
  await expect(inLane.getByRole('group')).toHaveAccessibleName(/^C21, (?:(?:On cat|Next), )?[\w/-]+, Planned$/);
  await expect(inLane.getByRole('button', { name: /^C21\b/ }), 'nothing to drag').toHaveCount(0);
  await expect(card(pool(page), 'L47').getByRole('group')).toHaveAccessibleName(/^L47, FGD-63, Planned$/);
  await page.context().close();
});

test('launched aircraft on the board keep their badge readable (4.5:1)', async ({ browser }) => {
  // The demo's flown cycle: its aircraft are off, each card with a "Launched" badge.
  const observer = await apiAs('observer');
  const cycles = await allOf<CycleView>(observer, '/api/cycles');
  await observer.dispose();
  const flown = cycles.find((cycle) => cycle.launchedCount > 0)!;
  expect(flown, 'a demo cycle with launched aircraft').toBeDefined();
  const page = await openAs(browser, 'handler', `/lineup?cycle=${flown.id}`);
  const launched = page.locator('[data-testid="slot-card"][data-status="launched"] [data-testid="slot-status"]');
  await expect(launched.first()).toHaveText('Launched');
  // A launched card cannot be moved, so it is no button: it is still named by what it shows.
  const flownCard = page.locator('[data-testid="lane"] [data-testid="slot-card"][data-status="launched"]').first();
  const side = (await flownCard.getAttribute('data-side-number'))!;
  await expect(flownCard.getByRole('group', { name: new RegExp(`^${side}\\b.*Launched$`) })).toBeVisible();
  expect(await axeViolations(page, ['color-contrast'])).toEqual([]);
  await page.context().close();
});

test('the sign-in page logs no error before anyone signs in', async ({ browser }) => {
  const context = await browser.newContext();
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') problems.push(message.text());
  });
  page.on('response', (response) => {
    if (response.status() >= 400) problems.push(`${response.status()} ${response.url()}`);
  });
  await page.goto('/lineup');
  await expect(page).toHaveURL(/\/sign-in/);
  await expect(page.getByLabel('E-mail')).toBeVisible();
  await page.waitForTimeout(1_000);
  expect(problems).toEqual([]);
  expect(await axeViolations(page), 'the sign-in page').toEqual([]);
  await context.close();
});
