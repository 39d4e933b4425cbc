import { test, expect, chromium } from '@playwright/test';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { readBackupSync } from '../../src/io/backup/backup.ts';

// With the storage full (the origin's quota shrunk by the DevTools protocol, which Chromium
// applies in a profile on disk to databases opened after it), saving a run in the app shows the
// store's message, saves nothing, keeps the typing, and offers a backup export that still works;
// with the quota back the same form saves.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const study = readBackupSync(fixtureText).payload.studies[0];

test('a save that finds the storage full says so, offers an export, and loses nothing', async ({ baseURL }, info) => {
  const profile = mkdtempSync(join(tmpdir(), 'trialbook-app-quota-'));
  const context = await chromium.launchPersistentContext(profile, { ...info.project.use.launchOptions, baseURL, viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, acceptDownloads: true });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto(`/#/study/${study.id}/run/3`);
    await page.getByRole('textbox', { name: 'Gloss reading' }).fill('75.1');
    await expect(page.getByRole('status')).toHaveText('Not saved yet (typing kept as a draft)');

    const origin = new URL(baseURL!).origin;
    const cdp = await context.newCDPSession(page);
    await cdp.send('Storage.overrideQuotaForOrigin', { origin, quotaSize: 1 });
    await page.goto('about:blank');
    await page.waitForTimeout(4000); // the browser lets go of the closed database after a grace period
    await page.goto(`/#/study/${study.id}/run/3`);
    await expect(page.getByRole('textbox', { name: 'Gloss reading' })).toHaveValue('75.1');
    await page.getByRole('button', { name: 'Save run 3' }).click();
    await expect(page.locator('.problem')).toContainText('The storage for Trialbook on this device is full');
    await expect(page.getByRole('status')).not.toContainText('Saved');
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export a backup now' }).click()]);
    const backup = readBackupSync(readFileSync((await download.path())!, 'utf8'));
    expect(backup.payload.studies.map((s) => s.id)).toEqual([study.id]);

    await cdp.send('Storage.overrideQuotaForOrigin', { origin });
    await page.reload();
    await expect(page.getByRole('textbox', { name: 'Gloss reading' })).toHaveValue('75.1');
    await page.getByRole('button', { name: 'Save run 3' }).click();
    await expect(page.getByRole('status')).toHaveText('Saved ✓ run 3');
    await page.reload();
    await expect(page.getByText('2 revisions kept')).toBeVisible();
    await expect(page.getByRole('textbox', { name: 'Gloss reading' })).toHaveValue('75.1');
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
});
