import { expect, type Browser, type CDPSession, type Locator, type Page } from '@playwright/test';
import { DEMO_PASSWORD, demoEmail } from './demo-api.js';

/**
 * Opens a screen as a person: the app sends them to sign in and back to the screen they asked for.
 * `beforeOpening` runs on the new page before it loads anything (to listen from the first request, or fake its clock).
 */
export async function openAs(
  browser: Browser,
  who: string,
  path: string,
  viewport = { width: 1366, height: 768 },
  hasTouch = false,
  beforeOpening?: (page: Page) => Promise<void> | void,
) {
  const context = await browser.newContext({ viewport, hasTouch });
  const page = await context.newPage();
  await beforeOpening?.(page);
  await page.goto(path);
  await signIn(page, who);
  await expect(page).toHaveURL(new RegExp(path.replace(/[?]/g, '\\?')));
  return page;
}

export async function signIn(page: Page, who: string) {
  // A cold first load (the scripts, and the service worker keeping its copy alongside) takes more than the
  // default 5 s on a loaded test machine.
  await expect(page).toHaveURL(/\/sign-in/, { timeout: 15_000 });
  await page.getByLabel('E-mail').fill(demoEmail(who));
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** The value of one of the Cat station's figures, by its label. */
export const catFigure = (station: Page, label: string) =>
  station
    .getByTestId('cat-figures')
    .locator(':scope > div')
    .filter({ has: station.getByText(label, { exact: true }) })
    .locator('p')
    .last();

/** The large setting on the Cat station: the one from the ship's approved launch data. */
export const approvedSetting = (station: Page) => catFigure(station, 'Catapult setting (approved data)');

export const lane = (page: Page, catapultNumber: number) =>
  page.locator(`[data-testid="lane"][data-catapult-number="${catapultNumber}"]`);
export const pool = (page: Page) => page.getByTestId('deck-pool');
export const card = (scope: Page | Locator, side: string) =>
  scope.locator(`[data-testid="slot-card"][data-side-number="${side}"]`);

/** Fails when the page is wider than the window: something overflows sideways. */
export async function expectNoSidewaysOverflow(page: Page) {
  const widths = await page.evaluate(() => ({
    content: document.documentElement.scrollWidth,
    window: window.innerWidth,
  }));
  expect(widths.content, `page is ${widths.content}px wide in a ${widths.window}px window`).toBeLessThanOrEqual(
    widths.window,
  );
}

type Point = { x: number; y: number };
/** A card or place to look up just before the drag, or a point taken earlier (so a drag can start right after another). */
type Place = Locator | Point;

/** Where a drag grabs a card or drops onto a place: across the middle, a little below the top. */
export async function grabPoint(target: Locator): Promise<Point> {
  const box = (await target.boundingBox())!;
  return { x: box.x + box.width / 2, y: box.y + Math.min(box.height / 3, 40) };
}

const pointOf = (place: Place) => ('x' in place ? Promise.resolve(place) : grabPoint(place));

/** A real pointer drag: press, move a little (dnd-kit waits for movement), move in steps, release. */
export async function dragWithMouse(page: Page, from: Place, to: Place) {
  const [start, end] = await Promise.all([pointOf(from), pointOf(to)]);
  await page.mouse.move(start.x, start.y);
  await page.mouse.down();
  await page.mouse.move(start.x + 12, start.y + 4, { steps: 4 });
  await page.mouse.move(end.x, end.y, { steps: 15 });
  await page.mouse.up();
}

/**
 * A real finger drag through the browser's own touch input: touch, hold until the screen announces the
 * card picked up or already over a place (the deck announces its place at once; the last drop's words
 * differ), slide in steps, lift. The page must have been opened with touch.
 */
export async function dragWithTouch(page: Page, from: Place, to: Place) {
  const [start, end] = await Promise.all([pointOf(from), pointOf(to)]);
  const session = await touchInput(page);
  const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', at?: Point) =>
    session.send('Input.dispatchTouchEvent', { type, touchPoints: at ? [at] : [] });
  await touch('touchStart', start);
  await expect(page.locator('[id^="DndLiveRegion"]')).toHaveText(/^Picked up | is over /);
  for (let step = 1; step <= 15; step++) {
    await touch('touchMove', {
      x: start.x + ((end.x - start.x) * step) / 15,
      y: start.y + ((end.y - start.y) * step) / 15,
    });
  }
  await touch('touchEnd');
}

const touchSessions = new WeakMap<Page, Promise<CDPSession>>();
/** One input session per page, opened once, so a touch starts without a round of set-up before it. */
function touchInput(page: Page) {
  if (!touchSessions.has(page)) touchSessions.set(page, page.context().newCDPSession(page));
  return touchSessions.get(page)!;
}
