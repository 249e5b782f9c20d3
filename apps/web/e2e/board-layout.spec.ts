import { mkdirSync, writeFileSync } from 'node:fs';
import { expect, test, type Page } from '@playwright/test';
import { apiAs, lineupOf, placeInLane, planCycle } from './support/demo-api.js';
import { card, openAs, pool } from './support/screens.js';

// The handler's board must be readable at a glance on the laptop and the tablet the deck crews use.
// Held upright, a tablet has the height for the pool and summary above the lanes and still shows four
// aircraft per catapult, so its lanes may start lower than a third of the way down.
const sizes = [
  { name: 'laptop', viewport: { width: 1366, height: 768 }, touch: false, lanesFrom: 1 / 3 },
  { name: 'tablet', viewport: { width: 1024, height: 768 }, touch: true, lanesFrom: 1 / 3 },
  { name: 'upright tablet', viewport: { width: 820, height: 1180 }, touch: true, lanesFrom: 2 / 5 },
];

/** Four aircraft on every catapult, five left in the deck pool, the first on cat 1 hooked up. */
async function fullDeck() {
  const inLanes = [
    ['C21', 44_800],
    ['C22', 46_200],
    ['C23', 43_500],
    ['C24', 45_000],
    ['C25', 47_500],
    ['C26', 43_000],
    ['C27', 44_000],
    ['C28', 42_000],
    ['D33', 45_500],
    ['D34', 39_000],
    ['D35', 44_000],
    ['D36', 41_000],
    ['G43', 24_000],
    ['G44', 31_500],
    ['L47', 48_000],
    ['L48', 47_000],
  ] as const;
  const inPool = [
    ['C29', 44_500],
    ['C30', 45_500],
    ['D37', 42_000],
    ['D38', 42_500],
    ['G45', 27_000],
  ] as const;
  const { cycle, slotIds } = await planCycle({
    start: true,
    aircraft: [...inLanes, ...inPool].map(([side, grossWeightLb]) => ({ side, grossWeightLb })),
  });
  const handler = await apiAs('handler');
  for (const [index, [side]] of inLanes.entries()) {
    await placeInLane(handler, cycle.id, slotIds.get(side)!, (index % 4) + 1);
  }
  const cat1 = await apiAs('cat1');
  for (const to of ['taxiing', 'on_catapult']) {
    const slot = (await lineupOf(cat1, cycle.id)).slots.find((candidate) => candidate.sideNumber === 'C21')!;
    const response = await cat1.post(`/api/cycles/${cycle.id}/lineup/slots/${slot.id}/advance`, {
      data: { slotVersion: slot.version, to },
    });
    expect(response.ok(), await response.text()).toBe(true);
  }
  await Promise.all([handler.dispose(), cat1.dispose()]);
  return cycle;
}

/** Where things are in the first screen, from the browser's own layout. */
function measure(page: Page) {
  return page.evaluate(() => {
    const box = (element: Element) => {
      const rect = element.getBoundingClientRect();
      return { top: rect.top, bottom: rect.bottom, left: rect.left, right: rect.right };
    };
    const all = (selector: string, scope: ParentNode = document) => [...scope.querySelectorAll(selector)];
    const lanes = all('[data-testid="lane"]').map((lane) => ({
      ...box(lane),
      cardsInView: all('[data-testid="slot-card"]', lane).filter((card) => box(card).bottom <= window.innerHeight)
        .length,
    }));
    const pool = document.querySelector('[data-testid="deck-pool"]')!;
    // Pool cards past the strip's edge are scrolled out of sight: only what the strip shows can overlap a lane.
    // Folded, the pool shows no cards.
    const cards = document.querySelector('[data-testid="deck-pool-cards"]');
    const strip = cards ? box(cards) : { top: 0, bottom: 0, left: 0, right: 0 };
    const shown = (card: ReturnType<typeof box>) => ({
      top: Math.max(card.top, strip.top),
      bottom: Math.min(card.bottom, strip.bottom),
      left: Math.max(card.left, strip.left),
      right: Math.min(card.right, strip.right),
    });
    return {
      height: window.innerHeight,
      width: window.innerWidth,
      lanes,
      caution: box(document.querySelector('[data-testid="caution-line"]')!),
      pool: box(pool),
      poolCards: all('[data-testid="slot-card"]', pool)
        .map((card) => shown(box(card)))
        .filter((card) => card.left < card.right),
      poolClips: cards !== null && getComputedStyle(cards).overflowX !== 'visible',
      sideNumberPx: all('[data-testid="side-number"]').map((side) => parseFloat(getComputedStyle(side).fontSize)),
    };
  });
}

for (const size of sizes) {
  test(`the ${size.name} board (${size.viewport.width}×${size.viewport.height}) shows all four catapults near the top`, async ({
    browser,
  }) => {
    const cycle = await fullDeck();
    const page = await openAs(browser, 'handler', `/lineup?cycle=${cycle.id}`, size.viewport, size.touch);
    // The board's first draw after sign-in (21 aircraft) takes longer than 5 s on a loaded test machine.
    await expect(page.getByTestId('lane')).toHaveCount(4, { timeout: 15_000 });
    await expect(page.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');
    const at = await measure(page);
    mkdirSync('test-results/board', { recursive: true });
    writeFileSync(
      `test-results/board/measured-${size.viewport.width}x${size.viewport.height}.json`,
      JSON.stringify(at, null, 1),
    );
    await page.screenshot({ path: `test-results/board/lineup-${size.viewport.width}x${size.viewport.height}.png` });

    for (const lane of at.lanes) {
      expect(lane.top, 'a catapult lane starts near the top of the screen').toBeLessThanOrEqual(
        at.height * size.lanesFrom,
      );
      expect(lane.right, 'every lane fits across the screen').toBeLessThanOrEqual(at.width);
      expect(lane.cardsInView, 'at least three aircraft per catapult in the first screen').toBeGreaterThanOrEqual(3);
    }
    expect(at.caution.top).toBeGreaterThanOrEqual(0);
    expect(at.caution.bottom, 'the caution is in the first screen').toBeLessThanOrEqual(at.height);
    expect(at.poolClips, 'the pool strip clips the cards it scrolls').toBe(true);
    expect(at.poolCards.length, 'the pool shows some of its aircraft').toBeGreaterThanOrEqual(2);
    const cat1 = at.lanes[0];
    for (const card of at.poolCards) {
      expect(card.right, 'a deck pool card stays inside the pool').toBeLessThanOrEqual(at.pool.right + 0.5);
      const overlapsCat1 =
        card.left < cat1.right && card.right > cat1.left && card.top < cat1.bottom && card.bottom > cat1.top;
      expect(overlapsCat1, 'a deck pool card never lies over cat 1').toBe(false);
    }
    for (const px of at.sideNumberPx) expect(px).toBeGreaterThanOrEqual(24);

    await expect(page.locator('[data-testid="slot-card"][data-mark="on-catapult"]')).toHaveAttribute(
      'data-side-number',
      'C21',
    );
    await expect(page.locator('[data-testid="lane"][data-catapult-number="1"] [data-mark="next"]')).toHaveAttribute(
      'data-side-number',
      'C25',
    );
    await expect(page.getByRole('button', { name: 'Actions for C22' })).toBeVisible();

    // Folded, the deck pool gives its height to the catapults; unfolded, its aircraft are back.
    const toggle = page.getByTestId('deck-pool-toggle');
    const laneTops = () =>
      page.getByTestId('lane').evaluateAll((lanes) => lanes.map((lane) => lane.getBoundingClientRect().top));
    await expect(toggle).toHaveAttribute('aria-expanded', 'true');
    const unfolded = await laneTops();
    await toggle.click();
    await expect(toggle).toHaveAttribute('aria-expanded', 'false');
    await expect(page.getByTestId('deck-pool-cards')).toHaveCount(0);
    const folded = await measure(page);
    await page.screenshot({
      path: `test-results/board/lineup-folded-${size.viewport.width}x${size.viewport.height}.png`,
    });
    for (const [index, lane] of folded.lanes.entries()) {
      // At least a line of a card's height: the fold is worth pressing.
      expect(lane.top, `cat ${index + 1} moves up with the pool folded`).toBeLessThanOrEqual(unfolded[index] - 24);
      expect(lane.cardsInView, `cat ${index + 1} shows no fewer aircraft`).toBeGreaterThanOrEqual(
        at.lanes[index].cardsInView,
      );
    }
    expect(folded.caution.bottom, 'the caution is still in the first screen').toBeLessThanOrEqual(folded.height);
    await expect(page.getByTestId('lineup-warnings'), 'the warnings are still there').toBeInViewport();
    await expect(page.getByTestId('last-launch')).toBeInViewport();
    await toggle.click();
    await expect(toggle).toHaveAttribute('aria-expanded', 'true');
    await expect(card(pool(page), 'C29')).toBeVisible();
    for (const [index, top] of (await laneTops()).entries()) {
      expect(top, `cat ${index + 1} back where it was`).toBeCloseTo(unfolded[index], 0);
    }
    await page.context().close();
  });
}
