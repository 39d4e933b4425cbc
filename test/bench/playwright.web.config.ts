// Runs the browser benchmarks (store save, offline reload) in Chromium against the built app and
// the store test page (npm run build && npm run build:test first):
//   npx playwright test -c test/bench/playwright.web.config.ts [offline-reload | store-save]
// They print figures and never fail on a time.
import { defineConfig } from '@playwright/test';
import base from '../playwright.config.ts';

export default defineConfig({
  ...base,
  testDir: '.',
  testMatch: '*.bench.ts',
  outputDir: '../../test-results/bench',
  timeout: 300_000,
  webServer: { ...(base.webServer as object), cwd: '../..' } as typeof base.webServer,
});
