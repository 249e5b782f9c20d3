import { expect, test, type Page } from '@playwright/test';
import { apiAs, lineupOf, placeInLane, planCycle } from './support/demo-api.js';
import { card, expectNoSidewaysOverflow, lane, openAs, pool } from './support/screens.js';

const sizes = [
  { width: 1366, height: 768 },
  { width: 1024, height: 768 },
  { width: 390, height: 844 },
  { width: 820, height: 1180 },
];

/** Each screen, and what it must show at every size (the busy cycle below: C25 is on cat 1, C26 behind it). */
const screens = [
  {
    name: 'lineup',
    who: 'handler',
    path: '/lineup',
    mustShow: async (page: Page) => {
      for (const number of [1, 2, 3, 4]) await expect(lane(page, number)).toBeVisible();
      await expect(lane(page, 1)).toBeInViewport();
      for (const [number, sides] of [
        [1, ['C25', 'C26']],
        [2, ['D33', 'G44']],
        [3, ['D34', 'G43']],
        [4, ['L47']],
      ] as const) {
        for (const side of sides) await expect(card(lane(page, number), side)).toBeVisible();
      }
      await expect(pool(page)).toBeVisible();
      await expect(page.getByTestId('lineup-summary')).toBeVisible();
    },
  },
  {
    name: 'cat-station',
    who: 'cat1',
    path: '/cat-station',
    mustShow: async (page: Page) => {
      await expect(page.getByTestId('current-aircraft')).toHaveAttribute('data-side-number', 'C25');
      await expect(page.getByTestId('current-aircraft')).toBeInViewport();
      await expect(page.getByTestId('cat-figures')).toBeVisible();
      await expect(page.getByTestId('step-weight_agreed')).toBeVisible();
      await expect(page.getByTestId('next-up')).toContainText('C26');
    },
  },
  {
    name: 'my-launch',
    who: 'pilot',
    path: '/my-launch',
    mustShow: async (page: Page) => {
      await expect(page.getByTestId('my-slot')).toHaveAttribute('data-side-number', 'C25');
      await expect(page.getByTestId('my-slot')).toBeInViewport();
      await expect(page.getByTestId('my-catapult')).toContainText('Cat 1');
      await expect(page.getByTestId('acknowledge-weight')).toBeVisible();
    },
  },
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

test('Lineup, Cat station and My launch show what they must on a laptop, a tablet and a phone, with no sideways overflow', async ({
  browser,
}) => {
  test.setTimeout(240_000);
  const cycle = await busyCycle(false);
  for (const size of sizes) {
    for (const screen of screens) {
      const page = await openAs(browser, screen.who, `${screen.path}?cycle=${cycle.id}`, size);
      await screen.mustShow(page);
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
