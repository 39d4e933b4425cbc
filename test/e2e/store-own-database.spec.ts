import { test, expect } from '@playwright/test';
import { HARNESS_DB, counts, openHarness, openRunForm } from './store-helpers.ts';

// The store's test page writes to its own database only: visiting it can never open or change
// the app's records (the app's database is named 'trialbook', src/store/db.ts).
test('the store test page opens its own database, never the app one', async ({ page }) => {
  await openHarness(page);
  await openRunForm(page, 1);
  await page.getByLabel('Gloss readings').fill('83');
  await page.getByRole('button', { name: 'Save run' }).click();
  await expect(page.locator('#save-state')).toHaveText('Saved');
  expect(await counts(page)).toMatchObject({ studies: 1, runs: 1 });
  const names = await page.evaluate(async () => (await indexedDB.databases()).map((d) => d.name));
  expect(names).toContain(HARNESS_DB);
  expect(names).not.toContain('trialbook');

  // The app, opened next in the same browser, has its own records (the demo study only).
  await page.goto('/');
  await expect(page.getByText('Invented demo: powder-coating cure trial')).toBeVisible();
  await expect(page.getByText('Invented demo: test page study')).toHaveCount(0);
  const after = await page.evaluate(async () => (await indexedDB.databases()).map((d) => d.name).sort());
  expect(after).toEqual([HARNESS_DB, 'trialbook'].sort());
});
