import { expect, test } from '@playwright/test';
import type { LineupSnapshot } from '@catline/contracts';
import { apiAs, lineupOf, placeInLane, planCycle } from './support/demo-api.js';
import { card, lane, openAs } from './support/screens.js';

test('an aircraft projected after its window closes shows late on the board, with the caution', async ({ browser }) => {
  const { cycle, slotIds } = await planCycle({
    aircraft: [
      { side: 'C22', grossWeightLb: 42_000 },
      { side: 'C23', grossWeightLb: 42_000 },
    ],
  });
  const handler = await apiAs('handler');
  for (const side of ['C22', 'C23']) await placeInLane(handler, cycle.id, slotIds.get(side)!, 1);
  await handler.dispose();
  // The window closes a second after the planned start: neither aircraft can be off by then.
  const airops = await apiAs('airops');
  const { version } = await lineupOf(airops, cycle.id);
  const windowEndAt = new Date(Date.parse(cycle.plannedLaunchAt) + 1_000).toISOString();
  const patched = await airops.patch(`/api/cycles/${cycle.id}/conditions`, {
    data: { basisVersion: version, windowEndAt },
  });
  expect(patched.status(), await patched.text()).toBe(200);
  const snapshot: LineupSnapshot = await lineupOf(airops, cycle.id);
  await airops.dispose();
  const second = snapshot.slots.find((slot) => slot.id === slotIds.get('C23'))!;
  expect(second.timing?.window.verdict).toBe('late');

  const page = await openAs(browser, 'observer', `/lineup?cycle=${cycle.id}`);
  const timing = card(lane(page, 1), 'C23').getByTestId('launch-timing');
  await expect(timing).toHaveText(`${second.timing!.window.minutes} min late`);
  await expect(timing).toHaveAttribute('title', /min after the window ends/);
  await expect(page.getByTestId('caution-line').first()).toBeVisible();
});
