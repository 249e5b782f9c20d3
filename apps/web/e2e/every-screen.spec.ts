import { expect, test, type Page } from '@playwright/test';
import { launchingCycle } from './support/demo-api.js';
import { axeViolations } from './support/axe.js';
import { openAs } from './support/screens.js';

// A normal visit to every screen, as the person who uses it, on the deck crews' tablet: nothing logged as an
// error, no axe violation by day or by night, and every control big enough for a gloved finger.
const TABLET = { width: 1024, height: 768 };
/** The sizes a screenshot of each screen is kept at: laptop, tablet, upright tablet. */
const SIZES = [{ width: 1366, height: 768 }, TABLET, { width: 820, height: 1180 }];
/** WCAG 2.2 target size (enhanced, 2.5.5): 44 by 44 CSS pixels. */
const TOUCH_PX = 44;
/** The catapult issue: the station's actions are 60 px high, pressed in a hurry on a moving deck. */
const STATION_ACTION_PX = 60;

const CONTROLS = 'button, a[href], input:not([type=hidden]), select, textarea, [role=tab], [role=button]';

/** Controls shown (not hidden or clipped away) smaller than `min` px either way, as "what it is (w×h)". */
function smallControls(page: Page, min: number, selector = CONTROLS) {
  return page.evaluate(
    ({ min, selector }) =>
      [...document.querySelectorAll(selector)]
        .filter((element) => {
          const box = element.getBoundingClientRect();
          const style = getComputedStyle(element);
          const shown = box.width > 1 && style.visibility !== 'hidden' && style.clip !== 'rect(0px, 0px, 0px, 0px)';
          return shown && !element.closest('[aria-hidden=true]') && (box.width < min || box.height < min);
        })
        .map((element) => {
          const box = element.getBoundingClientRect();
          const name = element.getAttribute('aria-label') ?? element.textContent?.trim().slice(0, 40) ?? '';
          return `${element.tagName.toLowerCase()} "${name}" (${Math.round(box.width)}×${Math.round(box.height)})`;
        }),
    { min, selector },
  );
}

/** Every message the page logs as an error, and every error it throws, into `errors`. */
function collectErrors(page: Page, errors: string[]) {
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(message.text());
  });
  page.on('pageerror', (error) => errors.push(error.message));
}

/**
 * axe's findings at each size the crews use, as "<when> at 1366×768: …", keeping on the way a screenshot of
 * what the screen shows first, without scrolling, named `<screen>[-<suffix>]-<width>x<height>.png`.
 */
async function axeAtEverySize(page: Page, when: string, path: string, suffix = '') {
  const name = path.split(/[?#]/)[0].slice(1).replaceAll('/', '-') + suffix;
  const found: string[] = [];
  for (const size of SIZES) {
    await page.setViewportSize(size);
    for (const violation of await axeViolations(page))
      found.push(`${when} at ${size.width}×${size.height}: ${violation}`);
    await page.screenshot({ path: `test-results/every-screen/${name}-${size.width}x${size.height}.png` });
  }
  await page.setViewportSize(TABLET);
  return found;
}

async function chooseTheme(page: Page, theme: 'day' | 'night') {
  await page.getByLabel('Theme').selectOption(theme);
  if (theme === 'night') await expect(page.locator('html')).toHaveClass(/dark/);
  else await expect(page.locator('html')).not.toHaveClass(/dark/);
}

const screens = [
  { who: 'handler', path: (cycle: number) => `/lineup?cycle=${cycle}`, ready: 'lane', live: true },
  { who: 'handler', path: (cycle: number) => `/deck?cycle=${cycle}`, ready: 'landing-area', live: true },
  {
    who: 'cat1',
    path: (cycle: number) => `/cat-station?cycle=${cycle}`,
    ready: 'current-aircraft',
    station: true,
    live: true,
  },
  { who: 'pilot', path: (cycle: number) => `/my-launch?cycle=${cycle}`, ready: 'my-slot', station: true, live: true },
  { who: 'airops', path: () => '/cycles', ready: 'live-figures', live: true },
  { who: 'airops', path: () => '/reports' },
  { who: 'airops', path: (cycle: number) => `/reports/replay?cycle=${cycle}` },
  { who: 'airops', path: (cycle: number) => `/reports/launch-sheet?cycle=${cycle}` },
  { who: 'airops', path: () => '/reports/shot-counts' },
  { who: 'admin', path: () => '/fleet' },
  { who: 'admin', path: () => '/launch-data' },
  { who: 'admin', path: () => '/people' },
  { who: 'admin', path: () => '/audit' },
];

// Axe at three sizes by day and by night (and greyed, for a live screen), with a screenshot each time: the
// report screens of a long-running test database need more than the default minute on a loaded machine.
test.describe.configure({ timeout: 240_000 });

let cycleId: number;
test.beforeAll(async () => {
  cycleId = (await launchingCycle()).id;
});

for (const screen of screens) {
  test(`${screen.path(0).split('?')[0]} as ${screen.who}: no error logged, no axe violation by day or night${screen.live ? ' nor greyed' : ''} at any size, controls a finger can hit`, async ({
    browser,
  }) => {
    const path = screen.path(cycleId);
    const errors: string[] = [];
    // Listening from the first request: an error while the screen first loads, or while signing in, counts too.
    const page = await openAs(browser, screen.who, path, TABLET, true, (opened) => collectErrors(opened, errors));
    if (screen.ready) await expect(page.getByTestId(screen.ready).first()).toBeVisible();
    await page.waitForLoadState('networkidle');
    const found = (await smallControls(page, TOUCH_PX)).map((small) => `${small} is under ${TOUCH_PX} px`);
    if (screen.station)
      for (const small of await smallControls(page, STATION_ACTION_PX, 'main button, main input'))
        found.push(`${small} is under ${STATION_ACTION_PX} px on a station`);
    found.push(...(await axeAtEverySize(page, 'by day', path)));
    await chooseTheme(page, 'night');
    found.push(...(await axeAtEverySize(page, 'by night', path, '-night')));
    // A normal visit ends here: going offline makes the live link's own failures show in the console.
    found.push(...errors.map((error) => `logged: ${error}`));
    if (screen.live) {
      await page.context().setOffline(true);
      await expect(page.getByTestId('not-live')).toBeVisible();
      found.push(...(await axeAtEverySize(page, 'greyed by night', path, '-not-live-night')));
      await chooseTheme(page, 'day');
      found.push(...(await axeAtEverySize(page, 'greyed by day', path, '-not-live')));
    }
    expect(found).toEqual([]);
    await page.context().close();
  });
}

// The pages before sign-in, as someone who is not signed in opens them (the mailed links carry a token after #).
const pagesBeforeSignIn = [
  { path: '/sign-in', ready: 'Sign in' },
  { path: '/forgot-password', ready: 'Send me a link' },
  { path: '/reset-password#token=0f3a9c27d1b84e6a', ready: 'Set new password' },
  { path: '/invitation#token=7b21e0d94c5f3a88', ready: 'Set my password' },
];

for (const before of pagesBeforeSignIn) {
  test(`${before.path.split('#')[0]} before sign-in: no error logged, no axe violation by day or night at any size, controls a finger can hit`, async ({
    browser,
  }) => {
    const context = await browser.newContext({ viewport: TABLET, hasTouch: true });
    const page = await context.newPage();
    const errors: string[] = [];
    collectErrors(page, errors);
    await page.goto(before.path);
    await expect(page.getByRole('button', { name: before.ready }).first()).toBeVisible({ timeout: 15_000 });
    await page.waitForLoadState('networkidle');
    const found = (await smallControls(page, TOUCH_PX)).map((small) => `${small} is under ${TOUCH_PX} px`);
    found.push(...(await axeAtEverySize(page, 'by day', before.path)));
    // No theme switch before sign-in: the tablet's night choice, made earlier, is what these pages follow.
    await page.evaluate(() => localStorage.setItem('catline.theme', 'night'));
    await page.reload();
    await expect(page.locator('html')).toHaveClass(/dark/);
    await expect(page.getByRole('button', { name: before.ready }).first()).toBeVisible({ timeout: 15_000 });
    found.push(...(await axeAtEverySize(page, 'by night', before.path, '-night')));
    for (const error of errors) found.push(`logged: ${error}`);
    expect(found).toEqual([]);
    await context.close();
  });
}
