import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { readFileSync, writeFileSync, mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { readBackupSync } from '../../src/io/backup/backup.ts';
import { plannedSettings } from '../../src/core/study/study.ts';

// The desktop layout (from 1000 px: the run sheet as a table, the analysis with its charts beside
// the effects), the phone layout unchanged at 390 and 360 px, and the printed run sheet and
// analysis report (no controls; PDFs on A4 and Letter written to test-results/ for a look).
const backup = readBackupSync(readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8'));
const study = backup.payload.studies[0];
const nRuns = study.design.runs.length;
/** The fixture's one revision of run 1: its actual settings and readings. */
const run1 = backup.payload.revisions.filter((r) => r.plannedRun === 1);
const DESKTOP = { viewport: { width: 1280, height: 800 }, isMobile: false, hasTouch: false, deviceScaleFactor: 1 };

async function axe(page: Page) {
  const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join('; ')}`);
}

test.describe('at 1280x800 (a desktop)', () => {
  test.use(DESKTOP);

  test('the run sheet is a table of runs with planned and actual settings and responses', async ({ page }) => {
    await page.goto(`/#/study/${study.id}`);
    const table = page.locator('.run-table-wrap.wide-only table');
    await expect(table).toBeVisible();
    await expect(page.locator('.runs')).toBeHidden();
    await expect(table.locator('tbody tr')).toHaveCount(nRuns);
    expect(run1).toHaveLength(1);
    const row1 = table.locator('tbody tr[data-run="1"]');
    const cells = await row1.locator('td').allInnerTexts();
    // Kind, then planned and actual of each factor, then each response's mean, then the state.
    const planned = plannedSettings(study, 1);
    const units = study.factors.map((f) => (f.kind === 'numeric' && f.unit ? ` ${f.unit}` : ''));
    expect(cells.slice(1, 1 + 2 * study.factors.length)).toEqual(study.factors.flatMap((_, i) => [`${planned[i]}${units[i]}`, `${run1[0].actual[i]}${units[i]}`]));
    const means = run1[0].readings.map((rs) => rs.reduce((a, b) => a + b, 0) / rs.length);
    expect(cells.slice(1 + 2 * study.factors.length, -1)).toEqual(study.responses.map((r, i) => `${means[i]} ${r.unit}`));
    expect(cells.at(-1)).toBe('Logged ✓');
    // The table's run number opens the run form.
    await row1.getByRole('link', { name: 'Review run 1' }).click();
    await expect(page).toHaveURL(/\/run\/1$/);
    await page.goBack();
    await expect(table).toBeVisible();
    expect(await axe(page)).toEqual([]);
    await page.screenshot({ path: 'test-results/desktop-run-sheet-1280.png', fullPage: true });
  });

  test('the analysis shows its charts beside the effects', async ({ page }) => {
    await page.goto(`/#/study/${study.id}/analysis`);
    const effects = page.locator('.part-effects');
    const chart = page.locator('.part-half-normal');
    await expect(chart).toBeVisible();
    const [e, c] = [(await effects.boundingBox())!, (await chart.boundingBox())!];
    expect(c.x).toBeGreaterThanOrEqual(e.x + e.width);
    expect(c.y).toBeLessThan(e.y + e.height); // side by side, not below
    expect(await axe(page)).toEqual([]);
    await page.screenshot({ path: 'test-results/desktop-analysis-1280.png', fullPage: true });
  });
});

for (const viewport of [{ width: 390, height: 844 }, { width: 360, height: 740 }]) {
  test(`at ${viewport.width}x${viewport.height} the phone keeps its cards and one column`, async ({ page }) => {
    await page.setViewportSize(viewport);
    await page.goto(`/#/study/${study.id}`);
    await expect(page.locator('.run-card')).toHaveCount(nRuns);
    await expect(page.locator('.run-card').first()).toBeVisible();
    await expect(page.locator('.run-table-wrap table')).toHaveCount(2);
    for (const t of await page.locator('.run-table-wrap table').all()) await expect(t).toBeHidden();
    await page.goto(`/#/study/${study.id}/analysis`);
    const [e, c] = [(await page.locator('.part-effects').boundingBox())!, (await page.locator('.part-half-normal').boundingBox())!];
    expect(c.y).toBeGreaterThanOrEqual(e.y + e.height); // below, not beside
  });
}

/** Buttons, button-like links and the study tabs that a person could see on the page. */
async function visibleControls(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    [...document.querySelectorAll<HTMLElement>('button, a.btn, nav, input, select, label.btn')]
      .filter((el) => el.getClientRects().length > 0 && getComputedStyle(el).visibility !== 'hidden')
      .map((el) => `${el.tagName.toLowerCase()}: ${el.textContent?.trim().slice(0, 40)}`),
  );
}

for (const viewport of [{ width: 390, height: 844 }, { width: 360, height: 740 }]) {
  test(`at ${viewport.width}x${viewport.height} printed, the run sheet and the analysis show no controls`, async ({ page }) => {
    await page.setViewportSize(viewport);
    await page.goto(`/#/study/${study.id}`);
    await expect(page.locator('.run-card')).toHaveCount(nRuns);
    expect((await visibleControls(page)).length).toBeGreaterThan(nRuns); // on screen: a button per run and the tabs
    await page.emulateMedia({ media: 'print' });
    expect(await visibleControls(page)).toEqual([]);
    const sheet = page.locator('.run-table-wrap.print-only table');
    await expect(sheet).toBeVisible();
    await expect(sheet.locator('tbody tr')).toHaveCount(nRuns);
    // Empty boxes for each response's readings and the notes, in every row.
    await expect(sheet.locator('tbody td.box')).toHaveCount(nRuns * (study.responses.length + 1));
    for (const t of await sheet.locator('tbody td.box').allInnerTexts()) expect(t).toBe('');
    await expect(page.locator('.run-card').first()).toBeHidden();

    await page.emulateMedia({ media: 'screen' });
    await page.goto(`/#/study/${study.id}/analysis`);
    await expect(page.locator('.part-half-normal')).toBeVisible();
    await page.emulateMedia({ media: 'print' });
    expect(await visibleControls(page)).toEqual([]);
    await expect(page.getByText(`Response: ${study.responses[0].name}`)).toBeVisible();
  });
}

test.describe('PDFs for a look (A4 and Letter)', () => {
  test.use(DESKTOP);
  test('the run sheet and the analysis report print to both paper sizes', async ({ page }) => {
    mkdirSync('test-results/print', { recursive: true });
    for (const [name, path] of [['run-sheet', ''], ['analysis', '/analysis']] as const) {
      await page.goto(`/#/study/${study.id}${path}`);
      await page.waitForLoadState('networkidle');
      if (name === 'analysis') await expect(page.locator('.part-half-normal canvas, .part-half-normal svg').first()).toBeVisible();
      for (const format of ['A4', 'Letter'] as const) {
        const pdf = await page.pdf({ format, printBackground: true });
        expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
        writeFileSync(`test-results/print/${name}-${format}.pdf`, pdf);
      }
    }
  });
});
