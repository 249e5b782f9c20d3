import { expect, test } from '@playwright/test';
import { apiAs, DEMO_PASSWORD } from './support/demo-api.js';
import { openAs, signIn } from './support/screens.js';

test('an ended session sends the person to sign in with a reason, then back to where they were', async ({
  browser,
}) => {
  const page = await openAs(browser, 'pilot2', '/fleet');
  await expect(page.getByRole('heading', { name: 'Fleet' })).toBeVisible();

  // Changing the password ends every session of that person, this tablet's included.
  // (and back again, from a new session, so the demo password stays the same).
  for (const [currentPassword, newPassword] of [
    [DEMO_PASSWORD, `${DEMO_PASSWORD}-2`],
    [`${DEMO_PASSWORD}-2`, DEMO_PASSWORD],
  ]) {
    const elsewhere = await apiAs('pilot2', currentPassword);
    const response = await elsewhere.post('/api/auth/password', { data: { currentPassword, newPassword } });
    expect(response.status(), await response.text()).toBe(204);
    await elsewhere.dispose();
  }

  await page.getByRole('link', { name: 'Cycles' }).click();
  await expect(page.getByTestId('session-notice')).toContainText('session has ended');
  await signIn(page, 'pilot2');
  await expect(page).toHaveURL(/\/cycles$/);
  await expect(page.getByRole('heading', { name: 'Cycles' })).toBeVisible();

  // Signing out on purpose: no reason shown, and the next person lands on their own main screen.
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
  await expect(page.getByTestId('session-notice')).toHaveCount(0);
  await signIn(page, 'observer');
  await expect(page).toHaveURL(/\/lineup/);
  await expect(page.getByTestId('read-only-note').or(page.getByTestId('empty-state'))).toBeVisible();
});

test('a wrong password shows the server’s refusal', async ({ page }) => {
  await page.goto('/');
  await expect(page).toHaveURL(/\/sign-in/);
  await page.getByLabel('E-mail').fill('observer@catline.example');
  await page.getByLabel('Password').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('sign-in-error')).toBeVisible();
  await expect(page.getByTestId('sign-in-error')).not.toBeEmpty();
});
