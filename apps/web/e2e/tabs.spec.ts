import { expect, test } from '@playwright/test';
import { openAs } from './support/screens.js';

test('six tabs opened at once share one session: every refresh is answered and none lands on sign-in', async ({
  browser,
}) => {
  const first = await openAs(browser, 'observer', '/fleet');
  await expect(first.getByRole('heading', { name: 'Fleet' })).toBeVisible();
  const context = first.context();
  const refreshes: number[] = [];
  context.on('response', (response) => {
    if (response.url().endsWith('/api/auth/refresh')) refreshes.push(response.status());
  });

  const tabs = await Promise.all(Array.from({ length: 6 }, () => context.newPage()));
  await Promise.all(tabs.map((tab) => tab.goto('/fleet')));

  for (const tab of tabs) {
    await expect(tab.getByRole('heading', { name: 'Fleet' })).toBeVisible();
    await expect(tab).toHaveURL(/\/fleet$/);
  }
  expect(refreshes.length).toBeGreaterThan(0);
  expect(refreshes.every((status) => status === 200)).toBe(true);
  // The tabs still hold a live session afterwards: one more tab restores it.
  const later = await context.newPage();
  await later.goto('/fleet');
  await expect(later.getByRole('heading', { name: 'Fleet' })).toBeVisible();
  await context.close();
});
