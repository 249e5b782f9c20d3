import { expect, test, type Page } from '@playwright/test';
import { apiAs, lineupOf, placeInLane, planCycle } from './support/demo-api.js';
import { expectNoSidewaysOverflow, openAs } from './support/screens.js';

const sizes = [
  { width: 1366, height: 768 },
  { width: 1024, height: 768 },
  { width: 390, height: 844 },
  { width: 820, height: 1180 },
];

const screens = [
  { name: 'lineup', who: 'handler', path: '/lineup', ready: (page: Page) => page.getByTestId('lane').first() },
  {
    name: 'cat-station',
    who: 'cat1',
    path: '/cat-station',
    ready: (page: Page) => page.getByTestId('current-aircraft'),
  },
  { name: 'my-launch', who: 'pilot', path: '/my-launch', ready: (page: Page) => page.getByTestId('my-slot') },
];

/** A busy cycle: lanes on every catapult, aircraft left in the pool, one no-go, one aircraft at the catapult. */
async function busyCycle(night: boolean) {
  const { cycle, slotIds } = await planCycle({
    night,
    start: true,
    aircraft: [
      { side: night ? 'C31' : 'C25', grossWeightLb: 47_500, pilot: 'pilot' },
      { side: night ? 'C32' : 'C26', grossWeightLb: 43_000 },
      { side: night ? 'D39' : 'D33', grossWeightLb: 45_500 },
      { side: night ? 'D40' : 'D34', grossWeightLb: 39_000 },
      { side: night ? 'G45' : 'G43', grossWeightLb: 24_000 },
      { side: night ? 'G46' : 'G44', grossWeightLb: 31_500 },
      { side: night ? 'L49' : 'L47', grossWeightLb: 48_000 },
      { side: night ? 'D41' : 'D35', grossWeightLb: 44_000 },
      { side: night ? 'D42' : 'D36', grossWeightLb: 41_000, spare: true },
    ],
  });
  const handler = await apiAs('handler');
  const ids = [...slotIds.values()];
  const lanes = [1, 1, 2, 3, 3, 2, 4];
  for (const [index, catapult] of lanes.entries()) await placeInLane(handler, cycle.id, ids[index], catapult);
  const cat1 = await apiAs('cat1');
  for (const to of ['taxiing', 'on_catapult']) {
    const slot = (await lineupOf(cat1, cycle.id)).slots.find((candidate) => candidate.id === ids[0])!;
    const response = await cat1.post(`/api/cycles/${cycle.id}/lineup/slots/${slot.id}/advance`, {
      data: { slotVersion: slot.version, to },
    });
    expect(response.ok(), await response.text()).toBe(true);
  }
  await Promise.all([handler.dispose(), cat1.dispose()]);
  return cycle;
}

test('Lineup, Cat station and My launch fit a laptop, a tablet and a phone', async ({ browser }) => {
  test.setTimeout(240_000);
  const cycle = await busyCycle(false);
  for (const size of sizes) {
    for (const screen of screens) {
      const page = await openAs(browser, screen.who, `${screen.path}?cycle=${cycle.id}`, size);
      await expect(screen.ready(page)).toBeVisible();
      await expect(page.getByTestId('caution-line')).toBeVisible();
      await expect(page.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
      await expectNoSidewaysOverflow(page);
      await page.screenshot({
        path: `test-results/screens/${screen.name}-${size.width}x${size.height}.png`,
        fullPage: true,
      });
      await page.context().close();
    }
  }
});

test('a night cycle dims the screens by itself, and the header can override it', async ({ browser }) => {
  const cycle = await busyCycle(true);
  const station = await openAs(browser, 'cat1', `/cat-station?cycle=${cycle.id}`, sizes[1]);
  await expect(station.getByTestId('current-aircraft')).toBeVisible();
  await expect(station.locator('html')).toHaveClass(/dark/);
  await expect(station.getByTestId('theme-switch')).toHaveAttribute('data-mode', 'night');
  await station.screenshot({ path: 'test-results/screens/cat-station-night-1024x768.png', fullPage: true });

  await station.getByLabel('Theme').selectOption('day');
  await expect(station.locator('html')).not.toHaveClass(/dark/);
  await station.getByLabel('Theme').selectOption('auto');
  await expect(station.locator('html')).toHaveClass(/dark/);

  const lineup = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`, sizes[0]);
  await expect(lineup.getByTestId('lane').first()).toBeVisible();
  await expect(lineup.locator('html')).toHaveClass(/dark/);
  await lineup.screenshot({ path: 'test-results/screens/lineup-night-1366x768.png', fullPage: true });
});
