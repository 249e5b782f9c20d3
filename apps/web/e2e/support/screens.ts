import { expect, type Browser, type CDPSession, type Locator, type Page } from '@playwright/test';
import { DEMO_PASSWORD, demoEmail } from './demo-api.js';

/** Opens a screen as a person: the app sends them to sign in and back to the screen they asked for. */
export async function openAs(
  browser: Browser,
  who: string,
  path: string,
  viewport = { width: 1366, height: 768 },
  hasTouch = false,
) {
  const context = await browser.newContext({ viewport, hasTouch });
  const page = await context.newPage();
  await page.goto(path);
  await signIn(page, who);
  await expect(page).toHaveURL(new RegExp(path.replace(/[?]/g, '\\?')));
  return page;
}

export async function signIn(page: Page, who: string) {
  await expect(page).toHaveURL(/\/sign-in/);
  await page.getByLabel('E-mail').fill(demoEmail(who));
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export const lane = (page: Page, catapultNumber: number) =>
  page.locator(`[data-testid="lane"][data-catapult-number="${catapultNumber}"]`);
export const pool = (page: Page) => page.getByTestId('deck-pool');
export const card = (scope: Page | Locator, side: string) =>
  scope.locator(`[data-testid="slot-card"][data-side-number="${side}"]`);

/** A real pointer drag: press, move in steps (dnd-kit waits for movement), release. */
export async function dragWithMouse(page: Page, from: Locator, to: Locator) {
  const start = (await from.boundingBox())!;
  const end = (await to.boundingBox())!;
  await page.mouse.move(start.x + start.width / 2, start.y + start.height / 3);
  await page.mouse.down();
  await page.mouse.move(start.x + start.width / 2 + 12, start.y + start.height / 3 + 4, { steps: 4 });
  await page.mouse.move(end.x + end.width / 2, end.y + Math.min(end.height / 2, 40), { steps: 15 });
  await page.mouse.up();
}

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

/**
 * A real finger drag through Chromium's touch input: press, hold past the touch sensor's delay, slide in
 * steps, lift. The page must have been opened with touch.
 */
export async function dragWithTouch(page: Page, from: Locator, to: Locator) {
  const start = (await from.boundingBox())!;
  const end = (await to.boundingBox())!;
  const touch = await page.context().newCDPSession(page);
  const at = (x: number, y: number) => [{ x: Math.round(x), y: Math.round(y) }];
  const x0 = start.x + start.width / 2;
  const y0 = start.y + start.height / 2;
  const x1 = end.x + Math.min(end.width / 2, 60);
  const y1 = end.y + end.height / 2;
  await touch.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: at(x0, y0) });
  await page.waitForTimeout(400);
  for (let step = 1; step <= 15; step += 1) {
    const share = step / 15;
    await touch.send('Input.dispatchTouchEvent', {
      type: 'touchMove',
      touchPoints: at(x0 + (x1 - x0) * share, y0 + (y1 - y0) * share),
    });
  }
  await touch.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
  await touch.detach();
}

type Point = { x: number; y: number };

/** Where a drag grabs a card or drops onto a place: across the middle, a little below the top. */
export async function grabPoint(target: Locator): Promise<Point> {
  const box = (await target.boundingBox())!;
  return { x: box.x + box.width / 2, y: box.y + Math.min(box.height / 3, 40) };
}

/** A mouse drag between two points, with no look-up in between (so it can start right after another). */
export async function mouseDragBetween(page: Page, from: Point, to: Point) {
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(from.x + 12, from.y + 4, { steps: 4 });
  await page.mouse.move(to.x, to.y, { steps: 15 });
  await page.mouse.up();
}

/**
 * A finger drag between two points through the browser's own touch input: touch, hold until the board
 * says the card is picked up (as a person waits to see it lift), move in steps, lift.
 */
export async function touchDragBetween(page: Page, from: Point, to: Point) {
  const session = await touchInput(page);
  const touch = (type: 'touchStart' | 'touchMove' | 'touchEnd', at?: Point) =>
    session.send('Input.dispatchTouchEvent', { type, touchPoints: at ? [at] : [] });
  await touch('touchStart', from);
  await expect(page.locator('[id^="DndLiveRegion"]')).toHaveText(/^Picked up /);
  for (let step = 1; step <= 15; step++) {
    await touch('touchMove', { x: from.x + ((to.x - from.x) * step) / 15, y: from.y + ((to.y - from.y) * step) / 15 });
  }
  await touch('touchEnd');
}

const touchSessions = new WeakMap<Page, Promise<CDPSession>>();
/** One input session per page, opened once, so a touch starts without a round of set-up before it. */
function touchInput(page: Page) {
  if (!touchSessions.has(page)) touchSessions.set(page, page.context().newCDPSession(page));
  return touchSessions.get(page)!;
}
