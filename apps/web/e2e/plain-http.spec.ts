import { expect, test } from '@playwright/test';
import { debianChromium } from './support/chromium.js';
import { signIn } from './support/screens.js';

// A ship's internal network serves the app over plain HTTP under its own host name. Chromium maps
// ship.test to 127.0.0.1 here, so the traffic never leaves this machine.
const port = process.env.E2E_PORT ?? '3100';
const shipAddress = `http://ship.test:${port}`;

test.use({
  launchOptions: { ...debianChromium, args: [...debianChromium.args, '--host-resolver-rules=MAP ship.test 127.0.0.1'] },
});

test('over plain HTTP under a ship-network name the app loads, signs in and goes live', async ({ page }) => {
  const requested: string[] = [];
  page.on('request', (sent) => requested.push(sent.url()));
  const errors: string[] = [];
  page.on('pageerror', (error) => errors.push(error.message));

  await page.goto(`${shipAddress}/lineup`);
  await signIn(page, 'handler');
  await expect(page).toHaveURL(new RegExp(`^${shipAddress}/lineup`));
  await expect(page.getByRole('heading', { name: 'Lineup' })).toBeVisible();
  await expect(page.getByTestId('connection-state')).toHaveAttribute('data-state', 'live');

  expect(errors).toEqual([]);
  const elsewhere = requested.filter(
    (url) => !url.startsWith(`${shipAddress}/`) && !url.startsWith(`ws://ship.test:${port}/`),
  );
  expect(elsewhere).toEqual([]);
});
