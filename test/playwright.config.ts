import { defineConfig } from '@playwright/test';
import { execSync } from 'node:child_process';

// Debian's chromium, never a downloaded browser (see DEVELOPERS.md).
function chromiumPath(): string {
  if (process.env.CHROME_PATH) return process.env.CHROME_PATH;
  try {
    return execSync('command -v chromium', { shell: '/bin/sh' }).toString().trim();
  } catch {
    return '';
  }
}

// TRIALBOOK_TEST_PORT lets two checkouts run their browser tests side by side.
const PORT = Number(process.env.TRIALBOOK_TEST_PORT ?? 4317);

export default defineConfig({
  testDir: './e2e',
  outputDir: '../test-results',
  workers: 1,
  retries: 0,
  timeout: 30_000,
  reporter: [['list']],
  use: {
    baseURL: `http://127.0.0.1:${PORT}`,
    viewport: { width: 390, height: 844 },
    deviceScaleFactor: 3,
    isMobile: true,
    hasTouch: true,
    serviceWorkers: 'allow',
    launchOptions: {
      executablePath: chromiumPath(),
      args: [
        '--headless',
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
  // The built app at /, and the store's test page (built only for tests) at /harness/.
  webServer: {
    command: `node test/tools/test-server.mjs --port ${PORT}`,
    cwd: '..',
    url: `http://127.0.0.1:${PORT}`,
    reuseExistingServer: false,
    timeout: 60_000,
  },
});
