import { test, expect, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

// A logged run's history on the phone: every save is a revision, the list shows what changed,
// and restoring an earlier revision adds a new one (nothing is deleted), kept after a reload.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const demo = JSON.parse(fixtureText) as { payload: { studies: { id: string }[]; revisions: { plannedRun: number; notes: string }[] } };
const study = demo.payload.studies[0];
const firstNotes = demo.payload.revisions.find((r) => r.plannedRun === 3)!.notes;

async function openRun3(page: Page) {
  await page.goto('/');
  await expect(page.locator('.card').first()).toBeVisible();
  await page.goto(`/#/study/${study.id}/run/3`);
  await expect(page.getByRole('textbox', { name: 'Notes' })).toBeVisible();
}

const items = (page: Page) => page.locator('.history-item');

test('editing run 3, then restoring its first revision from the history, keeps all three revisions after a reload', async ({ page }) => {
  await openRun3(page);
  await expect(page.getByRole('textbox', { name: 'Notes' })).toHaveValue(firstNotes);
  await expect(page.getByRole('button', { name: 'History (1 revision)' })).toBeVisible();

  await page.getByRole('textbox', { name: 'Notes' }).fill('powder hopper refilled');
  await page.getByRole('button', { name: 'Save run 3' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 3');

  await page.getByRole('button', { name: 'History (2 revisions)' }).click();
  await expect(page.getByRole('heading', { name: 'History (2 revisions)' })).toBeVisible();
  await expect(page.getByRole('textbox', { name: 'Notes' })).toBeHidden();
  await expect(items(page)).toHaveCount(2);
  // Newest first: revision 2 is current and says what changed; revision 1 can be brought back.
  await expect(items(page).nth(0)).toContainText('Revision 2');
  await expect(items(page).nth(0)).toContainText('Current');
  await expect(items(page).nth(0)).toContainText('Changed: notes: "powder hopper refilled"');
  await expect(items(page).nth(0).getByRole('button', { name: 'Restore this revision' })).toHaveCount(0);
  await expect(items(page).nth(1)).toContainText('Revision 1');
  await expect(items(page).nth(1)).toContainText('First revision.');
  await expect(items(page).nth(1)).not.toContainText('Current');
  await expect(items(page).nth(1)).toContainText('Gloss74.2 GU');

  const restore = items(page).nth(1).getByRole('button', { name: 'Restore this revision' });
  const box = await restore.boundingBox();
  expect(box!.height).toBeGreaterThanOrEqual(48);
  await restore.click();
  await expect(items(page).nth(1).getByRole('button', { name: 'Yes, restore revision 1' })).toBeInViewport();
  await page.screenshot({ path: join(tmpdir(), 'trialbook-history-confirm-390x844.png') });
  // Asked in the page; cancelling writes nothing.
  await items(page).nth(1).getByRole('button', { name: 'Cancel' }).click();
  await expect(items(page)).toHaveCount(2);
  await items(page).nth(1).getByRole('button', { name: 'Restore this revision' }).click();
  await items(page).nth(1).getByRole('button', { name: 'Yes, restore revision 1' }).click();

  await expect(page.getByRole('heading', { name: 'History (3 revisions)' })).toBeVisible();
  await expect(page.getByText('Revision 1 restored as revision 3')).toBeVisible();
  await expect(items(page)).toHaveCount(3);
  await expect(items(page).nth(0)).toContainText('Revision 3');
  await expect(items(page).nth(0)).toContainText('Current');
  await expect(items(page).nth(0)).toContainText('Restored from revision 1');
  await expect(items(page).nth(0)).toContainText(firstNotes === '' ? 'notes removed' : `notes: "${firstNotes}"`);
  await expect(items(page).nth(1)).not.toContainText('Current');

  // The new current revision is in view after the restore.
  await expect(items(page).nth(0).locator('.history-no')).toBeInViewport();
  const shot = join(tmpdir(), 'trialbook-history-390x844.png');
  await page.screenshot({ path: shot });

  await page.getByRole('button', { name: 'Back to the form' }).click();
  await expect(page.getByRole('textbox', { name: 'Notes' })).toHaveValue(firstNotes);
  await expect(page.getByRole('status')).toHaveText('No changes');

  await page.reload();
  await expect(page.getByRole('textbox', { name: 'Notes' })).toHaveValue(firstNotes);
  await page.getByRole('button', { name: 'History (3 revisions)' }).click();
  await expect(items(page)).toHaveCount(3);
  await expect(items(page).nth(0)).toContainText('Restored from revision 1');
  await expect(items(page).nth(2)).toContainText('First revision.');
});

test('restoring waits while the form holds unsaved typing, and discarding the typing lets it go ahead', async ({ page }) => {
  await openRun3(page);
  await page.getByRole('textbox', { name: 'Notes' }).fill('first edit');
  await page.getByRole('button', { name: 'Save run 3' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved ✓ run 3');
  await page.goto(`/#/study/${study.id}/run/2`);
  await page.goto(`/#/study/${study.id}/run/3`);
  await page.getByRole('textbox', { name: 'Notes' }).fill('typed, not saved');
  await expect(page.getByRole('status')).toHaveText('Not saved yet (typing kept as a draft)');

  await page.getByRole('button', { name: 'History (2 revisions)' }).click();
  await items(page).nth(1).getByRole('button', { name: 'Restore this revision' }).click();
  await expect(items(page).nth(1)).toContainText('The form holds typing that is not saved');
  await expect(items(page).nth(1).getByRole('button', { name: /Yes, restore/ })).toHaveCount(0);
  await items(page).nth(1).getByRole('button', { name: 'Discard my typing' }).click();
  await items(page).nth(1).getByRole('button', { name: 'Yes, restore revision 1' }).click();
  await expect(items(page)).toHaveCount(3);
  await page.getByRole('button', { name: 'Back to the form' }).click();
  await expect(page.getByRole('textbox', { name: 'Notes' })).toHaveValue(firstNotes);
  await page.reload();
  await expect(page.getByRole('textbox', { name: 'Notes' })).toHaveValue(firstNotes);
  await expect(page.getByText('Your earlier typing was kept')).toHaveCount(0);
});
