// Runs the store-save benchmark in Chromium against the built app (npm run build first):
//   npx playwright test -c test/bench/playwright.store-save.config.ts
// It prints figures and never fails on a time.
import { defineConfig } from '@playwright/test';
import base from '../playwright.config.ts';

export default defineConfig({
  ...base,
  testDir: '.',
  testMatch: 'store-save.bench.ts',
  outputDir: '../../test-results/bench',
  timeout: 300_000,
  webServer: { ...(base.webServer as object), cwd: '../..' } as typeof base.webServer,
});
