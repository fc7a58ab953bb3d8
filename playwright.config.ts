import { defineConfig } from '@playwright/test';

// The built app is served by `vite preview`, owned by Playwright's webServer.
// Chromium comes from the machine (CHROMIUM_PATH, set by scripts/test.mjs).
const executablePath = process.env.CHROMIUM_PATH || '/usr/bin/chromium';
// Port, build folder and output folder can be moved so that several runs can share one machine.
const port = Number(process.env.E2E_PORT || 4173);
const dist = process.env.E2E_DIST || 'dist';

export default defineConfig({
  testDir: 'tests/e2e',
  outputDir: process.env.E2E_OUT || 'test-results',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: [['list'], ['json']],
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    viewport: { width: 1400, height: 900 },
    launchOptions: {
      executablePath,
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
  },
  webServer: {
    command: `npx vite preview --host 127.0.0.1 --port ${port} --strictPort --outDir ${dist}`,
    url: `http://127.0.0.1:${port}`,
    reuseExistingServer: false,
    timeout: 60_000,
  },
});
