import { test, expect, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readBackupSync } from '../../src/io/backup/backup.ts';

// Exports go through the share sheet where the browser accepts the file (canShare, then share)
// and fall back to a download otherwise. The browser's share functions are stubbed in the page:
// headless Chromium has no share sheet.
const fixture = readBackupSync(readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8'));
const study = fixture.payload.studies[0];

type Stub = { accepts: boolean; outcome: 'resolve' | 'AbortError' | 'NotAllowedError' };

/** Replaces navigator.canShare and navigator.share before the app loads; shares are kept in window.__shares. */
async function stubShare(page: Page, stub: Stub) {
  await page.addInitScript((s: Stub) => {
    const shares: { name: string; type: string; text: string }[] = [];
    (window as unknown as { __shares: typeof shares }).__shares = shares;
    Object.defineProperty(navigator, 'canShare', { configurable: true, value: (d: { files?: File[] }) => s.accepts && Array.isArray(d.files) });
    Object.defineProperty(navigator, 'share', {
      configurable: true,
      value: async (d: { files: File[] }) => {
        const f = d.files[0];
        shares.push({ name: f.name, type: f.type, text: await f.text() });
        if (s.outcome !== 'resolve') throw new DOMException('stubbed', s.outcome);
      },
    });
  }, stub);
}

async function sharesOf(page: Page) {
  return page.evaluate(() => (window as unknown as { __shares: { name: string; type: string; text: string }[] }).__shares);
}

for (const viewport of [{ width: 390, height: 844 }, { width: 360, height: 740 }]) {
  test.describe(`at ${viewport.width}x${viewport.height}`, () => {
    test.use({ viewport });

    test('when canShare refuses the file, the backup downloads and share is never called', async ({ page }) => {
      await stubShare(page, { accepts: false, outcome: 'resolve' });
      await page.goto(`/#/study/${study.id}/export`);
      await expect(page.getByText('Last exported: never')).toBeVisible();
      const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download backup (JSON)' }).click()]);
      const backup = readBackupSync(readFileSync((await download.path())!, 'utf8'));
      expect(backup.payload.studies.map((s) => s.id)).toEqual([study.id]);
      expect(await sharesOf(page)).toEqual([]);
      await expect(page.getByRole('status')).toContainText('is downloading');
      await expect(page.getByText('Last exported: never')).toHaveCount(0);
      await page.screenshot({ path: `test-results/share-fallback-${viewport.width}.png` });
    });

    test('when the browser accepts the file, the backup goes to the share sheet and nothing downloads', async ({ page }) => {
      await stubShare(page, { accepts: true, outcome: 'resolve' });
      let downloads = 0;
      page.on('download', () => void downloads++);
      await page.goto(`/#/study/${study.id}/export`);
      await page.getByRole('button', { name: 'Save or share backup (JSON)' }).click();
      await expect(page.getByRole('status')).toContainText('handed to the share sheet');
      const shares = await sharesOf(page);
      expect(shares.map((s) => [s.type, /\.json$/.test(s.name)])).toEqual([['application/json', true]]);
      expect(readBackupSync(shares[0].text).payload.revisions).toHaveLength(fixture.payload.revisions.length);
      await expect(page.getByText('Last exported: never')).toHaveCount(0);
      await page.getByRole('button', { name: 'Save or share CSV' }).click();
      await expect.poll(async () => (await sharesOf(page)).length).toBe(2);
      expect((await sharesOf(page))[1].name).toMatch(/\.csv$/);
      expect(downloads).toBe(0);
    });

    test('a cancelled share sheet sends nothing and leaves the export unnoted', async ({ page }) => {
      await stubShare(page, { accepts: true, outcome: 'AbortError' });
      let downloads = 0;
      page.on('download', () => void downloads++);
      await page.goto(`/#/study/${study.id}/export`);
      await page.getByRole('button', { name: 'Save or share backup (JSON)' }).click();
      await expect(page.getByRole('status')).toContainText('Sharing was cancelled');
      await expect(page.getByText('Last exported: never')).toBeVisible();
      expect(downloads).toBe(0);
    });

    test('a share refused for another reason falls back to a download', async ({ page }) => {
      await stubShare(page, { accepts: true, outcome: 'NotAllowedError' });
      await page.goto(`/#/study/${study.id}/export`);
      const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Save or share backup (JSON)' }).click()]);
      expect(download.suggestedFilename()).toMatch(/\.json$/);
      expect(await sharesOf(page)).toHaveLength(1);
      await expect(page.getByRole('status')).toContainText('is downloading');
    });
  });
}
