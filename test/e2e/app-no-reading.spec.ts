import { test, expect, type Page } from '@playwright/test';
import { openDemoSheet as openSheet, serveDemoWithout } from './demo-fixture.ts';

// A save with no reading at all asks first (invented demo data): a reading can come later, from
// the lab, but a tap on Save must not log an empty run, nor take away the readings saved before,
// without a word. Excluding the run needs no reading.

const run10 = (page: Page) => page.locator('.run-card[data-run="10"]');
const question = (page: Page) => page.getByRole('alertdialog', { name: 'Save this run with no reading?' });

test('a new run with no reading asks first; going back saves nothing; yes saves the settings and the sheet says the reading is still to come', async ({ page }) => {
  await serveDemoWithout(page, 10);
  await openSheet(page);
  await run10(page).getByRole('link', { name: 'Log run 10' }).click();
  await page.getByRole('textbox', { name: 'Oven temperature' }).fill('161');
  await page.getByRole('button', { name: 'Save run 10' }).click();
  await expect(question(page)).toBeVisible();
  await expect(question(page)).toContainText('The analysis leaves this run out until a reading is added.');
  await expect(question(page)).toBeInViewport();
  await expect(page.getByRole('status')).not.toContainText('Saved');

  await question(page).getByRole('button', { name: 'Type the reading' }).click();
  await expect(question(page)).toHaveCount(0);
  await expect(page.getByRole('textbox', { name: 'Film thickness reading' })).toBeFocused();
  await page.getByRole('link', { name: 'Run sheet' }).click();
  await expect(run10(page)).toContainText('Not logged');

  await run10(page).getByRole('link', { name: /run 10/ }).click();
  await page.getByRole('button', { name: 'Save run 10' }).click();
  await question(page).getByRole('button', { name: 'Yes, save with no reading' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 10');
  await page.getByRole('link', { name: 'Back to the run sheet' }).click();
  await expect(run10(page)).toContainText('Settings logged · no reading yet');
  await expect(run10(page)).not.toContainText('Logged ✓');
});

test('clearing the readings of a logged run names what the save would take away; typing a reading again drops the question', async ({ page }) => {
  await serveDemoWithout(page, 10);
  await openSheet(page);
  await run10(page).getByRole('link', { name: 'Log run 10' }).click();
  await page.getByRole('textbox', { name: 'Film thickness reading' }).fill('62.9');
  await page.getByRole('textbox', { name: 'Gloss reading' }).fill('80.2');
  await page.getByRole('button', { name: 'Save run 10' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 10');

  await page.getByRole('textbox', { name: 'Film thickness reading' }).fill('');
  await page.getByRole('textbox', { name: 'Gloss reading' }).fill('');
  await page.getByRole('button', { name: 'Save run 10' }).click();
  await expect(question(page)).toContainText('takes away the readings saved before');
  await expect(question(page)).toContainText('Film thickness 62.9 µm');
  await expect(question(page)).toContainText('Gloss 80.2 GU');
  // Typing a reading again drops the question: the save is an ordinary one.
  await page.getByRole('textbox', { name: 'Gloss reading' }).fill('80.4');
  await expect(question(page)).toHaveCount(0);
  await page.getByRole('button', { name: 'Save run 10' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 10');
});

test('an excluded run with its reason saves with no reading and no question', async ({ page }) => {
  await serveDemoWithout(page, 10);
  await openSheet(page);
  await run10(page).getByRole('link', { name: 'Log run 10' }).click();
  await page.getByRole('button', { name: 'Exclude it' }).click();
  await page.getByRole('textbox', { name: /Reason for excluding/ }).fill('powder hopper ran dry');
  await page.getByRole('button', { name: 'Save run 10' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 10');
  await expect(question(page)).toHaveCount(0);
});
