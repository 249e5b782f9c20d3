import { expect, test, type Page } from '@playwright/test';
import { launchingCycle } from './support/demo-api.js';
import { axeViolations } from './support/axe.js';
import { openAs } from './support/screens.js';

// The night display: a night cycle's screens come up in the dim red-amber scheme, pass axe (colour contrast
// included) at the dimmest and the brightest setting, keep the caution in full but small, and the person can
// switch the scheme and its brightness by hand.
const TABLET = { width: 1024, height: 768 };

const screens = [
  { who: 'handler', path: (cycle: number) => `/lineup?cycle=${cycle}`, ready: 'lane' },
  { who: 'cat1', path: (cycle: number) => `/cat-station?cycle=${cycle}`, ready: 'current-aircraft' },
  { who: 'pilot', path: (cycle: number) => `/my-launch?cycle=${cycle}`, ready: 'my-slot' },
];

// Two axe runs a screen on a loaded machine.
test.describe.configure({ timeout: 150_000 });

let cycleId: number;
test.beforeAll(async () => {
  cycleId = (await launchingCycle(true)).id;
});

/** Moves the brightness slider to one end with the keyboard, as a person without a mouse would. */
async function brightnessTo(page: Page, end: 'Home' | 'End') {
  await page.getByLabel('Night brightness').press(end);
  await expect(page.locator('html')).toHaveAttribute('data-night-brightness', end === 'Home' ? '1' : '5');
}

/** The page's text colour as [red, green, blue]. */
const textColour = (page: Page) =>
  page.evaluate(() => getComputedStyle(document.body).color.match(/\d+/g)!.slice(0, 3).map(Number));

for (const screen of screens) {
  test(`${screen.path(0).split('?')[0]} of a night cycle passes axe in the night scheme, dimmest and brightest`, async ({
    browser,
  }) => {
    const page = await openAs(browser, screen.who, screen.path(cycleId), TABLET);
    await expect(page.getByTestId(screen.ready).first()).toBeVisible();
    await expect(page.getByTestId('theme-switch')).toHaveAttribute('data-mode', 'night');
    await expect(page.locator('html')).toHaveClass(/dark/);

    await brightnessTo(page, 'Home');
    const [red, green, blue] = await textColour(page);
    // Red-amber: the text's red channel leads and its blue trails.
    expect(red).toBeGreaterThan(green);
    expect(green).toBeGreaterThan(blue);
    expect(await axeViolations(page), 'at the dimmest').toEqual([]);

    await brightnessTo(page, 'End');
    const brightest = await textColour(page);
    expect(brightest.every((channel, i) => channel >= [red, green, blue][i])).toBe(true);
    expect(brightest).not.toEqual([red, green, blue]);
    expect(await axeViolations(page), 'at the brightest').toEqual([]);

    const caution = page.getByTestId('caution-line');
    await expect(caution).toBeVisible();
    await expect(caution).toContainText('approved launch data');
    await expect(caution).toHaveAttribute('data-compact', 'true');
    await page.context().close();
  });
}

test('the person switches the night scheme by hand, and the device keeps the brightness', async ({ browser }) => {
  const page = await openAs(browser, 'cat1', `/cat-station?cycle=${cycleId}`, TABLET);
  await expect(page.getByTestId('current-aircraft')).toBeVisible();
  const caution = page.getByTestId('caution-line');
  await expect(caution).toHaveAttribute('data-compact', 'true');
  const cautionHeight = async () => (await caution.boundingBox())!.height;
  const nightHeight = await cautionHeight();

  await page.getByLabel('Theme').selectOption('day');
  await expect(page.locator('html')).not.toHaveClass(/dark/);
  await expect(page.getByLabel('Night brightness')).toHaveCount(0);
  await expect(caution).toHaveAttribute('data-compact', 'false');
  expect(await cautionHeight()).toBeGreaterThan(nightHeight);

  await page.getByLabel('Theme').selectOption('night');
  await expect(page.locator('html')).toHaveClass(/dark/);
  await brightnessTo(page, 'Home');
  await page.reload();
  // The document takes the kept brightness before the app has opened; the slider shows it once the header is up
  // (the session's refresh may take a while on a loaded machine).
  await expect(page.locator('html')).toHaveAttribute('data-night-brightness', '1');
  await expect(page.getByLabel('Night brightness')).toHaveValue('1', { timeout: 30_000 });
  await expect(page.getByLabel('Theme')).toHaveValue('night');
  await page.context().close();
});
