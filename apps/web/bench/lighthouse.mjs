// Lighthouse (the npm package, mobile settings: simulated slow 4G and a 4x slower CPU) on the
// sign-in page and on a cold Lineup of the bench cycle at 1024x768, signed in as the handler, in
// Debian's Chromium. Prints one JSON line: each page's performance and accessibility scores (0-100)
// and the metrics behind the performance score.
// usage: node apps/web/bench/lighthouse.mjs '{"url":"http://127.0.0.1:3200","cycleId":N}'
import { DEMO_PASSWORD } from '@catline/contracts';
import lighthouse from 'lighthouse';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium } from 'playwright-core';

const { url, cycleId } = JSON.parse(process.argv[2]);
const METRICS = [
  'first-contentful-paint',
  'largest-contentful-paint',
  'total-blocking-time',
  'cumulative-layout-shift',
  'speed-index',
];

/** A free loopback port for Chromium's DevTools endpoint, which Lighthouse drives. */
const freePort = () =>
  new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });

function summary(lhr) {
  return {
    performance: Math.round(lhr.categories.performance.score * 100),
    accessibility: Math.round(lhr.categories.accessibility.score * 100),
    ...Object.fromEntries(METRICS.map((id) => [id, Math.round(lhr.audits[id].numericValue)])),
    ...(lhr.runtimeError ? { error: lhr.runtimeError.message } : {}),
  };
}

const profile = mkdtempSync(path.join(tmpdir(), 'catline-lighthouse-'));
const port = await freePort();
// One browser for both: Lighthouse opens its own tab in the profile the handler signed in with, so
// the Lineup run starts with the session cookie, as a tablet reopening the app does.
const context = await chromium.launchPersistentContext(profile, {
  executablePath: '/usr/bin/chromium',
  args: [
    `--remote-debugging-port=${port}`,
    '--remote-debugging-address=127.0.0.1',
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
  ],
});
try {
  const flags = { port, output: 'json', logLevel: 'error', onlyCategories: ['performance', 'accessibility'] };
  const signIn = (await lighthouse(`${url}/sign-in`, flags)).lhr;

  const page = context.pages()[0] ?? (await context.newPage());
  await page.goto(`${url}/sign-in`);
  await page.getByLabel('E-mail').fill('handler@catline.example');
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((address) => !address.pathname.startsWith('/sign-in'));
  // Cold: no HTTP cache and no service worker or its cached shell, but the session kept, which
  // Lighthouse's own storage reset would clear.
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.clearBrowserCache');
  await cdp.send('Storage.clearDataForOrigin', {
    origin: new URL(url).origin,
    storageTypes: 'cache_storage,service_workers',
  });
  await page.goto('about:blank');
  const lineup = (
    await lighthouse(`${url}/lineup?cycle=${cycleId}`, {
      ...flags,
      disableStorageReset: true,
      screenEmulation: { mobile: true, width: 1024, height: 768, deviceScaleFactor: 1, disabled: false },
    })
  ).lhr;
  console.log(JSON.stringify({ signIn: summary(signIn), coldLineup: summary(lineup) }));
} finally {
  await context.close();
  rmSync(profile, { recursive: true, force: true });
}
