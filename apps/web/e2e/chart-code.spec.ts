import { expect, test, type Response } from '@playwright/test';
import { signIn } from './support/screens.js';

// The charts' code is for the report screens only: the sign-in page and the lineup a handler opens first
// must not load it. Its wrapper's class name survives minification, so the scripts that carry it show.
const CHART_MARK = 'recharts-wrapper';

test('the chart code loads with the reports, not with the sign-in page or the lineup', async ({ browser }) => {
  const context = await browser.newContext();
  const page = await context.newPage();
  const scripts: Response[] = [];
  page.on('response', (response) => {
    if (response.request().resourceType() === 'script') scripts.push(response);
  });
  const chartScripts = async () => {
    const texts = await Promise.all(
      scripts.splice(0).map(async (response) => (await response.text()).includes(CHART_MARK)),
    );
    return texts.filter(Boolean).length;
  };

  await page.goto('/lineup');
  await signIn(page, 'handler');
  await expect(page.getByTestId('lane').first()).toBeVisible();
  expect(await chartScripts(), 'scripts with chart code loaded by the sign-in page and the lineup').toBe(0);

  await page.getByRole('link', { name: 'Reports' }).click();
  await expect(page.getByRole('link', { name: 'Cycle report' })).toBeVisible({ timeout: 10_000 });
  expect(await chartScripts(), 'scripts with chart code loaded by the reports').toBeGreaterThan(0);
  await context.close();
});
