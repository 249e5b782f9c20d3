import { expect, test } from '@playwright/test';
import { apiAs, lineupOf, planCycle } from './support/demo-api.js';
import { card, lane, openAs, pool } from './support/screens.js';

test('the handler moves an aircraft from the deck pool to cat 1 with the keyboard alone', async ({ browser }) => {
  const { cycle } = await planCycle({ aircraft: [{ side: 'C23', grossWeightLb: 42_000 }] });
  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);

  const grip = card(pool(handler), 'C23').getByRole('button', { name: /^C23 / });
  await grip.focus();
  const announcement = handler.locator('[id^="DndLiveRegion"]');
  await handler.keyboard.press('Enter');
  await expect(announcement).toHaveText('Picked up C23 from the deck pool.');
  await handler.keyboard.press('ArrowDown');
  await expect(announcement).toHaveText('C23 is over catapult 1, place 1.');
  await handler.keyboard.press('Enter');
  await expect(announcement).toHaveText('C23 put down in catapult 1, place 1.');

  await expect(card(lane(handler, 1), 'C23')).toBeVisible();
  await expect(card(pool(handler), 'C23')).toHaveCount(0);
  const observer = await apiAs('observer');
  await expect
    .poll(async () => {
      const snapshot = await lineupOf(observer, cycle.id);
      const slot = snapshot.slots.find((candidate) => candidate.sideNumber === 'C23');
      return snapshot.lanes.find((candidate) => candidate.catapultId === slot?.catapultId)?.number;
    })
    .toBe(1);
  await observer.dispose();
});
