import { expect, test, type Page } from '@playwright/test';
import { LAUNCH_CAUTION } from '@catline/contracts';
import { apiAs, placeInLane, planCycle } from './support/demo-api.js';
import { openAs } from './support/screens.js';

/**
 * Every screen that shows a launch figure (gross weight included), who opens it, and how to reach the
 * figures once it is open. A new screen with a launch figure belongs in this list.
 */
const screens: {
  name: string;
  who: string;
  path: (cycleId: number) => string;
  reveal?: (page: Page, cycleNumber: number) => Promise<void>;
}[] = [
  { name: 'Lineup', who: 'handler', path: (cycleId) => `/lineup?cycle=${cycleId}` },
  { name: 'Deck', who: 'handler', path: (cycleId) => `/deck?cycle=${cycleId}` },
  { name: 'Cat station', who: 'cat1', path: (cycleId) => `/cat-station?cycle=${cycleId}` },
  { name: 'My launch', who: 'pilot', path: (cycleId) => `/my-launch?cycle=${cycleId}` },
  { name: 'Launch data', who: 'admin', path: () => '/launch-data' },
  {
    name: 'Cycles: adding aircraft and the air-plan preview',
    who: 'airops',
    path: () => '/cycles',
    reveal: (page, cycleNumber) => page.getByRole('button', { name: `Show cycle ${cycleNumber}` }).click(),
  },
  { name: 'Reports', who: 'observer', path: () => '/reports' },
  { name: 'Replay', who: 'observer', path: (cycleId) => `/reports/replay?cycle=${cycleId}` },
  { name: 'Launch sheet', who: 'observer', path: (cycleId) => `/reports/launch-sheet?cycle=${cycleId}` },
];

test('every screen with a launch figure shows the launch caution, and the launch sheet prints it', async ({
  browser,
}) => {
  test.setTimeout(180_000);
  const { cycle, slotIds } = await planCycle({
    start: true,
    aircraft: [{ side: 'C21', grossWeightLb: 45_000, pilot: 'pilot' }],
  });
  const handler = await apiAs('handler');
  await placeInLane(handler, cycle.id, slotIds.get('C21')!, 1);
  await handler.dispose();

  for (const screen of screens) {
    const page = await openAs(browser, screen.who, screen.path(cycle.id));
    await screen.reveal?.(page, cycle.number);
    await expect(page.getByTestId('caution-line'), screen.name).toContainText(LAUNCH_CAUTION);
    if (screen.name === 'Launch sheet') {
      await page.emulateMedia({ media: 'print' });
      await expect(page.getByTestId('caution-line'), 'the printed launch sheet').toBeVisible();
    }
    await page.context().close();
  }
});

test('the tablet stations keep the caution in view while their figures scroll', async ({ browser }) => {
  test.setTimeout(120_000);
  const { cycle, slotIds } = await planCycle({
    start: true,
    aircraft: [{ side: 'C22', grossWeightLb: 44_000, pilot: 'pilot' }],
  });
  const handler = await apiAs('handler');
  await placeInLane(handler, cycle.id, slotIds.get('C22')!, 1);
  await handler.dispose();

  // Windows shorter than the station's page, so that it scrolls and the caution has somewhere to go.
  for (const station of [
    {
      who: 'cat1',
      path: `/cat-station?cycle=${cycle.id}`,
      ready: 'current-aircraft',
      viewport: { width: 1024, height: 480 },
    },
    { who: 'pilot', path: `/my-launch?cycle=${cycle.id}`, ready: 'my-slot', viewport: { width: 820, height: 480 } },
    { who: 'pilot', path: `/my-launch?cycle=${cycle.id}`, ready: 'my-slot', viewport: { width: 390, height: 600 } },
  ]) {
    const page = await openAs(browser, station.who, station.path, station.viewport);
    await expect(page.getByTestId(station.ready)).toBeVisible();
    const caution = page.getByTestId('caution-line');
    const overflow = await page.evaluate(() => document.documentElement.scrollHeight - window.innerHeight);
    expect(overflow, `${station.path} scrolls at ${station.viewport.width}x${station.viewport.height}`).toBeGreaterThan(
      100,
    );
    for (const to of ['top', 'bottom'] as const) {
      await page.evaluate((end) => window.scrollTo(0, end === 'top' ? 0 : document.body.scrollHeight), to);
      await expect(
        caution,
        `${station.path} at ${station.viewport.width}x${station.viewport.height}, ${to}`,
      ).toBeInViewport({ ratio: 1 });
    }
    await page.context().close();
  }
});
