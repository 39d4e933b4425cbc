/**
 * The INVENTED demo study the app adds on first start (test/fixtures/trialbook-demo-backup.json),
 * read once for the browser tests that open it, and a way to serve it without one logged run.
 */
import { expect, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readBackupSync, writeBackup } from '../../src/io/backup/backup.ts';

/** The backup file's text. */
export const demoText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
export const demoBackup = readBackupSync(demoText);
/** The demo's one study. */
export const demoStudy = demoBackup.payload.studies[0];

/** Serves the demo without the logged revisions of one planned run as the app's demo file, so that run is still to be logged. */
export async function serveDemoWithout(page: Page, plannedRun: number) {
  const payload = { studies: demoBackup.payload.studies, revisions: demoBackup.payload.revisions.filter((r) => r.plannedRun !== plannedRun) };
  const text = await writeBackup(payload, { device: demoBackup.device, exportedAt: demoBackup.exportedAt, scope: 'all' });
  await page.route('**/demo-study.json', (route) => route.fulfill({ status: 200, contentType: 'application/json', body: text }));
}

/** Opens the demo study's run sheet from the studies screen, once all its planned runs are listed. */
export async function openDemoSheet(page: Page) {
  await page.goto('/');
  await page.getByRole('link', { name: `Open ${demoStudy.title}` }).click();
  await expect(page.locator('.run-card')).toHaveCount(demoStudy.design.runs.length);
}
