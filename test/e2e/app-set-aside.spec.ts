import { test, expect } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readBackupSync, writeBackup } from '../../src/io/backup/backup.ts';

// Records an import cannot merge are set aside (src/store/set-aside.ts); the export screen says
// how many and links to a screen that lists them in plain words, saves them to one file, and
// removes one only after a confirmation. Phone sizes 390x844 and 360x740, axe-core included.
// The file: the demo backup (the app's own export, test/fixtures) with the first reading of two
// revisions changed and the checksum written again, so the file's checks pass and the merge meets
// two revisions with a stored id and other content.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const fixture = readBackupSync(fixtureText);
const [altered, second] = fixture.payload.revisions.filter((r) => r.plannedRun !== fixture.payload.revisions[0].plannedRun || r === fixture.payload.revisions[0]).slice(0, 2);

async function clashingFile(): Promise<string> {
  const change = new Set([altered.id, second.id]);
  const payload = { ...fixture.payload, revisions: fixture.payload.revisions.map((r) => (change.has(r.id) ? { ...r, readings: [[r.readings[0][0] + 5, ...r.readings[0].slice(1)], ...r.readings.slice(1)] } : r)) };
  return writeBackup(payload, { device: 'other-phone', exportedAt: '2026-01-02T03:04:05.000Z', scope: 'all' });
}

for (const size of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test(`set-aside records at ${size.width}x${size.height}: listed in plain words, saved to a file, removed only on a confirmation`, async ({ page }) => {
    await page.setViewportSize(size);
    await page.goto('/#/export');
    await expect(page.locator('.card')).toHaveCount(1);
    await expect(page.locator('.set-aside-link')).toHaveCount(0);
    await page.locator('input[type="file"]').setInputFiles({ name: 'clash.json', mimeType: 'application/json', buffer: Buffer.from(await clashingFile()) });
    await expect(page.getByRole('status')).toContainText('2 records of the file were set aside');
    const line = page.locator('.set-aside-link');
    await expect(line).toContainText('2 records from imported files were set aside, not merged.');
    await line.scrollIntoViewIfNeeded();
    await page.screenshot({ path: `test-results/set-aside-line-${size.width}.png` });
    await line.getByRole('link', { name: 'See the set-aside records' }).click();

    await expect(page.getByRole('heading', { level: 2 })).toHaveText('Set-aside records');
    const cards = page.locator('.set-aside-card');
    await expect(cards).toHaveCount(2);
    const title = fixture.payload.studies[0].title;
    const clash = cards.filter({ hasText: `run ${altered.plannedRun} of` });
    await expect(clash.locator('h3')).toHaveText(`A revision of run ${altered.plannedRun} of "${title}"`);
    await expect(clash).toContainText('(readings[0][0] differs)');
    await expect(clash).toContainText('Written by device other-phone.');
    // Both values where they differ: the file's (changed by 5) and the device's (the demo's own).
    await expect(clash.locator('.set-aside-values')).toHaveText(`In the file: ${altered.readings[0][0] + 5}; on this device: ${altered.readings[0][0]}.`);
    await expect(clash.locator('.set-aside-reason')).toContainText(`Revision ${altered.id} of run ${altered.plannedRun} in the file differs`);
    await expect(cards.filter({ hasText: `run ${second.plannedRun} of` })).toContainText('(readings[0][0] differs)');

    const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
    expect(violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join('; ')}`)).toEqual([]);
    // Every button is at least the glove-sized target (tokens.css --target, 48 px).
    for (const b of await page.getByRole('button').all()) expect((await b.boundingBox())!.height).toBeGreaterThanOrEqual(48);
    await page.screenshot({ path: `test-results/set-aside-${size.width}.png`, fullPage: true });

    // The file holds both records whole.
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download the 2 records (JSON)' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^trialbook-set-aside-\d{4}-\d{2}-\d{2}\.json$/);
    const doc = JSON.parse(readFileSync((await download.path())!, 'utf8'));
    expect(doc.records.map((r: { id: string }) => r.id).sort()).toEqual([altered.id, second.id].sort());
    expect(doc.records.find((r: { id: string }) => r.id === altered.id).record.readings[0][0]).toBe(altered.readings[0][0] + 5);
    await expect(page.getByRole('status')).toContainText('is downloading. The records also stay here.');

    // "Remove…" only asks; "Keep it" keeps it.
    await clash.getByRole('button', { name: /^Remove/ }).click();
    const ask = clash.getByRole('alertdialog');
    await expect(ask).toContainText('for good?');
    await expect(ask).toContainText('It is in the file you saved on this screen.');
    await page.screenshot({ path: `test-results/set-aside-confirm-${size.width}.png`, fullPage: true });
    await ask.getByRole('button', { name: 'Keep it' }).click();
    await expect(cards).toHaveCount(2);
    // Asked again and confirmed: that one record goes, the other stays.
    await clash.getByRole('button', { name: /^Remove/ }).click();
    await clash.getByRole('alertdialog').getByRole('button', { name: 'Yes, remove it' }).click();
    await expect(page.getByRole('status')).toContainText('was removed from the set-aside records');
    await expect(cards).toHaveCount(1);
    await expect(cards.first()).toContainText(`run ${second.plannedRun} of`);

    await page.goto('/#/export');
    await expect(page.locator('.set-aside-link')).toContainText('1 record from imported files was set aside');
  });
}
