import 'fake-indexeddb/auto';
import { test, expect } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildDesign } from '../../src/core/design/build-design.ts';
import { centralComposite } from '../../src/core/design/central-composite.ts';
import { parseRunForm } from '../../src/core/study/run-form.ts';
import { studyPlan } from '../../src/core/study/study.ts';
import { exportBackup } from '../../src/store/files.ts';
import { createStudy } from '../../src/store/studies.ts';
import { openNewRun, saveRun } from '../../src/store/runs.ts';
import { openStore } from '../../src/store/store.ts';
import { DEMO_STUDY, demoWithConfirmation } from '../helpers/confirmation-backup.ts';

// The Effects notes in the screen's own words. A half fraction of four factors (D = ABC, so
// AB = CD, AC = BD, AD = BC: Montgomery, Design and Analysis of Experiments, 8th ed., section 8.2)
// with three center runs, made by the app's own store code in Node, one setting logged off target
// (Power 89 where the plan says 90). The responses are INVENTED.

const shot = (name: string) => join(tmpdir(), `trialbook-${name}.png`);
let backup = '';
let studyId = '';
let ccdBackup = '';
let ccdId = '';

test.beforeAll(async () => {
  const store = await openStore({ name: `e2e-notes-${process.pid}`, storage: null });
  const design = buildDesign({
    factors: [
      { kind: 'numeric', name: 'Power', low: 70, high: 90, unit: '%' },
      { kind: 'numeric', name: 'Speed', low: 2, high: 4, unit: 'm/min' },
      { kind: 'numeric', name: 'Focus', low: 0, high: 2, unit: 'mm' },
      { kind: 'numeric', name: 'Gas flow', low: 10, high: 20, unit: 'l/min' },
    ],
    generators: ['D=ABC'],
    centerRuns: 3,
    seed: 5,
  });
  const study = await createStudy(store, studyPlan('Invented laser cutter half fraction', 'INVENTED DEMO DATA.', [{ name: 'Roughness', unit: 'µm', goal: 'minimize', lowerBound: 0 }], design));
  studyId = study.id;
  for (const r of design.runs) {
    const state = await openNewRun(store, study.id, r.run);
    const [a, b, c, d] = r.coded;
    const y = 2 + 0.4 * a - 0.6 * b + 0.25 * c + 0.5 * d + 0.05 * Math.sin(3 * r.run);
    const actual = state.form.actual.map((v, j) => (j === 0 && r.standardOrder === 2 ? '89' : v));
    await saveRun(store, { ...state, studyId: study.id, values: parseRunForm(study, { ...state.form, actual, readings: [y.toFixed(3)], loggedAt: '2024-05-02T09:30:00Z' }) });
  }
  backup = await exportBackup(store);

  // A rotatable central composite design in two factors with five center runs; its yields are
  // INVENTED from a surface with a top (y = 80 + x1 + 0.5 x2 - 1.4 x1^2 - x2^2 + 0.25 x1 x2, plus a small wobble).
  const ccdStore = await openStore({ name: `e2e-notes-ccd-${process.pid}`, storage: null });
  const ccd = centralComposite({
    factors: [
      { kind: 'numeric', name: 'Time', low: 80, high: 90, unit: 'min' },
      { kind: 'numeric', name: 'Temperature', low: 170, high: 180, unit: 'degF' },
    ],
    seed: 3,
  }).design;
  const s2 = await createStudy(ccdStore, studyPlan('Invented reactor surface', 'INVENTED DEMO DATA.', [{ name: 'Yield', unit: '%', goal: 'maximize' }], ccd));
  ccdId = s2.id;
  for (const r of ccd.runs) {
    const state = await openNewRun(ccdStore, s2.id, r.run);
    const [a, b] = r.coded;
    const y = 80 + a + 0.5 * b - 1.4 * a * a - b * b + 0.25 * a * b + 0.1 * Math.sin(5 * r.run);
    await saveRun(ccdStore, { ...state, studyId: s2.id, values: parseRunForm(s2, { ...state.form, readings: [y.toFixed(2)], loggedAt: '2024-05-02T09:30:00Z' }) });
  }
  ccdBackup = await exportBackup(ccdStore);
});

for (const size of [{ width: 390, height: 844 }, { width: 360, height: 740 }]) {
  test(`at ${size.width}x${size.height}: the Effects notes use the screen's sentences, with the inseparable terms listed`, async ({ page }) => {
    await page.setViewportSize(size);
    await page.goto('/#/export');
    await page.locator('input[type="file"]').setInputFiles({ name: 'laser.json', mimeType: 'application/json', buffer: Buffer.from(backup) });
    await expect(page.getByRole('status')).toContainText('Imported 1 new study, 11 new logged runs');
    await page.goto(`/#/study/${studyId}/analysis`);
    const notes = page.getByTestId('analysis-notes');
    await expect(notes).toContainText('each test on this screen allows for all the other terms');
    await expect(notes).not.toContainText('adjusted table');
    await expect(notes).not.toContainText('sequential sums of squares');
    await expect(notes).toContainText('These runs cannot separate 3 model terms from others');
    // The count matches the list under it: the three terms the plan confounds with others.
    await expect(notes.locator('.note-list li')).toHaveCount(3);
    await expect(notes.locator('.note-list')).toContainText('CD cannot be told apart from AB');
    await notes.scrollIntoViewIfNeeded();
    await page.screenshot({ path: shot(`analysis-notes-${size.width}`) });
    // Big enough to read with gloves on: the note text is not shrunk below the body size.
    const px = await notes.locator('.note-list li').first().evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
    expect(px).toBeGreaterThanOrEqual(14);
    const axe = await new AxeBuilder({ page }).include('[data-testid="analysis-notes"]').withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
    expect(axe.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join('; ')}`)).toEqual([]);
  });
}

for (const size of [{ width: 390, height: 844 }, { width: 360, height: 740 }]) {
  test(`at ${size.width}x${size.height}: a central composite study's quadratic notes speak of its squares and lack of fit, not of Lenth's method`, async ({ page }) => {
    await page.setViewportSize(size);
    await page.goto('/#/export');
    await page.locator('input[type="file"]').setInputFiles({ name: 'ccd.json', mimeType: 'application/json', buffer: Buffer.from(ccdBackup) });
    await expect(page.getByRole('status')).toContainText('Imported 1 new study');
    await page.goto(`/#/study/${ccdId}/analysis`);
    await page.getByRole('button', { name: 'Quadratic (with curvature)' }).click();
    const notes = page.getByTestId('analysis-notes');
    await expect(notes).toContainText("The model's squares test the bend along each factor: Time^2 (A^2) p");
    await expect(notes).toContainText('lack of fit');
    await expect(notes).not.toContainText('Lenth');
    await expect(notes).not.toContainText('missing, off target');
    await notes.scrollIntoViewIfNeeded();
    await notes.screenshot({ path: shot(`analysis-notes-ccd-${size.width}`) });
  });
}

test('the export screen saves the confirmation verdicts as a CSV of their own (invented demo data)', async ({ page }) => {
  await page.goto('/#/export');
  await page.locator('input[type="file"]').setInputFiles({ name: 'confirm.json', mimeType: 'application/json', buffer: Buffer.from(await demoWithConfirmation()) });
  await expect(page.getByRole('status')).toContainText('3 new logged runs');
  const card = page.locator('.card', { hasText: DEMO_STUDY });
  const [file] = await Promise.all([page.waitForEvent('download'), card.getByRole('button', { name: 'Download confirmation verdicts (CSV)' }).click()]);
  expect(file.suggestedFilename()).toMatch(/confirmations.*\.csv$/);
  const lines = readFileSync((await file.path())!, 'utf8').replace(/^\ufeff/, '').split('\r\n').filter((l) => l !== '');
  expect(lines[0].startsWith('Response,Model,Block,Runs,')).toBe(true);
  expect(lines.some((l) => l.startsWith('Gloss,') && /,(confirmed|not-confirmed),/.test(l))).toBe(true);
  await card.scrollIntoViewIfNeeded();
  await page.screenshot({ path: shot('export-confirmations-390') });
});
