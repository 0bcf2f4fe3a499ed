import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConfig } from '@playwright/test';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
// RETURNRATE_E2E_PORT lets two checkouts run their browser tests side by side.
const PORT = Number(process.env['RETURNRATE_E2E_PORT'] ?? 5174);
const ON_CI = Boolean(process.env['CI']);

/** Browser tests of the workbench in Debian's chromium (apt-get install chromium), against the vite dev server. */
export default defineConfig({
  testDir: resolve(ROOT, 'e2e'),
  outputDir: resolve(ROOT, 'test-results'),
  // The analyses are CPU-bound; one test at a time keeps timings honest on small machines.
  workers: 1,
  fullyParallel: false,
  forbidOnly: ON_CI,
  retries: 0,
  timeout: 120_000,
  expect: { timeout: 20_000 },
  reporter: [['list'], ['json', { outputFile: resolve(ROOT, '.ci-reports/playwright.json') }]],
  webServer: {
    command: `npx vite --host 127.0.0.1 --port ${PORT} --strictPort`,
    cwd: ROOT,
    url: `http://127.0.0.1:${PORT}/`,
    // Never reuse a server already on the port: it may belong to another checkout and serve other code.
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: 'ignore',
    stderr: 'pipe',
  },
  use: {
    baseURL: `http://127.0.0.1:${PORT}/`,
    headless: true,
    viewport: { width: 1280, height: 900 },
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
    },
  },
});
