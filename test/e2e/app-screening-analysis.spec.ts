import 'fake-indexeddb/auto';
import { test, expect } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildDesign } from '../../src/core/design/build-design.ts';
import { plackettBurmanTable } from '../../src/core/design/plackett-burman.ts';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { studyPlan } from '../../src/core/study/study.ts';
import { exportBackup } from '../../src/store/files.ts';
import { createStudy } from '../../src/store/studies.ts';
import { openNewRun, saveRun } from '../../src/store/runs.ts';
import { openStore } from '../../src/store/store.ts';

// A Plackett-Burman study on the phone: made by the app's own store code in Node (an in-memory
// IndexedDB), exported as a backup, imported through the Export screen, then analyzed: main
// effects by default, Lenth's method over the design's 11 columns, the partial-aliasing note.
// The responses are INVENTED (Heat and Gap made to matter).

const shot = (name: string) => join(tmpdir(), `trialbook-${name}.png`);
let backup = '';
let studyId = '';

test.beforeAll(async () => {
  const store = await openStore({ name: `e2e-screen-${process.pid}`, storage: null });
  const design = buildDesign({
    factors: ['Heat', 'Dwell', 'Feed', 'Gap', 'Coolant'].map((name) => ({ kind: 'numeric' as const, name, low: 0, high: 10 })),
    plackettBurman: 12,
    seed: 11,
  });
  const study = await createStudy(store, studyPlan('Invented press screen', 'INVENTED DEMO DATA.', [{ name: 'Strength', unit: 'kN', goal: 'maximize' }], design));
  studyId = study.id;
  const table = plackettBurmanTable(12);
  for (const r of design.runs) {
    const row = table[r.standardOrder! - 1];
    const state = await openNewRun(store, study.id, r.run);
    const y = 40 + 3 * row[0] - 2 * row[3] + 0.3 * Math.sin(r.standardOrder!);
    const form = { ...state.form, actual: r.coded.map((c) => String(5 + 5 * c)), readings: [String(y)], loggedAt: '2024-05-02T09:30:00Z' };
    await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, form) });
  }
  backup = await exportBackup(store);
});

for (const size of [{ width: 390, height: 844 }, { width: 360, height: 740 }]) {
  test(`at ${size.width}x${size.height}: the screen fits main effects with Lenth over 11 columns and warns of partial aliasing`, async ({ page }) => {
    await page.setViewportSize(size);
    await page.goto('/#/export');
    await page.locator('input[type="file"]').setInputFiles({ name: 'screen.json', mimeType: 'application/json', buffer: Buffer.from(backup) });
    await expect(page.getByRole('status')).toContainText('Imported 1 new study, 12 new logged runs');
    await page.goto(`/#/study/${studyId}/analysis`);
    await expect(page.getByRole('button', { name: 'Main effects only' })).toHaveAttribute('aria-pressed', 'true');
    const list = page.getByRole('list', { name: 'Effects on Strength' });
    await expect(list.locator('.bar-label')).toHaveCount(5);
    await expect(list.locator('.bar-label').first()).toHaveText('Heat (A)');
    await expect(list.locator('li').first()).toContainText(/Clear \(p [=<]/);
    // Lenth's method over all 11 columns of the 12-run table (5 factors and 6 unused), not over interactions.
    await expect(page.getByRole('img', { name: 'Half-normal plot of 11 effects' })).toBeVisible();
    await expect(page.getByText('This is a 12-run Plackett-Burman screening design')).toBeVisible();
    await page.getByText('This is a 12-run Plackett-Burman screening design').scrollIntoViewIfNeeded();
    await page.screenshot({ path: shot(`screening-analysis-${size.width}`) });
    const axe = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
    expect(axe.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join('; ')}`)).toEqual([]);
  });
}
