import { expect, test } from '@playwright/test';
import { axeViolations } from './support/axe.js';
import { apiAs, lineupOf, placeInLane, planCycle } from './support/demo-api.js';
import { card, lane, openAs } from './support/screens.js';

test('the air boss holds a catapult with a reason and waives a soft limit; the handler sees both live', async ({
  browser,
}) => {
  // 8 kt of tailwind with the ship stopped: C22 at 51,000 lb keeps a positive excess wind over deck, below
  // the recommended value, so a soft limit holds it (the API's readiness test works the same figures out).
  const { cycle, slotIds } = await planCycle({
    start: true,
    wind: { shipSpeedKt: 0, trueWindFromDeg: 180, trueWindSpeedKt: 8 },
    aircraft: [{ side: 'C22', grossWeightLb: 51_000 }],
  });
  const handlerApi = await apiAs('handler');
  await placeInLane(handlerApi, cycle.id, slotIds.get('C22')!, 1);
  const held = (await lineupOf(handlerApi, cycle.id)).slots.find((slot) => slot.sideNumber === 'C22')!;
  expect(held.gates).toEqual(
    expect.arrayContaining([expect.objectContaining({ gate: 'excess_below_recommended', soft: true, waived: false })]),
  );

  const airBoss = await openAs(browser, 'airboss', `/deck?cycle=${cycle.id}`);
  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  await expect(lane(handler, 1).getByTestId('deck-status')).toHaveAttribute('data-deck-clear', 'true');
  // The deck screen shows launch figures elsewhere on its cycle: its caution stays.
  await expect(airBoss.getByTestId('caution-line')).toBeVisible();

  const cat1 = airBoss.locator('[data-testid="catapult-deck-status"][data-catapult-number="1"]');
  await cat1.getByRole('button', { name: 'Hold cat 1: not clear' }).click();
  await expect(cat1.getByRole('alert')).toHaveText('Say what keeps cat 1 from launching.');
  await cat1.getByLabel('Why cat 1 is not clear').fill('Deck crew forward');
  await cat1.getByRole('button', { name: 'Hold cat 1: not clear' }).click();
  await expect(cat1.getByTestId('deck-status')).toHaveAttribute('data-deck-clear', 'false');
  await expect(cat1.getByRole('button', { name: 'Clear cat 1 to launch' })).toBeVisible();
  expect(await axeViolations(airBoss)).toEqual([]);

  const handlerStatus = lane(handler, 1).getByTestId('deck-status');
  await expect(handlerStatus).toHaveAttribute('data-deck-clear', 'false');
  await expect(handlerStatus).toContainText('Deck not clear');
  await expect(handlerStatus).toContainText('Deck crew forward');
  await expect(lane(handler, 2).getByTestId('deck-status')).toHaveAttribute('data-deck-clear', 'true');
  // The handler reads the deck status; setting it is the air boss's alone.
  await expect(handler.getByRole('button', { name: /Hold cat|Clear cat/ })).toHaveCount(0);

  const boardOfBoss = await openAs(browser, 'airboss', `/lineup?cycle=${cycle.id}`);
  await boardOfBoss.getByRole('button', { name: 'Actions for C22' }).click();
  await boardOfBoss
    .getByRole('menuitem', { name: 'Grant waiver: excess wind over deck below the recommended value…' })
    .click();
  const dialog = boardOfBoss.getByRole('dialog');
  await expect(dialog).toContainText('is below the recommended');
  // The waiver states the excess wind over deck, a launch figure: the caution goes with it.
  await expect(dialog.getByTestId('caution-line')).toBeVisible();
  await dialog.getByRole('button', { name: 'Grant waiver' }).click();
  await expect(dialog.getByText('Say why.')).toBeVisible();
  await dialog.getByLabel('Reason').fill('Ship cannot make more wind');
  await dialog.getByRole('button', { name: 'Grant waiver' }).click();
  await expect(boardOfBoss.getByTestId('notice')).toContainText('Waiver granted for C22');

  await expect(card(lane(handler, 1), 'C22').getByTestId('waiver')).toBeVisible();
  await expect(card(lane(boardOfBoss, 1), 'C22').getByTestId('waiver')).toBeVisible();
  const waived = (await lineupOf(handlerApi, cycle.id)).slots.find((slot) => slot.sideNumber === 'C22')!;
  expect(waived.waivers).toEqual([
    expect.objectContaining({ gate: 'excess_below_recommended', reason: 'Ship cannot make more wind' }),
  ]);
  expect(waived.gates).toEqual(
    expect.arrayContaining([expect.objectContaining({ gate: 'excess_below_recommended', waived: true })]),
  );
  // Waived once: nothing is left for the air boss to grant on it, so its menu is gone.
  await expect(boardOfBoss.getByRole('button', { name: 'Actions for C22' })).toHaveCount(0);
  await handlerApi.dispose();
});
