import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readBackupSync, writeBackup } from '../../src/io/backup/backup.ts';

// The shell says quietly when the browser reports no network, and that saving still works; a
// run saved while offline is on disk, and the note goes once the network is back.
const backup = readBackupSync(readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8'));
const study = backup.payload.studies[0];
const NOTE = 'Offline saving still works';

/** The demo without its logged run 10, so run 10 is still to be logged. */
async function demoWithoutRun10(page: Page) {
  const payload = { studies: backup.payload.studies, revisions: backup.payload.revisions.filter((r) => r.plannedRun !== 10) };
  const text = await writeBackup(payload, { device: backup.device, exportedAt: backup.exportedAt, scope: 'all' });
  await page.route('**/demo-study.json', (route) => route.fulfill({ status: 200, contentType: 'application/json', body: text }));
}

for (const viewport of [{ width: 390, height: 844 }, { width: 360, height: 740 }]) {
  test(`at ${viewport.width}x${viewport.height} the offline note comes and goes with the network, and a run saves offline`, async ({ page, context }) => {
    await page.setViewportSize(viewport);
    await demoWithoutRun10(page);
    await page.goto(`/#/study/${study.id}/run/10`);
    await expect(page.getByRole('textbox', { name: 'Oven temperature' })).toBeVisible();
    await expect(page.getByText(NOTE)).toHaveCount(0);
    const barHeight = async () => (await page.locator('.title-bar').boundingBox())!.height;
    const online = await barHeight();

    await context.setOffline(true);
    const note = page.locator('.offline-note');
    await expect(note).toContainText(NOTE);
    await expect(note).toBeInViewport();
    // Quiet: beside the title, so it costs the screen no height (the title's row is as tall as before).
    const [n, h1] = [(await note.boundingBox())!, (await page.getByRole('heading', { level: 1 }).boundingBox())!];
    expect(n.x).toBeGreaterThan(h1.x + h1.width);
    expect(await barHeight()).toBe(online);
    const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
    expect(violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join('; ')}`)).toEqual([]);
    await page.screenshot({ path: `test-results/offline-note-${viewport.width}.png` });

    await page.getByRole('textbox', { name: 'Film thickness reading' }).fill('62.9');
    await page.getByRole('textbox', { name: 'Gloss reading' }).fill('80.2');
    await page.getByRole('button', { name: 'Save run 10' }).click();
    await expect(page.getByRole('status')).toHaveText('Saved ✓ run 10');
    const saved = await page.evaluate(
      (id) =>
        new Promise<number>((resolve, reject) => {
          const open = indexedDB.open('trialbook');
          open.onerror = () => reject(open.error);
          open.onsuccess = () => {
            const req = open.result.transaction('runs').objectStore('runs').getAll();
            req.onsuccess = () => resolve((req.result as { studyId: string; plannedRun: number }[]).filter((r) => r.studyId === id && r.plannedRun === 10).length);
          };
        }),
      study.id,
    );
    expect(saved).toBe(1);

    await context.setOffline(false);
    await expect(page.getByText(NOTE)).toHaveCount(0);
  });
}
