/**
 * Offline reload to a usable run sheet, in Chromium, on the built app: after one visit with the
 * network on (the service worker then holds the app), the network is cut and the run sheet of
 * the demo study is reloaded again and again. Each figure is the time from the start of the
 * reload's navigation to the moment every planned run of the sheet shows its card with the link
 * to its form (taken in the page by a MutationObserver installed before the app's script runs).
 * Browser profile on disk, as on a phone. Prints the median and spread; asserts nothing about time.
 */
import { test, expect, chromium } from '@playwright/test';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const WARMUP = 3;
const RELOADS = 21;

function quantile(sorted: number[], q: number): number {
  const i = (sorted.length - 1) * q;
  const lo = Math.floor(i);
  return sorted[lo] + (sorted[Math.ceil(i)] - sorted[lo]) * (i - lo);
}

test('offline reload to a usable run sheet', async ({ baseURL }, info) => {
  const profile = mkdtempSync(join(tmpdir(), 'trialbook-offline-bench-'));
  const use = info.project.use;
  const context = await chromium.launchPersistentContext(profile, { ...use.launchOptions, baseURL, viewport: use.viewport, deviceScaleFactor: use.deviceScaleFactor, isMobile: use.isMobile, hasTouch: use.hasTouch });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto('/');
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload();
    await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 10_000 });
    await page.getByRole('link', { name: /^Open Invented demo/ }).click();
    await expect(page.locator('.run-card').first()).toBeVisible();
    const runs = await page.locator('.run-card').count();
    await expect(page.locator('.run-card a[href*="/run/"]')).toHaveCount(runs);

    // Before any of the page's own script: note when the whole sheet is on screen with its links.
    await context.addInitScript((n: number) => {
      const w = window as unknown as { sheetUsableAt?: number };
      const check = () => {
        if (w.sheetUsableAt === undefined && document.querySelectorAll('.run-card a[href*="/run/"]').length >= n) {
          w.sheetUsableAt = performance.now();
          observer.disconnect();
        }
      };
      const observer = new MutationObserver(check);
      observer.observe(document, { childList: true, subtree: true });
    }, runs);

    await context.setOffline(true);
    const times: number[] = [];
    for (let i = 0; i < WARMUP + RELOADS; i++) {
      const response = await page.reload();
      expect(response?.fromServiceWorker(), 'the reload came from the service worker').toBe(true);
      const t = await page.waitForFunction(() => (window as unknown as { sheetUsableAt?: number }).sheetUsableAt ?? false, undefined, { timeout: 15_000 });
      if (i >= WARMUP) times.push((await t.jsonValue()) as number);
    }
    // Offline for real: a path the app never cached fails.
    expect(await page.evaluate(() => fetch(`/never-cached-${Date.now()}`).then(() => 'answered', () => 'failed'))).toBe('failed');
    times.sort((a, b) => a - b);
    const fmt = (x: number) => `${x.toFixed(0)} ms`;
    console.log(
      [
        'offline reload benchmark (Chromium, profile on disk, network off, served by the service worker)',
        `  reload to a usable run sheet (${runs} run cards with their links): median ${fmt(quantile(times, 0.5))}, quartiles ${fmt(quantile(times, 0.25))} to ${fmt(quantile(times, 0.75))}, min ${fmt(times[0])}, max ${fmt(times[times.length - 1])} over ${RELOADS} reloads`,
      ].join('\n'),
    );
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
});
