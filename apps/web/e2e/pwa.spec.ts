import { expect, test } from '@playwright/test';
import { signIn } from './support/screens.js';

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
