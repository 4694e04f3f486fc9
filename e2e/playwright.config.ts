import { defineConfig, devices } from '@playwright/test';

// Driven by docker-free-scripts/browser-tests.mjs, which starts the system and sets the URLs.
// Debian's Chromium only: Playwright never downloads a browser here.
const chromiumArgs = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export default defineConfig({
  testDir: './specs',
  outputDir: '../test-results/playwright',
  fullyParallel: false,
  workers: 1,
  retries: 0,
  forbidOnly: true,
  timeout: 30_000,
  expect: { timeout: 10_000 },
  reporter: [['list']],
  use: {
    headless: true,
    screenshot: 'only-on-failure',
    trace: 'retain-on-failure',
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: chromiumArgs,
    },
  },
  projects: [{ name: 'desktop', use: { ...devices['Desktop Chrome'], channel: undefined } }],
});
