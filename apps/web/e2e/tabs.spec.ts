import { expect, test, type BrowserContext, type Page } from '@playwright/test';
import { signIn } from './support/screens.js';

// Every tab of one browser holds the same refresh cookie. The tabs must spend it once between them: the
// server answers a cookie used again within its short grace, but a tab that spends it later ends every
// session of the person.

/** The statuses of the refreshes that reach the server from any tab of the context, oldest first. */
function countRefreshes(context: BrowserContext) {
  const statuses: number[] = [];
  context.on('response', (response) => {
    if (response.url().endsWith('/api/auth/refresh') && !response.fromServiceWorker()) {
      statuses.push(response.status());
    }
  });
  return { statuses, take: () => statuses.splice(0) };
}

// A tab may wait for another's refresh to be handed over (up to 5 s) before its own screen draws.
const fleetShown = (page: Page) =>
  expect(page.getByRole('heading', { name: 'Fleet' })).toBeVisible({ timeout: 20_000 });

test('six tabs opened at once restore the session with one refresh between them and all stay signed in', async ({
  browser,
}) => {
  // Eight tabs of the app load and render side by side: 37 s on a quiet clean-clone run, more on a loaded one.
  test.setTimeout(150_000);
  const context = await browser.newContext();
  const first = await context.newPage();
  await first.goto('/fleet');
  await signIn(first, 'observer');
  await fleetShown(first);
  const refreshes = countRefreshes(context);

  // A new tab holds no access token (it lives in the page's memory only), as if its token had run out:
  // each of the six must restore its session through the one cookie.
  const tabs = await Promise.all(Array.from({ length: 6 }, () => context.newPage()));
  await Promise.all(tabs.map((tab) => tab.goto('/fleet')));
  for (const tab of tabs) {
    await fleetShown(tab);
    await expect(tab).toHaveURL(/\/fleet$/);
  }
  expect(refreshes.take(), 'refreshes that reached the server while six tabs opened').toEqual([200]);

  // Each tab reaches the API with the session it was handed, and a tab opened later is handed it too.
  const later = await context.newPage();
  await later.goto('/fleet');
  await fleetShown(later);
  for (const tab of [first, ...tabs, later]) {
    await tab.getByRole('link', { name: 'Cycles' }).click();
    await expect(tab.getByRole('heading', { name: 'Cycles' })).toBeVisible();
  }
  expect(refreshes.take(), 'refreshes after the six tabs were open').toEqual([]);
  await context.close();
});

test('a lone tab reloaded just after a refresh asks the server at once, not tabs that are gone', async ({
  browser,
}) => {
  const context = await browser.newContext();
  // What each page of the context says to the other tabs, kept in the page.
  await context.addInitScript(() => {
    const said: string[] = [];
    Object.assign(globalThis, { catlineTabsSaid: said });
    const post = BroadcastChannel.prototype.postMessage;
    BroadcastChannel.prototype.postMessage = function (this: BroadcastChannel, message: { kind: string }) {
      said.push(message.kind);
      post.call(this, message);
    };
  });
  const first = await context.newPage();
  await first.goto('/fleet');
  await signIn(first, 'observer');
  await fleetShown(first);
  // A second tab restores its session with a refresh, so a refresh was made within the last minute.
  const second = await context.newPage();
  await second.goto('/fleet');
  await fleetShown(second);
  await first.close();

  const refreshes = countRefreshes(context);
  await second.reload();
  await fleetShown(second);
  expect(refreshes.take(), 'the reloaded tab refreshes its session itself').toEqual([200]);
  expect(await second.evaluate(() => (globalThis as { catlineTabsSaid?: string[] }).catlineTabsSaid)).not.toContain(
    'ask',
  );

  // With another tab open, a new one still asks it and is handed its session without a refresh.
  const third = await context.newPage();
  await third.goto('/fleet');
  await fleetShown(third);
  expect(await third.evaluate(() => (globalThis as { catlineTabsSaid?: string[] }).catlineTabsSaid)).toContain('ask');
  expect(refreshes.take(), 'refreshes while the third tab opened').toEqual([]);
  await context.close();
});
