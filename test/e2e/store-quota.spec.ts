import { test, expect, chromium } from '@playwright/test';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { counts, openHarness, openRunForm } from './store-helpers.ts';

// With the origin's quota shrunk to almost nothing (the DevTools protocol's
// Storage.overrideQuotaForOrigin), a save fails with a clear message, offers an export, writes
// nothing, and keeps the draft; with the quota back, the same form saves once. Chromium applies
// the override in a profile on disk (not in Playwright's throwaway contexts) and to database
// databases it opens after it, hence the persistent context and leaving the page for a moment.
test('a save that finds the storage full says so and loses nothing', async ({ baseURL }, info) => {
  const profile = mkdtempSync(join(tmpdir(), 'trialbook-quota-'));
  const context = await chromium.launchPersistentContext(profile, { ...info.project.use.launchOptions, baseURL, viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await openHarness(page);
    await openRunForm(page, 3);
    await page.getByLabel('Film thickness readings').fill('69.5');
    await expect(page.locator('#save-state')).toHaveText('Draft kept');

    const origin = new URL(baseURL!).origin;
    const cdp = await context.newCDPSession(page);
    await cdp.send('Storage.overrideQuotaForOrigin', { origin, quotaSize: 1 });
    await page.goto('about:blank');
    await page.waitForTimeout(4000); // the browser lets go of the closed database after a grace period
    await openHarness(page);
    await expect(page.locator('#save-state')).toHaveText('Draft restored');
    await page.getByRole('button', { name: 'Save run' }).click();
    await expect(page.locator('#save-state')).toHaveText('Not saved');
    await expect(page.locator('#problem')).toHaveText(/storage for Trialbook on this device is full.*kept as a draft.*Export a backup/);
    await expect(page.getByRole('button', { name: 'Export a backup' })).toBeVisible();
    expect(await counts(page)).toMatchObject({ runs: 0, revisions: 0, drafts: 1 });

    await cdp.send('Storage.overrideQuotaForOrigin', { origin });
    await page.reload();
    await expect(page.locator('#save-state')).toHaveText('Draft restored');
    await expect(page.getByLabel('Film thickness readings')).toHaveValue('69.5');
    await page.getByRole('button', { name: 'Save run' }).click();
    await expect(page.locator('#save-state')).toHaveText('Saved');
    expect(await counts(page)).toMatchObject({ runs: 1, revisions: 1, drafts: 0 });
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
});
