import { expect, test } from '@playwright/test';
import { apiAs, placeInLane, planCycle } from './support/demo-api.js';
import { card, dragWithMouse, lane, openAs, pool } from './support/screens.js';

test("a spare replaces a down aircraft and its pilot's tablet follows", async ({ browser }) => {
  // C22 and D41 are both WKD-41; G43 flies C22's mission on another type; L47 neither.
  const { cycle, slotIds } = await planCycle({
    aircraft: [
      { side: 'C22', grossWeightLb: 40_000, pilot: 'pilot' },
      { side: 'L47', grossWeightLb: 47_000, spare: true, mission: 'Tanker' },
      { side: 'G43', grossWeightLb: 24_000, spare: true },
      { side: 'D41', grossWeightLb: 40_000, spare: true, mission: 'Spare' },
    ],
    start: true,
  });
  const api = await apiAs('handler');
  await placeInLane(api, cycle.id, slotIds.get('C22')!, 1);
  await api.dispose();

  const handler = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`);
  const pilot = await openAs(browser, 'pilot', `/my-launch?cycle=${cycle.id}`, { width: 1024, height: 768 }, true);
  await expect(handler.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
  await expect(pilot.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
  await expect(pilot.getByTestId('my-slot')).toHaveAttribute('data-side-number', 'C22');
  await expect(pilot.getByTestId('my-catapult')).toContainText('Cat 1');
  // Held spares wait in the deck pool, not counted in the launch until one is called.
  await expect(handler.getByTestId('launched-count')).toHaveText('0 of 1');

  await handler.getByRole('button', { name: 'Actions for C22' }).click();
  await handler.getByRole('menuitem', { name: 'Mark down…' }).click();
  await handler.getByRole('dialog').getByRole('button', { name: 'Mark C22 down' }).click();
  await expect(handler.getByTestId('down-list')).toContainText('C22');
  await expect(card(lane(handler, 1), 'C22')).toHaveCount(0);
  await expect(handler.getByTestId('launched-count')).toHaveText('0 of 0');
  await expect(pilot.getByTestId('slot-status')).toHaveText('Down');

  await handler.getByTestId('down-list').getByRole('button', { name: 'Actions for C22' }).click();
  await handler.getByRole('menuitem', { name: 'Call a spare…' }).click();
  const dialog = handler.getByRole('dialog');
  await expect(dialog).toContainText('Kit Marrowby moves to it.');
  await expect(dialog.getByRole('combobox').locator('option')).toHaveText([
    'D41 · WKD-41 · Spare (same type)',
    'G43 · MSD-26 · Training sortie (same mission)',
    'L47 · FGD-63 · Tanker (other)',
  ]);
  await dialog.getByRole('button', { name: 'Call D41' }).click();
  await expect(handler.getByTestId('notice')).toContainText('D41 called for C22');

  // The pilot's tablet moves to the spare, live, without a reload.
  await expect(pilot.getByTestId('my-slot')).toHaveAttribute('data-side-number', 'D41', { timeout: 2_000 });
  await expect(pilot.getByTestId('my-catapult')).toContainText('Deck pool');
  await expect(pilot.getByTestId('slot-status')).toHaveText('Planned');
  await expect(card(pool(handler), 'D41')).toContainText('Kit Marrowby');
  await expect(handler.getByTestId('launched-count')).toHaveText('0 of 1');

  // The handler puts the spare where C22 stood; the tablet shows its catapult and place.
  await dragWithMouse(handler, card(pool(handler), 'D41'), lane(handler, 1).getByTestId('lane-drop-zone'));
  await expect(card(lane(handler, 1), 'D41')).toBeVisible();
  await expect(pilot.getByTestId('my-catapult')).toContainText('Cat 1', { timeout: 2_000 });
  await expect(pilot.getByTestId('my-place')).toContainText('Next (1st)', { timeout: 2_000 });
  await expect(pilot.getByTestId('caution-line')).toBeVisible();
});
