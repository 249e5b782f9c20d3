import { expect, test } from '@playwright/test';
import { apiAs, placeInLane, planCycle } from './support/demo-api.js';
import { openAs } from './support/screens.js';

test('a live screen says when it is offline and catches up when the network is back', async ({ browser }) => {
  const { cycle, slotIds } = await planCycle({ aircraft: [{ side: 'D37', grossWeightLb: 42_000, pilot: 'pilot3' }] });
  const pilot = await openAs(browser, 'pilot3', `/my-launch?cycle=${cycle.id}`);
  const badge = pilot.getByTestId('connection-state');
  await expect(badge).toHaveText('Live');

  await pilot.context().setOffline(true);
  await expect(badge).toHaveText(/^Offline since \d\d:\d\d:\d\d UTC$/);
  const handler = await apiAs('handler');
  await placeInLane(handler, cycle.id, slotIds.get('D37')!, 2);
  await handler.dispose();

  await pilot.context().setOffline(false);
  await expect(badge).toHaveText('Live', { timeout: 10_000 });
  await expect(pilot.getByTestId('my-catapult')).toContainText('Cat 2');
});

test('while the network is gone the pilot sees stale figures marked, a stopped countdown and no confirm', async ({
  browser,
}) => {
  const { cycle, slotIds } = await planCycle({ aircraft: [{ side: 'D38', grossWeightLb: 42_000, pilot: 'pilot3' }] });
  const handler = await apiAs('handler');
  await placeInLane(handler, cycle.id, slotIds.get('D38')!, 1);
  await handler.dispose();
  const pilot = await openAs(browser, 'pilot3', `/my-launch?cycle=${cycle.id}`);
  const figures = pilot.getByTestId('live-figures');
  const countdown = pilot.getByTestId('countdown');
  const confirm = pilot.getByTestId('acknowledge-weight');
  await expect(confirm).toBeEnabled();

  await pilot.context().setOffline(true);
  await expect(confirm).toBeDisabled();
  const frozenAt = await countdown.textContent();
  await pilot.waitForTimeout(2_500);
  await expect(countdown).toHaveText(frozenAt!);
  await expect(figures).toHaveAttribute('data-live', 'false');
  await expect(pilot.getByTestId('not-live')).toHaveText(/^Not live — last update \d\d:\d\d:\d\d UTC$/);

  await pilot.context().setOffline(false);
  await expect(pilot.getByTestId('connection-state')).toHaveText('Live', { timeout: 10_000 });
  await expect(figures).toHaveAttribute('data-live', 'true');
  await expect(pilot.getByTestId('not-live')).toHaveCount(0);
  await expect(confirm).toBeEnabled();
  await expect(countdown).not.toHaveText(frozenAt!);
});
