import { expect, test, type Page } from '@playwright/test';
import { apiAs, launchingCycle, placeInLane, planCycle } from './support/demo-api.js';
import { card, lane, openAs, pool, signIn } from './support/screens.js';

test('the app installs on a tablet: its manifest, icons and service worker are served as such', async ({ request }) => {
  const manifest = await request.get('/manifest.webmanifest');
  expect(manifest.status()).toBe(200);
  expect(manifest.headers()['content-type']).toContain('application/manifest+json');
  const { icons, start_url, display } = (await manifest.json()) as {
    icons: { src: string; sizes: string; type: string }[];
    start_url: string;
    display: string;
  };
  expect([start_url, display]).toEqual(['/', 'standalone']);
  expect(icons.map((icon) => icon.sizes)).toEqual(expect.arrayContaining(['192x192', '512x512']));
  for (const icon of icons) {
    const served = await request.get(icon.src);
    expect(served.status(), icon.src).toBe(200);
    expect(served.headers()['content-type'], icon.src).toContain(icon.type);
  }
  const worker = await request.get('/sw.js');
  expect(worker.status()).toBe(200);
  expect(worker.headers()['content-type']).toContain('javascript');
  // A new worker must reach the tablets at their next visit, not a day later.
  expect(worker.headers()['cache-control']).toContain('no-cache');
});

test('the service worker keeps the app shell, never an API answer, and reopens the app without the network', async ({
  browser,
}) => {
  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto('/lineup');
  await signIn(page, 'handler');
  await expect(page.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
  expect(await page.evaluate(() => navigator.serviceWorker.ready.then((ready) => ready.active?.state))).toBe(
    'activated',
  );
  // Once the worker controls the page, a visit to a screen loads its lazy chunk through it.
  await page.reload();
  await expect(page.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
  const kept = await page.evaluate(async () => {
    const urls: string[] = [];
    for (const key of await caches.keys()) {
      for (const request of await (await caches.open(key)).keys()) urls.push(new URL(request.url).pathname);
    }
    return urls;
  });
  expect(kept).toContain('/index.html');
  expect(kept.some((path) => path.startsWith('/assets/'))).toBe(true);
  expect(kept.filter((path) => path.startsWith('/api/') || path.startsWith('/socket.io'))).toEqual([]);

  await context.setOffline(true);
  await page.reload();
  await expect(page.getByText('Catline').first()).toBeVisible();
  await context.close();
});

/** Waits until the service worker controls the page and has kept the screen's own chunks (a reload loads them through it). */
async function keepShellOf(page: Page) {
  await page.evaluate(() => navigator.serviceWorker.ready);
  await page.reload();
  // A reload restores the session first (the other tabs are asked for it before the server): slow on a loaded machine.
  await expect(page.getByTestId('live-figures')).toHaveAttribute('data-live', 'true', { timeout: 15_000 });
}

test('a tablet reopened without the network shows its last lineup, not live and inert, and goes live again without a new sign-in', async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const { cycle, slotIds } = await planCycle({
    start: true,
    aircraft: [
      { side: 'D37', grossWeightLb: 42_000 },
      { side: 'C25', grossWeightLb: 43_000 },
    ],
  });
  const api = await apiAs('handler');
  await placeInLane(api, cycle.id, slotIds.get('D37')!, 2);
  await api.dispose();
  const page = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  await keepShellOf(page);
  await expect(card(lane(page, 2), 'D37')).toBeVisible();

  await page.context().setOffline(true);
  await page.reload();
  await expect(page).toHaveURL(new RegExp(`/lineup\\?cycle=${cycle.id}$`));
  await expect(page.getByTestId('lane')).toHaveCount(4, { timeout: 15_000 });
  await expect(card(lane(page, 2), 'D37')).toBeVisible();
  await expect(card(pool(page), 'C25')).toBeVisible();
  await expect(page.getByTestId('live-figures')).toHaveAttribute('data-live', 'false');
  await expect(page.getByTestId('not-live')).toHaveText(/^Not live — last update \d\d:\d\d:\d\d UTC$/);
  await expect(page.getByTestId('caution-line')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Actions for D37' })).toBeDisabled();
  await expect(page.getByRole('button', { name: 'Suggest lineup' })).toBeDisabled();
  await expect(card(pool(page), 'C25').getByRole('button', { name: /^C25\b/ }), 'no drag while not live').toHaveCount(
    0,
  );
  const stored = await page.evaluate(() => Object.entries(localStorage).map(([key, value]) => `${key}=${value}`));
  expect(stored.join('\n'), 'no token kept in the browser').not.toMatch(/eyJ[\w-]+\.[\w-]+\./);

  await page.context().setOffline(false);
  await expect(page.getByTestId('connection-state')).toHaveText('Live', { timeout: 20_000 });
  await expect(page.getByTestId('live-figures')).toHaveAttribute('data-live', 'true');
  await expect(page.getByTestId('not-live')).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Actions for D37' })).toBeEnabled();
  await expect(page).toHaveURL(new RegExp(`/lineup\\?cycle=${cycle.id}$`));
  await page.context().close();
});

test('a session renewal that falls in an outage does not sign out: it is renewed once the network is back', async ({
  browser,
}) => {
  test.setTimeout(90_000);
  const cycle = await launchingCycle();
  // The access token lives 15 minutes and is renewed a minute before: the page's clock is moved on past that.
  const page = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`, undefined, false, (opened) =>
    opened.clock.install(),
  );
  await expect(page.getByTestId('live-figures')).toHaveAttribute('data-live', 'true');
  await page.context().setOffline(true);
  await page.clock.fastForward('15:00');
  await expect(page.getByTestId('connection-state')).toHaveText(/^Offline since/);
  await expect(page).toHaveURL(new RegExp(`/lineup\\?cycle=${cycle.id}$`));

  const renewed = page.waitForResponse((response) => response.url().endsWith('/api/auth/refresh'));
  await page.context().setOffline(false);
  expect((await renewed).status()).toBe(200);
  await expect(page.getByTestId('connection-state')).toHaveText('Live', { timeout: 20_000 });
  await expect(page.getByTestId('live-figures')).toHaveAttribute('data-live', 'true');
  await expect(page).toHaveURL(new RegExp(`/lineup\\?cycle=${cycle.id}$`));
  await page.context().close();
});
