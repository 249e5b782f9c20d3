// Real-browser latency: the handler drops an aircraft on catapult 1 in one Chromium page (a keyboard
// drag, as a person can make it) and the time until the card stands in catapult 1 on each of 20 other
// pages, each signed in as another person of the ship on the Lineup. With several API addresses the
// watching pages are spread over them (two API processes sharing rooms through Redis).
// Prints one JSON line: p50, p95, p99 and max in ms over every move and page, and the sample count.
// usage: node apps/web/bench/live-latency.mjs '{"urls":["http://127.0.0.1:3200"],"cycleId":N,"pages":20,"moves":20}'
import { DEMO_PASSWORD } from '@catline/contracts';
import { chromium } from 'playwright-core';

const { urls, cycleId, pages: watcherCount = 20, moves = 20 } = JSON.parse(process.argv[2]);
const WATCHERS = [
  'observer',
  'airboss',
  'airops',
  ...[1, 2, 3, 4].map((n) => `cat${n}`),
  'deo1',
  'deo2',
  'pilot',
  ...Array.from({ length: 11 }, (_, i) => `pilot${i + 2}`),
];
const TIMEOUT_MS = 30_000;

const percentile = (sorted, p) => sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];

async function openLineup(browser, url, who) {
  const context = await browser.newContext({ viewport: { width: 1366, height: 768 } });
  const page = await context.newPage();
  page.setDefaultTimeout(TIMEOUT_MS);
  await page.goto(`${url}/lineup?cycle=${cycleId}`);
  await page.getByLabel('E-mail').fill(`${who}@catline.example`);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  try {
    await page.locator('[data-testid="lane"][data-catapult-number="1"]').waitFor();
    await page.getByText('Live', { exact: true }).first().waitFor();
  } catch (error) {
    const shown = (await page.locator('body').innerText()).replace(/\s+/g, ' ').slice(0, 400);
    throw new Error(`${who}'s Lineup did not open: at ${page.url()} the page shows "${shown}"`, { cause: error });
  }
  return page;
}

/** Notes, in the page, the moment the card first stands in catapult 1's lane. */
function watchFor(page, side) {
  return page.evaluate((sideNumber) => {
    const selector = `[data-testid="lane"][data-catapult-number="1"] [data-testid="slot-card"][data-side-number="${sideNumber}"]`;
    const state = { seenAt: null };
    globalThis.catlineBenchSeen = state;
    const check = () => {
      if (state.seenAt === null && globalThis.document.querySelector(selector)) {
        state.seenAt = Date.now();
        observer.disconnect();
      }
    };
    const observer = new globalThis.MutationObserver(check);
    observer.observe(globalThis.document.body, { childList: true, subtree: true, attributes: true });
    check();
  }, side);
}

const seenAt = (page) =>
  page
    .waitForFunction(() => globalThis.catlineBenchSeen.seenAt, null, { timeout: TIMEOUT_MS, polling: 50 })
    .then((handle) => handle.jsonValue());

const browser = await chromium.launch({
  executablePath: '/usr/bin/chromium',
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
    // Twenty pages in one browser: background pages must keep their timers and rendering, as the
    // tablets on deck each have the screen in front.
    '--disable-background-timer-throttling',
    '--disable-renderer-backgrounding',
    '--disable-backgrounding-occluded-windows',
  ],
});
try {
  const handler = await openLineup(browser, urls[0], 'handler');
  const watchers = [];
  for (let index = 0; index < watcherCount; index += 1)
    watchers.push(await openLineup(browser, urls[index % urls.length], WATCHERS[index % WATCHERS.length]));

  const pool = handler.getByTestId('deck-pool');
  const sides = await pool
    .locator('[data-testid="slot-card"]')
    .evaluateAll((cards) => cards.map((card) => card.getAttribute('data-side-number')));
  if (sides.length < moves) throw new Error(`the bench cycle has ${sides.length} aircraft in the pool, not ${moves}`);
  const announcement = handler.locator('[id^="DndLiveRegion"]');
  const latencies = [];
  for (const side of sides.slice(0, moves)) {
    await pool
      .locator(`[data-testid="slot-card"][data-side-number="${side}"]`)
      .getByRole('button', { name: new RegExp(`^${side} `) })
      .focus();
    await handler.keyboard.press('Enter');
    await announcement.filter({ hasText: `Picked up ${side}` }).waitFor();
    await handler.keyboard.press('ArrowDown');
    await announcement.filter({ hasText: `${side} is over catapult 1` }).waitFor();
    await Promise.all(watchers.map((page) => watchFor(page, side)));
    const dropped = Date.now();
    await handler.keyboard.press('Enter');
    for (const time of await Promise.all(watchers.map(seenAt))) latencies.push(time - dropped);
  }
  latencies.sort((a, b) => a - b);
  console.log(
    JSON.stringify({
      pages: watcherCount,
      apiProcesses: urls.length,
      samples: latencies.length,
      p50: percentile(latencies, 50),
      p95: percentile(latencies, 95),
      p99: percentile(latencies, 99),
      max: latencies.at(-1),
    }),
  );
} finally {
  await browser.close();
}
