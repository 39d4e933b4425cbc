import { test, expect } from '@playwright/test';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { MAX_BACKUP_BYTES } from '../../src/io/backup/backup-size.ts';

// The app's import reads the same code path as the command line (readBackup): a backup one byte
// above the size limit is refused with the size, the limit and what to do, and nothing changes.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');

test('a backup above the size limit is refused with its size and the limit, and nothing changes', async ({ page }) => {
  test.setTimeout(120_000);
  const dir = mkdtempSync(join(tmpdir(), 'trialbook-e2e-'));
  try {
    // The demo backup padded with trailing spaces (still valid JSON) to the limit plus one byte.
    const extra = Buffer.byteLength(fixtureText, 'utf8') - fixtureText.length;
    const path = join(dir, 'too-large.json');
    writeFileSync(path, fixtureText.padEnd(MAX_BACKUP_BYTES + 1 - extra, ' '));
    await page.goto('/#/export');
    await expect(page.locator('.card')).toHaveCount(1);
    await page.locator('input[type="file"]').setInputFiles(path);
    const alert = page.getByRole('alert');
    await expect(alert).toContainText('This backup file is 128.0 MB; Trialbook reads backups of up to 128 MB (134,217,728 bytes)', { timeout: 60_000 });
    await expect(alert).toContainText('Nothing was imported');
    await page.goto('/');
    await expect(page.locator('.card')).toHaveCount(1);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
});
