import { defineConfig, devices } from '@playwright/test';

// End-to-end tests drive Debian's chromium (never a downloaded browser) against the built app.
const port = Number(process.env.E2E_PORT || 3100);
const baseURL = `http://127.0.0.1:${port}`;
const fakesBase = 20000 + (port % 1000) * 10;

export default defineConfig({
  testDir: 'tests/e2e',
  outputDir: 'tests/artifacts/results',
  fullyParallel: false,
  workers: 1,
  retries: process.env.CI ? 1 : 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [['list'], ['json']],
  use: {
    baseURL,
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-dev-shm-usage',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--disable-quic',
        '--no-first-run',
      ],
    },
  },
  projects: [{ name: 'desktop', use: { ...devices['Desktop Chrome'], channel: undefined } }],
  webServer: [
    {
      // Local fakes of the mail server, Stripe and S3 (scripts/fakes), on ports derived from E2E_PORT
      // as in scripts/fakes/config.mjs e2eFakesPortBase, so parallel runs do not collide.
      command: 'node scripts/fakes/index.mjs',
      url: `http://127.0.0.1:${fakesBase + 1}/health`,
      reuseExistingServer: false,
      timeout: 30_000,
      env: {
        FAKES_PORT_BASE: String(fakesBase),
        FAKES_DATA_DIR: `.tmp/e2e-fakes-${port}`,
        FAKES_FRESH: '1',
      },
    },
    {
      command: `npx next start -H 127.0.0.1 -p ${port}`,
      url: `${baseURL}/api/health`,
      reuseExistingServer: false,
      timeout: 120_000,
      env: {
        NEXTAUTH_URL: baseURL,
        SMTP_URL: `smtp://127.0.0.1:${fakesBase}`,
        MAIL_SINK_URL: `http://127.0.0.1:${fakesBase + 1}`,
        STRIPE_API_BASE: `http://127.0.0.1:${fakesBase + 2}`,
        S3_ENDPOINT: `http://127.0.0.1:${fakesBase + 3}`,
      },
    },
  ],
});
