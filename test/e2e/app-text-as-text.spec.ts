import { test, expect } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readBackupSync, writeBackup } from '../../src/io/backup/backup.ts';

// The screens render text from a file as text: a study title holding markup and a terminal
// escape (ECMA-48 OSC "set title", ESC ] 0 ; ... BEL) shows those characters, runs nothing and
// makes no element. The command line makes the same characters visible (src/cli/visible-text.ts).
const fixture = readBackupSync(readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8'));
const TITLE = 'Invented: <img src=x onerror="window.__owned=1"><b>bold</b> \u001b]0;owned\u0007 trial';

test('a study title with markup and an escape sequence is shown as text', async ({ page }) => {
  const [study] = fixture.payload.studies;
  // New ids throughout, so that the file is a new study beside the demo the app seeds.
  const ids = new Map<string, string>();
  const fresh = (id: string) => ids.get(id) ?? (ids.set(id, crypto.randomUUID()), ids.get(id)!);
  const revisions = fixture.payload.revisions.map((r) => ({ ...r, id: fresh(r.id), runId: fresh(r.runId), studyId: fresh(r.studyId), parents: r.parents.map(fresh), restoredFrom: r.restoredFrom && fresh(r.restoredFrom) }));
  const payload = { studies: [{ ...study, id: fresh(study.id), title: TITLE }], revisions };
  const text = await writeBackup(payload, { device: fixture.device, exportedAt: fixture.exportedAt, scope: 'all' });
  await page.goto('/#/export');
  await page.locator('input[type="file"]').setInputFiles({ name: 'hostile.json', mimeType: 'application/json', buffer: Buffer.from(text) });
  // The import's own report (the screen's loading line is a status too).
  await expect(page.getByRole('status').filter({ hasText: 'Imported' })).toBeVisible();
  await page.goto('/');
  const card = page.locator('.card', { hasText: 'Invented: <img' });
  await expect(card).toHaveCount(1);
  expect(await card.textContent()).toContain(TITLE);
  await expect(card.locator('img, b')).toHaveCount(0);
  expect(await page.evaluate(() => (window as unknown as { __owned?: number }).__owned)).toBeUndefined();
  expect(await page.title()).not.toContain('owned');
});
