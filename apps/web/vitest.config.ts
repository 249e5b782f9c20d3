import { defineConfig } from 'vitest/config';

// The clock and date helpers show the device's local time; the specs pin it so they read the same anywhere.
process.env.TZ = 'UTC';

// Unit specs for the web's pure modules (models, form schemas); screens are covered by the browser tests in e2e/.
export default defineConfig({
  test: {
    include: ['src/**/*.spec.ts'],
    environment: 'node',
  },
});
