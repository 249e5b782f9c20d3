import { expect, test } from '@playwright/test';
import { apiAs, placeInLane, planCycle } from './support/demo-api.js';
import { card, lane, openAs, pool } from './support/screens.js';

test('the handler swaps in a spare, applies the suggested lineup and marks a catapult down', async ({ browser }) => {
  const { cycle, slotIds } = await planCycle({
    aircraft: [
      { side: '206', grossWeightLb: 42_000 },
      { side: '110', grossWeightLb: 40_000, spare: true },
      { side: '301', grossWeightLb: 24_000 },
    ],
  });
  const api = await apiAs('handler');
  await placeInLane(api, cycle.id, slotIds.get('206')!, 1);
  await api.dispose();
  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);

  await handler.getByRole('button', { name: 'Mark 206 down' }).click();
  await handler.getByRole('dialog').getByRole('combobox').selectOption({ label: '110 · KS-7 · TDC' });
  await handler.getByRole('dialog').getByRole('button', { name: 'Mark 206 down' }).click();
  await expect(card(lane(handler, 1), '110')).toBeVisible();
  await expect(handler.getByTestId('down-list')).toContainText('206');

  await handler.getByRole('button', { name: 'Suggest lineup' }).click();
  const dialog = handler.getByRole('dialog');
  await expect(dialog.getByTestId('suggestion-now')).toContainText('110');
  await expect(dialog.getByTestId('suggestion-proposed')).toContainText('301');
  await dialog.getByRole('button', { name: 'Apply suggestion' }).click();
  await expect(handler.getByTestId('notice')).toContainText('Suggested lineup applied');
  await expect(card(pool(handler), '301')).toHaveCount(0);

  const catapult = await handler.locator('[data-testid="lane"]', { has: card(handler, '301') }).getAttribute('data-catapult-number');
  await handler.getByRole('button', { name: `Mark cat ${catapult} down` }).click();
  await handler.getByRole('dialog').getByRole('button', { name: `Cat ${catapult} is down` }).click();
  await expect(handler.getByRole('dialog').getByText('Say why the catapult is down.')).toBeVisible();
  await handler.getByRole('dialog').getByLabel('Reason').fill('Shuttle fault');
  await handler.getByRole('dialog').getByRole('button', { name: `Cat ${catapult} is down` }).click();
  await expect(lane(handler, Number(catapult)).getByTestId('catapult-status')).toHaveText('DOWN');
  await expect(handler.getByTestId('lineup-warnings')).toContainText(`Cat ${catapult} is down`);
});
