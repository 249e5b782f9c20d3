import { expect, test } from '@playwright/test';
import { apiAs, placeInLane, planCycle } from './support/demo-api.js';
import { card, dragWithMouse, lane, openAs, pool } from './support/screens.js';

test('the handler swaps in a spare, applies the suggested lineup and marks a catapult down', async ({ browser }) => {
  const { cycle, slotIds } = await planCycle({
    aircraft: [
      { side: 'D38', grossWeightLb: 42_000 },
      { side: 'C30', grossWeightLb: 40_000, spare: true },
      { side: 'G43', grossWeightLb: 24_000, pilot: 'pilot4' },
    ],
  });
  const api = await apiAs('handler');
  await placeInLane(api, cycle.id, slotIds.get('D38')!, 1);
  await api.dispose();
  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  // A second person follows the same cycle: each change must reach their page too, not only the handler's.
  const watcher = await openAs(browser, 'observer', `/lineup?cycle=${cycle.id}`);
  await expect(card(lane(watcher, 1), 'D38')).toBeVisible();

  await handler.getByRole('button', { name: 'Actions for D38' }).click();
  await handler.getByRole('menuitem', { name: 'Mark down…' }).click();
  await handler.getByRole('dialog').getByRole('combobox').selectOption({ label: 'C30 · WKD-41 · CWR' });
  await handler.getByRole('dialog').getByRole('button', { name: 'Mark D38 down' }).click();
  await expect(card(lane(handler, 1), 'C30')).toBeVisible();
  await expect(handler.getByTestId('down-list')).toContainText('D38');
  // Cat 1's head still counts the aircraft that went down out of its order; the other catapults', none.
  await expect(lane(handler, 1).getByTestId('lane-counts')).toHaveText('0 off · 1 to go · 0 late · 1 down');
  await expect(lane(handler, 2).getByTestId('lane-counts')).toContainText('0 down');
  await expect(card(lane(watcher, 1), 'C30')).toBeVisible();
  await expect(watcher.getByTestId('down-list')).toContainText('D38');
  await expect(lane(watcher, 1).getByTestId('lane-counts')).toHaveText('0 off · 1 to go · 0 late · 1 down');

  await handler.getByRole('button', { name: 'Suggest lineup' }).click();
  const dialog = handler.getByRole('dialog');
  // What moves where, and what it gains, not just chains of side numbers.
  await expect(dialog.getByTestId('suggestion-lanes')).toContainText(/G43(, \w+)* join/);
  await expect(dialog.getByTestId('suggestion-last-launch')).toContainText(/\d\d:\d\d:\d\d UTC → \d\d:\d\d:\d\d UTC/);
  await expect(dialog.getByTestId('suggestion-window')).toContainText('Aircraft missing the window');
  await dialog.getByRole('button', { name: 'Apply suggestion' }).click();
  await expect(handler.getByTestId('notice')).toContainText('Suggested lineup applied');
  await expect(card(pool(handler), 'G43')).toHaveCount(0);
  await expect(card(pool(watcher), 'G43')).toHaveCount(0);

  const catapult = await handler
    .locator('[data-testid="lane"]', { has: card(handler, 'G43') })
    .getAttribute('data-catapult-number');
  await handler.getByRole('button', { name: `Actions for cat ${catapult}` }).click();
  await handler.getByRole('menuitem', { name: `Mark cat ${catapult} down…` }).click();
  await handler
    .getByRole('dialog')
    .getByRole('button', { name: `Cat ${catapult} is down` })
    .click();
  await expect(handler.getByRole('dialog').getByText('Say why the catapult is down.')).toBeVisible();
  await handler.getByRole('dialog').getByLabel('Reason').fill('Shuttle fault');
  await handler
    .getByRole('dialog')
    .getByRole('button', { name: `Cat ${catapult} is down` })
    .click();
  await expect(lane(handler, Number(catapult)).getByTestId('catapult-status')).toHaveText('DOWN');
  await expect(handler.getByTestId('lineup-warnings')).toContainText(`Cat ${catapult} is down`);
  await expect(card(lane(watcher, Number(catapult)), 'G43')).toBeVisible();
  await expect(lane(watcher, Number(catapult)).getByTestId('catapult-status')).toHaveText('DOWN');
  await expect(watcher.getByTestId('lineup-warnings')).toContainText(`Cat ${catapult} is down`);
});

test('an aircraft without a pilot cannot reach a catapult, so it never waits there for one', async ({ browser }) => {
  const { cycle } = await planCycle({ aircraft: [{ side: 'L48', grossWeightLb: 47_000, pilot: null }] });
  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  const watcher = await openAs(browser, 'observer', `/lineup?cycle=${cycle.id}`);
  const tanker = card(pool(handler), 'L48');
  await expect(tanker.getByTestId('no-pilot')).toBeVisible();
  await expect(handler.getByTestId('lineup-warnings')).toContainText('No pilot assigned to L48');

  await dragWithMouse(handler, tanker, lane(handler, 2).getByTestId('lane-drop-zone'));
  await expect(handler.getByTestId('notice')).toContainText('L48 has no pilot; assign one before it joins cat 2.');
  await expect(card(lane(handler, 2), 'L48')).toHaveCount(0);
  await expect(card(pool(handler), 'L48')).toBeVisible();

  await handler.getByRole('button', { name: 'Actions for L48' }).click();
  await handler.getByRole('menuitem', { name: 'Assign pilot…' }).click();
  await handler.getByRole('dialog').getByRole('combobox').selectOption({ label: 'Una Dapplewick' });
  await handler.getByRole('dialog').getByRole('button', { name: 'Save pilot' }).click();
  await expect(handler.getByTestId('notice')).toContainText('Pilot of L48 saved');
  await expect(card(pool(handler), 'L48').getByTestId('no-pilot')).toHaveCount(0);
  await expect(card(pool(watcher), 'L48')).toContainText('Una Dapplewick');
  await expect(card(pool(watcher), 'L48').getByTestId('no-pilot')).toHaveCount(0);

  await dragWithMouse(handler, card(pool(handler), 'L48'), lane(handler, 2).getByTestId('lane-drop-zone'));
  await expect(card(lane(handler, 2), 'L48')).toBeVisible();
  await expect(card(lane(watcher, 2), 'L48')).toBeVisible();

  // Standing in the order, it keeps its pilot.
  await handler.getByRole('button', { name: 'Actions for L48' }).click();
  await handler.getByRole('menuitem', { name: 'Change pilot…' }).click();
  await handler.getByRole('dialog').getByRole('combobox').selectOption({ label: 'No pilot' });
  await handler.getByRole('dialog').getByRole('button', { name: 'Save pilot' }).click();
  await expect(handler.getByTestId('notice')).toContainText('move it to the deck pool before its pilot leaves it');
  await expect(card(lane(handler, 2), 'L48')).toContainText('Una Dapplewick');
});
