import { test, expect } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readBackupSync } from '../../src/io/backup/backup.ts';

// Export gives the JSON backup (readable by the backup reader, history included) and the CSV;
// a damaged backup file is refused with a message and changes nothing.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const fixture = readBackupSync(fixtureText);
const study = fixture.payload.studies[0];

test('the study backup and CSV download, and the export is noted', async ({ page }) => {
  await page.goto(`/#/study/${study.id}/export`);
  await expect(page.getByText('Last exported: never')).toBeVisible();
  const [json] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download backup (JSON)' }).click()]);
  expect(json.suggestedFilename()).toMatch(/^trialbook-invented-demo-powder-coating-cure-trial-\d{4}-\d{2}-\d{2}\.json$/);
  const backup = readBackupSync(readFileSync((await json.path())!, 'utf8'));
  expect(backup.payload.studies.map((s) => s.id)).toEqual([study.id]);
  expect(backup.payload.revisions).toHaveLength(fixture.payload.revisions.length);
  await expect(page.getByText('Last exported: never')).toHaveCount(0);

  const [csv] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download CSV' }).click()]);
  expect(csv.suggestedFilename()).toMatch(/\.csv$/);
  const text = readFileSync((await csv.path())!, 'utf8');
  expect(text.split('\r\n')[0]).toContain('Oven temperature (°C) actual');
  expect(text.split('\r\n').filter((l) => l !== '')).toHaveLength(1 + 11);
});

test('a damaged backup file is refused and nothing changes', async ({ page }) => {
  await page.goto('/#/export');
  await expect(page.locator('.card')).toHaveCount(1);
  const damaged = fixtureText.replace('"Invented demo: powder-coating cure trial"', '"Changed title"');
  await page.locator('input[type="file"]').setInputFiles({ name: 'damaged.json', mimeType: 'application/json', buffer: Buffer.from(damaged) });
  await expect(page.getByRole('alert')).toContainText('checksum');
  await page.goto('/');
  await expect(page.locator('.card')).toHaveCount(1);
  await expect(page.locator('.card')).toContainText(study.title);
});

test('importing the same backup again adds nothing', async ({ page }) => {
  await page.goto('/#/export');
  // The person scrolls down to the file picker at the foot of the screen.
  await page.getByText('Choose a backup file').scrollIntoViewIfNeeded();
  await page.locator('input[type="file"]').setInputFiles({ name: 'demo.json', mimeType: 'application/json', buffer: Buffer.from(fixtureText) });
  await expect(page.getByRole('status')).toContainText('Nothing new: everything in the file was already here.');
  // The outcome is beside the file picker, where the person tapped, not at the top of a long screen.
  await expect(page.getByRole('status')).toBeInViewport();
  // A file of another kind says so in plain words, there too, and imports nothing.
  await page.locator('input[type="file"]').setInputFiles({ name: 'runs.csv', mimeType: 'text/csv', buffer: Buffer.from('run,Oven temperature\n1,180\n') });
  await expect(page.getByRole('alert')).toContainText('is not a Trialbook backup');
  await expect(page.getByRole('alert')).toBeInViewport();
});
