import { test, expect } from '@playwright/test';
import { counts, openHarness, openRunForm } from './store-helpers.ts';

// Typing is kept as a draft on every change: after the page crashes (the DevTools protocol's
// Page.crash, as a renderer crash would) the reopened page shows what was typed.
test('a draft survives a page crash, and a saved run survives a reload', async ({ page, context }) => {
  await openHarness(page);
  await openRunForm(page, 2);
  await page.getByLabel('Film thickness readings').fill('70.4 70.9');
  await page.getByLabel('Notes').fill('typed before the crash');
  await expect(page.locator('#save-state')).toHaveText('Draft kept');
  const cdp = await context.newCDPSession(page);
  const crashed = page.waitForEvent('crash');
  void cdp.send('Page.crash').catch(() => undefined);
  await crashed;

  const again = await context.newPage();
  await openHarness(again);
  await expect(again.locator('#save-state')).toHaveText('Draft restored');
  await expect(again.getByLabel('Film thickness readings')).toHaveValue('70.4 70.9');
  await expect(again.getByLabel('Notes')).toHaveValue('typed before the crash');

  await again.getByRole('button', { name: 'Save run' }).click();
  await expect(again.locator('#save-state')).toHaveText('Saved');
  await again.reload();
  await expect(again.locator('#status')).toHaveText(/Ready/);
  await expect(again.locator('#run-count')).toHaveText('1');
  expect(await counts(again)).toMatchObject({ runs: 1, revisions: 1, drafts: 0 });
  // Persistent storage is asked for after the first saved run, and the answer is kept.
  const persistence = await again.evaluate(() => (window as unknown as { harness: { persistence(): Promise<{ asked: boolean }> } }).harness.persistence());
  expect(persistence.asked).toBe(true);
});

test('a double tap on save makes one record', async ({ page }) => {
  await openHarness(page);
  await openRunForm(page, 1);
  await page.getByLabel('Gloss readings').fill('84');
  // Two taps in quick succession: both saves carry the ids fixed when the form opened.
  await page.getByRole('button', { name: 'Save run' }).dblclick();
  await expect(page.locator('#save-state')).toHaveText('Saved');
  await page.waitForTimeout(300);
  expect(await counts(page)).toMatchObject({ runs: 1, revisions: 1 });
  const taps = await page.evaluate(() => (window as unknown as { harness: { taps: { saves: number; duplicates: number } } }).harness.taps);
  expect(taps).toEqual({ saves: 2, duplicates: 1 }); // the second save found the first and wrote nothing
});
