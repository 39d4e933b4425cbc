import { test, expect } from '@playwright/test';
import { counts, HARNESS_DB, openHarness, openRunForm } from './store-helpers.ts';

// An upgrade step that throws aborts the upgrade: the database stays at its old version with
// every record, and the page says so.
test('a throwing upgrade leaves the old database intact', async ({ page }) => {
  await openHarness(page);
  await openRunForm(page, 1);
  await page.getByLabel('Gloss readings').fill('83');
  await page.getByRole('button', { name: 'Save run' }).click();
  await expect(page.locator('#save-state')).toHaveText('Saved');
  const before = await counts(page);
  const version = await page.evaluate(() => (window as unknown as { harness: { version(): number } }).harness.version());

  await openHarness(page, '?upgrade=throw');
  await expect(page.locator('#status')).toHaveText('Could not open the store');
  await expect(page.locator('#problem')).toHaveText(/could not bring its database up to this version, so it left the stored records as they were/);

  await openHarness(page);
  await expect(page.locator('#status')).toHaveText(`Ready (schema version ${version})`);
  expect(await counts(page)).toEqual(before);
});

// Another tab upgrading the database: this tab closes its database and says so.
test('when another tab upgrades, this tab says so', async ({ page, context }) => {
  await openHarness(page);
  await openRunForm(page, 1);
  await page.getByLabel('Notes').fill('typed in the old tab');
  await expect(page.locator('#save-state')).toHaveText('Draft kept');
  const other = await context.newPage();
  await other.goto('/harness/');
  await other.evaluate(async (HARNESS_DB) => {
    // A newer version of the app opening the same database (one schema version up).
    await new Promise<void>((resolve, reject) => {
      const req = indexedDB.open(HARNESS_DB, 1000);
      req.onsuccess = () => (req.result.close(), resolve());
      req.onerror = () => reject(req.error);
    });
  }, HARNESS_DB);
  await expect(page.locator('#problem')).toHaveText(/updated in another tab.*saved your draft and closed its database/);
});
