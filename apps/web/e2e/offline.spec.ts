import { expect, test, type Page } from '@playwright/test';
import { apiAs, launchingCycle, lineupOf, placeInLane, planCycle } from './support/demo-api.js';
import { card, lane, openAs, pool } from './support/screens.js';

// Long enough for the link to give up ("Offline since"), as on a deck where the network drops for a while.
const OUTAGE_MS = 20_000;
const TABLET = { width: 1024, height: 768 };

/** Greyed, saying since when, the caution still in view. */
async function expectStale(page: Page) {
  await expect(page.getByTestId('live-figures')).toHaveAttribute('data-live', 'false');
  await expect(page.getByTestId('not-live')).toHaveText(/^Not live — last update \d\d:\d\d:\d\d UTC$/);
  await expect(page.getByTestId('caution-line').first()).toBeVisible();
}

async function expectLiveAgain(page: Page) {
  await expect(page.getByTestId('connection-state')).toHaveText('Live', { timeout: 15_000 });
  await expect(page.getByTestId('live-figures')).toHaveAttribute('data-live', 'true');
  await expect(page.getByTestId('not-live')).toHaveCount(0);
}

async function waitOutOutage(page: Page, wentOffline: number) {
  await page.waitForTimeout(Math.max(0, OUTAGE_MS - (Date.now() - wentOffline)));
  await expect(page.getByTestId('connection-state')).toHaveText(/^Offline since \d\d:\d\d:\d\d UTC$/);
}

/** Every control among a screen's live figures that could still be pressed. */
const enabledControls = (page: Page) =>
  page.getByTestId('live-figures').locator('button:enabled, select:enabled, input:enabled, textarea:enabled');

test('with the network gone for 20 s the board and the pilot’s screen show stale figures, stop and refuse, then recover', async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const { cycle, slotIds } = await planCycle({
    start: true,
    aircraft: [
      { side: 'D38', grossWeightLb: 42_000, pilot: 'pilot3' },
      { side: 'C23', grossWeightLb: 43_000 },
    ],
  });
  const api = await apiAs('handler');
  await placeInLane(api, cycle.id, slotIds.get('D38')!, 1);
  await api.dispose();
  const pilot = await openAs(browser, 'pilot3', `/my-launch?cycle=${cycle.id}`);
  const board = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`, TABLET, true);
  for (const page of [pilot, board]) {
    await expect(page.getByTestId('connection-state')).toHaveText('Live');
    await expect(page.getByTestId('live-figures')).toHaveAttribute('data-live', 'true');
  }
  const confirm = pilot.getByTestId('acknowledge-weight');
  const countdown = pilot.getByTestId('countdown');
  const menu = board.getByRole('button', { name: 'Actions for D38' });
  const handle = card(pool(board), 'C23').getByRole('button', { name: /^C23\b/ });
  await expect(confirm).toBeEnabled();
  await expect(menu).toBeEnabled();
  await expect(handle).toBeVisible();
  // A dialog open when the link drops: its confirm must wait too (it lives outside the board's controls).
  await board.getByRole('button', { name: 'Actions for C23' }).click();
  await board.getByRole('menuitem', { name: 'Mark down…' }).click();
  const markDown = board.getByRole('dialog').getByRole('button', { name: 'Mark C23 down' });
  await expect(markDown).toBeEnabled();

  const wentOffline = Date.now();
  await Promise.all([pilot.context().setOffline(true), board.context().setOffline(true)]);
  await expect(markDown).toBeDisabled();
  await board.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
  const frozenAt = await countdown.textContent();
  for (const page of [pilot, board]) await expectStale(page);
  await expect(confirm).toBeDisabled();
  await expect(menu).toBeDisabled();
  await expect(board.getByRole('button', { name: 'Suggest lineup' })).toBeDisabled();
  await expect(handle, 'a stale board offers no drag').toHaveCount(0);

  for (const page of [pilot, board]) await waitOutOutage(page, wentOffline);
  await expect(countdown, 'the countdown stood still for the whole outage').toHaveText(frozenAt!);

  await Promise.all([pilot.context().setOffline(false), board.context().setOffline(false)]);
  for (const page of [pilot, board]) await expectLiveAgain(page);
  await expect(confirm).toBeEnabled();
  await expect(menu).toBeEnabled();
  await expect(countdown).not.toHaveText(frozenAt!);
  await expect(handle).toBeVisible();
  const observer = await apiAs('observer');
  const lineup = await lineupOf(observer, cycle.id);
  await observer.dispose();
  expect(lineup.slots.find((slot) => slot.sideNumber === 'C23')?.status, 'nothing was sent while offline').toBe(
    'planned',
  );
  await expect(card(lane(board, 1), 'D38')).toBeVisible();
  await Promise.all([pilot.context().close(), board.context().close()]);
});

test('with the network gone the Cat station, the Deck screen and the Cycles list show stale figures and refuse too, then recover', async ({
  browser,
}) => {
  test.setTimeout(150_000);
  const cycle = await launchingCycle();
  const station = await openAs(browser, 'cat1', `/cat-station?cycle=${cycle.id}`, TABLET, true);
  const deck = await openAs(browser, 'handler', `/deck?cycle=${cycle.id}`, TABLET, true);
  const list = await openAs(browser, 'airops', '/cycles', TABLET, true);
  const pages = [station, deck, list];
  for (const page of pages) {
    await expect(page.getByTestId('connection-state')).toHaveText('Live');
    await expect(page.getByTestId('live-figures')).toHaveAttribute('data-live', 'true');
  }
  const taxi = station.getByTestId('step-taxiing');
  await expect(station.getByTestId('current-aircraft')).toHaveAttribute('data-side-number', 'C21');
  await expect(taxi).toBeEnabled();
  await expect(enabledControls(deck).first(), 'the deck offers its actions while live').toBeVisible();
  // The cycle's panel under the list: its caution, and the air operations' actions on it.
  await list.getByRole('button', { name: `Show cycle ${cycle.number}` }).click();
  await expect(list.getByTestId('cycle-panel')).toBeVisible();
  await expect(enabledControls(list).first(), 'the list offers its actions while live').toBeVisible();

  const wentOffline = Date.now();
  await Promise.all(pages.map((page) => page.context().setOffline(true)));
  for (const page of pages) {
    await expectStale(page);
    await expect(enabledControls(page), 'nothing to press on a stale screen').toHaveCount(0);
  }
  await expect(taxi).toBeDisabled();
  // A cycle created while the list is offline: the list shows it only once it has caught up.
  const { cycle: created } = await planCycle({ aircraft: [] });
  const createdRow = list.getByRole('button', { name: `Show cycle ${created.number}` });
  for (const page of pages) await waitOutOutage(page, wentOffline);
  await expect(createdRow, 'the stale list shows no change').toHaveCount(0);

  await Promise.all(pages.map((page) => page.context().setOffline(false)));
  for (const page of pages) await expectLiveAgain(page);
  await expect(taxi).toBeEnabled();
  await expect(enabledControls(deck).first()).toBeVisible();
  await expect(createdRow, 'the list caught up with what it missed').toBeEnabled();
  await Promise.all(pages.map((page) => page.context().close()));
});
