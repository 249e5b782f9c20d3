// Web benchmark: gzip size of the JavaScript and CSS the built app loads first, and the time until
// the Lineup of a 40-aircraft cycle is drawn in headless Chromium (median of several cold loads).
// usage: node apps/web/bench/web.mjs '{"url":"http://127.0.0.1:3200","cycleId":N,"aircraft":40}'
import { DEMO_PASSWORD } from '@catline/contracts';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';

const RUNS = 5;
const dist = fileURLToPath(new URL('../dist/', import.meta.url));
const { url, cycleId, aircraft = 40 } = JSON.parse(process.argv[2]);

/** The files index.html pulls in before any route module: entry scripts, module preloads, styles. */
function initialAssets() {
  const html = readFileSync(`${dist}index.html`, 'utf8');
  const refs = [...html.matchAll(/(?:src|href)="\/(assets\/[^"]+\.(?:js|css))"/g)].map((match) => match[1]);
  const size = (ext) =>
    refs
      .filter((ref) => ref.endsWith(ext))
      .reduce((sum, ref) => sum + gzipSync(readFileSync(`${dist}${ref}`), { level: 9 }).length, 0);
  return {
    initialJsGzipKb: Math.round(size('.js') / 102.4) / 10,
    initialCssGzipKb: Math.round(size('.css') / 102.4) / 10,
    initialFiles: refs.length,
  };
}

async function medianMs(task) {
  const times = [];
  for (let run = 0; run < RUNS; run += 1) {
    const started = performance.now();
    await task();
    times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  return Math.round(times[Math.floor(times.length / 2)]);
}

/**
 * Where a load's time went, run in the page once the cards are drawn: each file and API call as
 * "path start–end" in ms from the navigation's start, then when the document was parsed and when the
 * cards were found.
 */
function loadTimeline() {
  const { performance: timing } = globalThis;
  const [navigation] = timing.getEntriesByType('navigation');
  const fetched = timing
    .getEntriesByType('resource')
    .filter((entry) => /\/(api|assets)\//.test(entry.name))
    .map((entry) => `${new URL(entry.name).pathname} ${Math.round(entry.startTime)}–${Math.round(entry.responseEnd)}`);
  return [
    `document ${Math.round(navigation.responseEnd)}`,
    ...fetched,
    `parsed ${Math.round(navigation.domContentLoadedEventEnd)}`,
    `cards drawn ${Math.round(timing.now())}`,
  ];
}

async function timeToLineup() {
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
    ],
  });
  try {
    const context = await browser.newContext({ viewport: { width: 1366, height: 768 } });
    const page = await context.newPage();
    await page.goto(`${url}/sign-in`);
    await page.getByLabel('E-mail').fill('handler@catline.example');
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((address) => !address.pathname.startsWith('/sign-in'));
    let timeline;
    const lineup = await medianMs(async () => {
      await page.goto(`${url}/lineup?cycle=${cycleId}`);
      // Runs in the page, where document is defined.
      await page.waitForFunction(
        (count) => globalThis.document.querySelectorAll('[data-testid="slot-card"]').length >= count,
        aircraft,
        { timeout: 30_000 },
      );
      timeline = await page.evaluate(loadTimeline);
    });
    // Baseline in the same browser: a cold load of the sign-in page, which fetches no data.
    const anonymous = await (await browser.newContext({ viewport: { width: 1366, height: 768 } })).newPage();
    const signInPage = await medianMs(async () => {
      await anonymous.goto(`${url}/sign-in`);
      await anonymous.getByRole('button', { name: 'Sign in' }).waitFor();
    });
    return {
      lineupDrawnMedianMs: lineup,
      signInDrawnMedianMs: signInPage,
      lineupRatio: Math.round((lineup / signInPage) * 100) / 100,
      lastLineupLoad: timeline,
    };
  } finally {
    await browser.close();
  }
}

console.log(JSON.stringify({ ...initialAssets(), ...(await timeToLineup()) }));
