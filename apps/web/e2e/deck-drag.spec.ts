import { expect, test, type Locator, type Page } from '@playwright/test';
import { apiAs, lineupOf, placeInLane, planCycle } from './support/demo-api.js';
import { dragWithTouch, openAs } from './support/screens.js';

const place = (page: Page, key: string) => page.getByTestId(`place-${key}`);
const chip = (scope: Page | Locator, side: string) => scope.getByTestId(`chip-${side}`);

test('the handler tows an aircraft from the hangar up an elevator to a deck spot by touch on a tablet', async ({
  browser,
}) => {
  const { cycle, slotIds } = await planCycle({ aircraft: [{ side: 'C30', grossWeightLb: 42_000 }] });
  const slotId = slotIds.get('C30')!;
  const handlerApi = await apiAs('handler');
  await placeInLane(handlerApi, cycle.id, slotId, 1);
  const before = (await lineupOf(handlerApi, cycle.id)).slots.find((slot) => slot.id === slotId)!;
  const toBay = await handlerApi.post(`/api/cycles/${cycle.id}/deck/tows`, {
    data: { slotId, slotVersion: before.version, to: { kind: 'hangar', name: 'bay-A' } },
  });
  expect(toBay.status(), await toBay.text()).toBe(200);
  const projected = async () =>
    (await lineupOf(handlerApi, cycle.id)).slots.find((slot) => slot.id === slotId)!.projectedLaunchAt!;

  const tablet = await openAs(browser, 'handler', `/deck?cycle=${cycle.id}`, { width: 1024, height: 768 }, true);
  const observer = await openAs(browser, 'observer', `/deck?cycle=${cycle.id}`);
  for (const page of [tablet, observer]) {
    await expect(page.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
    await expect(chip(place(page, 'hangar:bay-A'), 'C30')).toBeVisible();
  }
  const inHangar = await projected();
  const shownInHangar = await chip(observer, 'C30').getByTestId('chip-launch').textContent();

  await dragWithTouch(tablet, chip(tablet, 'C30').getByText('C30'), place(tablet, 'elevator:lift-fwd'));
  await expect(chip(place(observer, 'elevator:lift-fwd'), 'C30')).toBeVisible();
  // The handler drags again once the tablet shows the tow: a drag from where the chip stood before would
  // carry the version before the tow, and the server refuses it as stale.
  await expect(chip(place(tablet, 'elevator:lift-fwd'), 'C30')).toBeVisible();
  const onElevator = await projected();

  await dragWithTouch(tablet, chip(tablet, 'C30').getByText('C30'), place(tablet, 'spot:bow-1'));
  await expect(chip(place(observer, 'spot:bow-1'), 'C30')).toBeVisible();
  await expect(chip(place(tablet, 'spot:bow-1'), 'C30')).toBeVisible();
  const onSpot = await projected();

  // Demo ship (invented): bay-A up lift-fwd is a 50 s trip, then 90 s taxi to cat 1; from bow-1 it is 70 s.
  expect(Date.parse(inHangar) - Date.parse(onElevator)).toBe(50_000);
  expect(Date.parse(onElevator) - Date.parse(onSpot)).toBe(20_000);
  await expect(chip(observer, 'C30').getByTestId('chip-launch')).not.toHaveText(shownInHangar!);
  await tablet.screenshot({ path: 'test-results/deck/deck-tablet-1024x768.png' });

  await handlerApi.dispose();
  await tablet.context().close();
  await observer.context().close();
});
