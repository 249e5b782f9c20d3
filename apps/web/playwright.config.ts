import { existsSync } from 'node:fs';
import { defineConfig } from '@playwright/test';
import { debianChromium } from './e2e/support/chromium.js';

// DB_* and JWT_SECRET come from the workspace .env; the browser tests get a database of their own.
if (existsSync('../../.env')) process.loadEnvFile('../../.env');

// E2E_PORT lets two checkouts run their browser tests side by side.
const port = process.env.E2E_PORT ?? '3100';
const baseURL = `http://127.0.0.1:${port}`;

export default defineConfig({
  testDir: 'e2e',
  outputDir: 'test-results',
  timeout: 60_000,
  expect: { timeout: 5_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: process.env.CATLINE_TEST_RESULTS
    ? [['list'], ['json', { outputFile: process.env.CATLINE_TEST_RESULTS }]]
    : 'list',
  use: {
    baseURL,
    trace: 'off',
    screenshot: 'only-on-failure',
    launchOptions: debianChromium,
  },
  webServer: {
    // The built app served by the API, as `npm start` serves it, on a freshly reset database.
    command: 'node ../api/dist/database/reset.js && node ../api/dist/main.js',
    url: `${baseURL}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: 'ignore',
    stderr: 'pipe',
    env: {
      PORT: port,
      DB_NAME: `${process.env.DB_NAME ?? 'catline'}_e2e`,
      // ship.test: the plain-HTTP spec opens the app under a ship-network name that Chromium maps to 127.0.0.1.
      WEB_ORIGINS: `${baseURL},http://ship.test:${port}`,
      NODE_ENV: 'production',
      // Every test signs its people in afresh; the per-minute sign-in limit is for password guessing.
      LOGIN_RATE_LIMIT: '1000',
    },
  },
});
