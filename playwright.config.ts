import { defineConfig } from '@playwright/test';

// Browser tests drive Debian's Chromium (nothing is downloaded) against a production build
// served on loopback with the test database. `npm test` builds first and sets DATABASE_URL.
// The server's output goes to SERVER_LOG (.data/e2e-server-<port>.log), where a failure can be
// read afterwards; scripts/test.sh prints its end when a browser test fails.
const PORT = Number(process.env.ANTINODE_E2E_PORT ?? 3100);
const SERVER_LOG = `.data/e2e-server-${PORT}.log`;

export default defineConfig({
  testDir: 'tests/e2e',
  outputDir: `test-results/port-${PORT}`,
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [['list'], ['html', { open: 'never', outputFolder: `playwright-report/port-${PORT}` }]],
  use: {
    baseURL: `http://localhost:${PORT}`,
    viewport: { width: 1440, height: 900 },
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
    },
  },
  projects: [{ name: 'chromium', use: { browserName: 'chromium' } }],
  webServer: {
    command: `mkdir -p .data && exec node scripts/serve.mjs --port ${PORT} --host 127.0.0.1 > ${SERVER_LOG} 2>&1`,
    url: `http://127.0.0.1:${PORT}/api/v1/health`,
    reuseExistingServer: false,
    timeout: 60_000,
    stdout: 'ignore',
    stderr: 'pipe',
    env: { NEXT_TELEMETRY_DISABLED: '1', ANTINODE_BASE_URL: `http://localhost:${PORT}` },
  },
});
