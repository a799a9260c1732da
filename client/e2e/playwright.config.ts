import { defineConfig, devices } from '@playwright/test';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from './chromium';

// Browser flows in Debian's Chromium (never a downloaded browser) against a server that
// `npm test` starts with a fresh, seeded database and names in BASE_URL.
export default defineConfig({
  testDir: '.',
  outputDir: '../../.test-output/playwright',
  fullyParallel: false,
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  timeout: 60_000,
  reporter: [['list'], ['json']],
  use: {
    baseURL: process.env.BASE_URL ?? 'http://127.0.0.1:3000',
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
    launchOptions: { executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS },
  },
  projects: [{ name: 'chromium', use: { ...devices['Desktop Chrome'], channel: undefined } }],
});
