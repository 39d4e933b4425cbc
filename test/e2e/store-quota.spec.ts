import { test, expect } from '@playwright/test';
import { counts, openHarness, openRunForm } from './store-helpers.ts';

// With the origin's quota shrunk to almost nothing (the DevTools protocol's
// Storage.overrideQuotaForOrigin), a save fails with a clear message, offers an export, writes
// nothing, and keeps the draft; with the quota back, the same form saves once.
test('a save that finds the storage full says so and loses nothing', async ({ page, context, baseURL }) => {
  await openHarness(page);
  await openRunForm(page, 3);
  await page.getByLabel('Film thickness readings').fill('69.5');
  await expect(page.locator('#save-state')).toHaveText('Draft kept');
  const origin = new URL(baseURL!).origin;
  const cdp = await context.newCDPSession(page);
  await cdp.send('Storage.overrideQuotaForOrigin', { origin, quotaSize: 1 });
  await page.getByRole('button', { name: 'Save run' }).click();
  await expect(page.locator('#save-state')).toHaveText('Not saved');
  await expect(page.locator('#problem')).toHaveText(/storage for Trialbook on this device is full.*kept as a draft.*Export a backup/);
  await expect(page.getByRole('button', { name: 'Export a backup' })).toBeVisible();
  await cdp.send('Storage.overrideQuotaForOrigin', { origin });
  expect(await counts(page)).toMatchObject({ runs: 0, revisions: 0, drafts: 1 });
  await page.reload();
  await expect(page.locator('#save-state')).toHaveText('Draft restored');
  await expect(page.getByLabel('Film thickness readings')).toHaveValue('69.5');
  await page.getByRole('button', { name: 'Save run' }).click();
  await expect(page.locator('#save-state')).toHaveText('Saved');
  expect(await counts(page)).toMatchObject({ runs: 1, revisions: 1, drafts: 0 });
});
