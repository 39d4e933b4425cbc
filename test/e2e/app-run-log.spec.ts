import { test, expect, type Page } from '@playwright/test';
import { demoBackup as backup, demoStudy as study, openDemoSheet as openSheet, serveDemoWithout } from './demo-fixture.ts';

// Logging runs from the run sheet: the form shows planned beside actual settings, keeps the
// typing as a draft, says "Saved" only once the save is on disk, refuses bad input without
// writing, and what was saved is there after a reload.

/** The demo without its logged run 10, served as the demo file, so run 10 is still to be logged. */
const demoWithoutRun10 = (page: Page) => serveDemoWithout(page, 10);

const run10 = (page: Page) => page.locator('.run-card[data-run="10"]');

test('logging a planned run from the run sheet saves it, and it is still there after a reload', async ({ page }) => {
  await demoWithoutRun10(page);
  await openSheet(page);
  await expect(run10(page)).toContainText('Not logged');
  await expect(page.locator('.progress')).toContainText('10 of 11');
  await run10(page).getByRole('link', { name: 'Log run 10' }).click();
  await expect(page).toHaveURL(/\/run\/10$/);

  // Run 10 is planned at 160 °C, 4 m/min, 30 g/min; the actual settings start from the plan.
  await expect(page.getByText('Planned 160 °C')).toBeVisible();
  await expect(page.getByRole('textbox', { name: 'Oven temperature' })).toHaveValue('160');
  await expect(page.getByRole('textbox', { name: 'Line speed' })).toHaveValue('4');
  await expect(page.getByRole('textbox', { name: 'Powder flow' })).toHaveValue('30');
  await expect(page.getByRole('status')).not.toContainText('Saved');

  await page.getByRole('textbox', { name: 'Oven temperature' }).fill('161');
  await expect(page.getByText('Actual differs from the plan')).toBeVisible();
  await page.getByRole('textbox', { name: 'Film thickness reading' }).fill('62.9');
  await page.getByRole('button', { name: '+ Another reading' }).first().click();
  await page.getByRole('textbox', { name: 'Film thickness reading 2' }).fill('63.1');
  await expect(page.locator('.mean')).toHaveText('Mean 63 µm');
  await page.getByRole('textbox', { name: 'Gloss reading' }).fill('80.2');
  await page.getByRole('textbox', { name: 'Notes' }).fill('logged in the test');
  await expect(page.getByRole('status')).toHaveText('Not saved yet (typing kept as a draft)');
  await page.getByRole('button', { name: 'Save run 10' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 10');
  await expect(page.getByRole('link', { name: 'Next: run 11' })).toBeVisible();

  await page.reload();
  await expect(page.getByRole('textbox', { name: 'Film thickness reading 1' })).toHaveValue('62.9');
  await expect(page.getByRole('textbox', { name: 'Film thickness reading 2' })).toHaveValue('63.1');
  await expect(page.getByRole('textbox', { name: 'Oven temperature' })).toHaveValue('161');
  await expect(page.getByRole('textbox', { name: 'Notes' })).toHaveValue('logged in the test');
  await page.getByRole('link', { name: 'Run sheet' }).click();
  await expect(run10(page)).toContainText('Logged ✓');
  await expect(run10(page)).toContainText('Film thickness 63 µm · Gloss 80.2 GU');
  await expect(page.locator('.progress')).toContainText('11 of 11');
  // The demo was not merged in again over the new run.
  await page.goto('/');
  await expect(page.locator('.card')).toHaveCount(1);
});

test('typing comes back after a reload before saving, and the sheet says a draft is waiting', async ({ page }) => {
  await demoWithoutRun10(page);
  await openSheet(page);
  await run10(page).getByRole('link', { name: 'Log run 10' }).click();
  await page.getByRole('textbox', { name: 'Gloss reading' }).fill('79.9');
  await expect(page.getByRole('status')).toHaveText('Not saved yet (typing kept as a draft)');
  await page.reload();
  await expect(page.getByText('Your earlier typing was kept and is back. It is not saved yet.')).toBeVisible();
  await expect(page.getByRole('textbox', { name: 'Gloss reading' })).toHaveValue('79.9');
  await page.getByRole('link', { name: 'Run sheet' }).click();
  await expect(run10(page)).toContainText('Not logged');
  await expect(run10(page)).toContainText('Typing not saved yet is waiting');
});

test('a reading that is not a number is refused with a message and nothing is saved', async ({ page }) => {
  await demoWithoutRun10(page);
  await openSheet(page);
  await run10(page).getByRole('link', { name: 'Log run 10' }).click();
  await page.getByRole('textbox', { name: 'Film thickness reading' }).fill('62,9,1');
  await expect(page.locator('.readings .field-error')).toContainText('use a point or one comma for decimals');
  await page.getByRole('button', { name: 'Save run 10' }).click();
  await expect(page.locator('.problem')).toContainText('Film thickness: reading 1 needs a number, got "62,9,1"');
  await expect(page.getByRole('textbox', { name: 'Film thickness reading' })).toBeFocused();
  await expect(page.getByRole('status')).not.toContainText('Saved');
  await page.getByRole('link', { name: 'Run sheet' }).click();
  await expect(run10(page)).toContainText('Not logged');
});

test('editing a logged run adds a revision, and excluding it needs a reason', async ({ page }) => {
  await openSheet(page);
  const run1 = page.locator('.run-card[data-run="1"]');
  await expect(run1).toContainText('Gloss 73.8 GU');
  await run1.getByRole('link', { name: 'Review run 1' }).click();
  await expect(page.getByText('1 revision kept')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Save run 1' })).toBeDisabled();
  await page.getByRole('textbox', { name: 'Gloss reading' }).fill('74.4');
  await page.getByRole('button', { name: 'Exclude it' }).click();
  await page.getByRole('button', { name: 'Save run 1' }).click();
  await expect(page.locator('.problem')).toContainText('an excluded run needs a reason');
  await expect(page.locator('.problem')).toBeInViewport();
  await expect(page.getByRole('status')).not.toContainText('Saved');
  await page.getByRole('textbox', { name: 'Reason for excluding (needed)' }).fill('panel dropped (test)');
  await page.getByRole('button', { name: 'Save run 1' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 1');
  await page.reload();
  await expect(page.getByText('2 revisions kept')).toBeVisible();
  await page.getByRole('link', { name: 'Run sheet' }).click();
  await expect(run1).toContainText('Excluded');
  await expect(run1).toContainText('panel dropped (test)');
});
