import { expect, test } from '@playwright/test';
import { apiAs, placeInLane, planCycle } from './support/demo-api.js';
import { openAs } from './support/screens.js';

test('a live screen says when it is offline and catches up when the network is back', async ({ browser }) => {
  const { cycle, slotIds } = await planCycle({ aircraft: [{ side: '205', grossWeightLb: 42_000, pilot: 'pilot3' }] });
  const pilot = await openAs(browser, 'pilot3', `/my-launch?cycle=${cycle.id}`);
  const badge = pilot.getByTestId('connection-state');
  await expect(badge).toHaveText('Live');

  await pilot.context().setOffline(true);
  await expect(badge).toHaveText(/^Offline since \d\d:\d\d:\d\d$/);
  const handler = await apiAs('handler');
  await placeInLane(handler, cycle.id, slotIds.get('205')!, 2);
  await handler.dispose();

  await pilot.context().setOffline(false);
  await expect(badge).toHaveText('Live', { timeout: 10_000 });
  await expect(pilot.getByTestId('my-catapult')).toContainText('Cat 2');
});
