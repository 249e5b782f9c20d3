import { expect, test } from '@playwright/test';
import type { CycleView } from '@catline/contracts';
import { apiAs, pilotsWithoutOpenSlots, placeInLane, planCycle } from './support/demo-api.js';
import { openAs } from './support/screens.js';

test('each person lands on their cycle, and the Cycles list and the screens on a cycle follow its closing live', async ({
  browser,
}) => {
  // Two cycles: one launching; one planned after it holding the only slot of a pilot, on catapult 1 too.
  const [pilot, other] = await pilotsWithoutOpenSlots(2);
  const { cycle: launching } = await planCycle({
    start: true,
    aircraft: [{ side: 'C23', grossWeightLb: 43_500, pilot: other }],
  });
  const { cycle: planned, slotIds } = await planCycle({
    aircraft: [{ side: 'C24', grossWeightLb: 45_100, pilot }],
  });
  const handlerApi = await apiAs('handler');
  await placeInLane(handlerApi, planned.id, slotIds.get('C24')!, 1);
  await handlerApi.dispose();

  // Opened without ?cycle=, each screen takes the cycle the server lands its person on into the address.
  const pilotPage = await openAs(browser, pilot, '/my-launch');
  await expect(pilotPage).toHaveURL(new RegExp(`[?&]cycle=${planned.id}\\b`));
  await expect(pilotPage.getByText(`Cycle ${planned.number}`, { exact: true })).toBeVisible();

  const station = await openAs(browser, 'cat1', '/cat-station');
  await expect(station).toHaveURL(new RegExp(`[?&]cycle=${launching.id}\\b`));
  await expect(station.getByTestId('closed-cycle-notice')).toHaveCount(0);

  const list = await openAs(browser, 'observer', '/cycles');
  // The row whose name starts with the cycle's number: another row may hold that number in another column.
  const row = list.getByRole('row', { name: new RegExp(`^${launching.number} `) });
  await expect(row).toContainText('executing');

  const airops = await apiAs('airops');
  const current = (await (await airops.get(`/api/cycles/${launching.id}`)).json()) as CycleView;
  const closed = await airops.post(`/api/cycles/${launching.id}/close`, { data: { basisVersion: current.version } });
  expect(closed.status(), await closed.text()).toBe(200);
  await airops.dispose();

  // No reload: the list's row and the station on the closed cycle change with the live feed.
  await expect(row).toContainText('closed');
  await expect(station.getByTestId('closed-cycle-notice')).toContainText('This cycle is closed');
  await expect(
    station
      .getByRole('combobox', { name: 'Cycle on screen' })
      .getByRole('option', { name: new RegExp(`^Cycle ${launching.number} · .* · closed`) }),
  ).toHaveCount(1);
});
