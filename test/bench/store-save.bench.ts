/**
 * Time to save one run with 10,000 logged runs already stored, in Chromium, through the store's
 * saveRun (one strict-durability transaction over revisions, runs and drafts), on the store test
 * page, in a browser profile on disk (Playwright's default contexts keep IndexedDB in memory,
 * which would leave the disk out). Prints the median and spread of 41 saves after 5 warm-up
 * saves; asserts nothing about time.
 */
import { test, expect, chromium } from '@playwright/test';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const STORED = 10_000;
const WARMUP = 5;
const SAVES = 41;

function quantile(sorted: number[], q: number): number {
  const i = (sorted.length - 1) * q;
  const lo = Math.floor(i);
  return sorted[lo] + (sorted[Math.ceil(i)] - sorted[lo]) * (i - lo);
}

test(`save one run with ${STORED} runs stored`, async ({ baseURL }, info) => {
  const profile = mkdtempSync(join(tmpdir(), 'trialbook-bench-'));
  const context = await chromium.launchPersistentContext(profile, { ...info.project.use.launchOptions, baseURL });
  const page = context.pages()[0] ?? (await context.newPage());
  await page.goto('/harness/');
  await expect(page.locator('#status')).toHaveText(/Ready/);
  type H = { harness: { fill(n: number): Promise<string>; timeSaves(n: number): Promise<number[]>; counts(): Promise<{ runs: number }> } };
  const t0 = Date.now();
  await page.evaluate((n) => (window as unknown as H).harness.fill(n), STORED);
  const fillMs = Date.now() - t0;
  expect((await page.evaluate(() => (window as unknown as H).harness.counts())).runs).toBe(STORED);
  await page.evaluate((n) => (window as unknown as H).harness.timeSaves(n), WARMUP);
  const times = (await page.evaluate((n) => (window as unknown as H).harness.timeSaves(n), SAVES)).sort((a, b) => a - b);
  const fmt = (x: number) => `${x.toFixed(1)} ms`;
  console.log(
    [
      `store save benchmark (Chromium, profile on disk, strict durability)`,
      `  ${STORED} logged runs stored (filled in one transaction in ${(fillMs / 1000).toFixed(1)} s)`,
      `  save one run: median ${fmt(quantile(times, 0.5))}, quartiles ${fmt(quantile(times, 0.25))} to ${fmt(quantile(times, 0.75))}, min ${fmt(times[0])}, max ${fmt(times[times.length - 1])} over ${SAVES} saves`,
    ].join('\n'),
  );
  await context.close();
  rmSync(profile, { recursive: true, force: true });
});
