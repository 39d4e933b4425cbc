/** Shared steps of the store's browser tests, on the store test page (src/ui/harness). */
import { expect, type Page } from '@playwright/test';

export const HARNESS = '/harness/';

/** The test page's own database (src/ui/harness/harness.ts), never the app's 'trialbook'. */
export const HARNESS_DB = 'trialbook-test-page';

export async function openHarness(page: Page, query = '') {
  await page.goto(HARNESS + query);
  await expect(page.locator('#status')).toHaveText(/Ready|Could not open/);
}

/** Makes the demo study and opens the form of a planned run. */
export async function openRunForm(page: Page, planned = 1) {
  await page.getByRole('button', { name: 'New demo study' }).click();
  await expect(page.locator('#status')).toHaveText(/Study made/);
  await page.getByLabel('Planned run').fill(String(planned));
  await page.getByRole('button', { name: 'Open run' }).click();
  await expect(page.locator('#run-form')).toBeVisible();
}

export async function counts(page: Page): Promise<{ studies: number; runs: number; revisions: number; drafts: number }> {
  return page.evaluate(() => (window as unknown as { harness: { counts(): Promise<never> } }).harness.counts());
}
