import { test, expect, type Locator } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { analyze } from '../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../src/core/model/formula.ts';
import { termFactors, termOrder } from '../../src/core/model/term.ts';
import { predict } from '../../src/core/predict/predict.ts';
import type { Factor } from '../../src/core/factor/factor.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';

// The analysis screen's interaction chart draws the core's predictions at the four corners of the
// largest two-factor interaction, and its residual charts hold one point per run used.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const studyId = (JSON.parse(fixtureText) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;

function analysis(response: string) {
  const data = backupResponseData(fixtureText, studyId, response);
  return analyze(data, { terms: termsUpToOrder(data.factors.length, 2) });
}

const end = (f: Factor, e: 0 | 1) => (f.kind === 'categorical' ? f.levels[e] : e === 0 ? f.low : f.high);

/** The core's four predictions for a two-factor term, by line (second factor low, high) and across (first factor low, high). */
function corners(response: string) {
  const a = analysis(response);
  const two = a.terms.filter((t) => termOrder(t.term) === 2).sort((x, y) => Math.abs(y.effect) - Math.abs(x.effect));
  const term = two[0];
  const [i, j] = termFactors(term.term);
  const fs = a.model.factors;
  const others = fs.flatMap((f, k) => (k !== i && k !== j && f.kind === 'categorical' ? [[f.name, f.levels[0]] as [string, string]] : []));
  const at = (ea: 0 | 1, eh: 0 | 1) => predict(a.model, [...others, [fs[i].name, end(fs[i], ea)], [fs[j].name, end(fs[j], eh)]]).fit;
  return { a, term, across: fs[i], held: fs[j], values: [[at(0, 0), at(1, 0)], [at(0, 1), at(1, 1)]] };
}

/** A number as the screen shows it (true minus sign, four significant digits). */
function shown(text: string): number {
  return Number(text.trim().replace('−', '-'));
}

async function expectShownAs(cell: Locator, value: number) {
  const got = shown(await cell.innerText());
  // Four significant digits: within half a unit of the fourth digit.
  const tol = 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(value))) - 3) + 1e-9;
  expect(Math.abs(got - value), `${got} vs ${value}`).toBeLessThanOrEqual(tol);
}

test('the interaction chart shows the largest interaction with the core predictions at its corners', async ({ page }) => {
  const { term, across, held, values } = corners('Film thickness');
  // The demo's largest interaction on film thickness is oven temperature × powder flow.
  expect(term.letters).toBe('AC');
  await page.goto(`/#/study/${studyId}/analysis`);
  const picker = page.getByRole('group', { name: 'Interaction' });
  await expect(picker.getByRole('button', { pressed: true })).toHaveText(/Oven temperature × Powder flow \(AC\)/);
  const chart = page.getByRole('img', { name: `Interaction chart of ${across.name} and ${held.name}`, exact: false });
  await expect(chart.locator('canvas').first()).toBeVisible();
  await expect(page.locator('.interaction-chart figcaption')).toContainText(`Lines that are not parallel mean the effect of ${across.name} depends on ${held.name}.`);
  await expect(page.locator('.interaction-chart figcaption')).toContainText('Line speed at its center, 3 m/min');
  const table = page.getByRole('table', { name: 'Predicted Film thickness (µm)' });
  await expect(table.locator('thead th')).toHaveText(['Oven temperature', 'Powder flow', 'Oven temperature 160 °C', 'Oven temperature 200 °C']);
  const rows = table.locator('tbody tr');
  await expect(rows).toHaveCount(2);
  await expect(rows.nth(0).locator('th')).toContainText('30 g/min');
  await expect(rows.nth(1).locator('th')).toContainText('50 g/min');
  for (const r of [0, 1]) for (const c of [0, 1]) await expectShownAs(rows.nth(r).locator('td').nth(c), values[r][c]);
  // Not parallel: the rise across differs between the two lines by twice the AC effect.
  expect((values[1][1] - values[1][0]) - (values[0][1] - values[0][0])).toBeCloseTo(2 * term.effect, 9);
});

test('picking another interaction redraws the chart for it', async ({ page }) => {
  await page.goto(`/#/study/${studyId}/analysis`);
  await page.getByRole('button', { name: 'Line speed × Powder flow (BC)' }).click();
  await expect(page.getByRole('button', { name: 'Line speed × Powder flow (BC)' })).toHaveAttribute('aria-pressed', 'true');
  const table = page.getByRole('table', { name: 'Predicted Film thickness (µm)' });
  await expect(table.locator('thead th')).toHaveText(['Line speed', 'Powder flow', 'Line speed 2 m/min', 'Line speed 4 m/min']);
  await expect(page.locator('.interaction-chart figcaption')).toContainText('Oven temperature at its center, 180 °C');
  const a = analysis('Film thickness');
  const at = (b: number, c: number) => predict(a.model, { 'Line speed': b, 'Powder flow': c }).fit;
  await expectShownAs(table.locator('tbody tr').nth(1).locator('td').nth(1), at(4, 50));
  // With main effects only there is no interaction to draw, and the screen says why.
  await page.getByRole('button', { name: 'Main effects only' }).click();
  await expect(page.locator('.interaction-chart')).toHaveCount(0);
  await expect(page.getByText('This model has no two-factor interactions')).toBeVisible();
});

test('the residual charts hold one point per run used, with the zero line and the runs that stand out named', async ({ page }) => {
  const a = analysis('Film thickness');
  await page.goto(`/#/study/${studyId}/analysis`);
  for (const title of ['Residual against fitted value', 'Residual against run order']) {
    const img = page.getByRole('img', { name: `${title}, ${a.n} runs` });
    await expect(img.locator('canvas').first()).toBeVisible();
    // The numbers are folded away under the chart until asked for.
    await page.locator('figure', { has: img }).getByText('The numbers behind this chart').click();
    const table = page.getByRole('table', { name: title, exact: true });
    await expect(table.locator('tbody tr')).toHaveCount(a.n);
    await expect(table.locator('tbody th')).toHaveText(a.runs.map((r) => new RegExp(`^${r.label.replace('#', '\\#')}\\b`)));
  }
  const fitted = page.getByRole('table', { name: 'Residual against fitted value', exact: true });
  for (const [i, r] of a.runs.entries()) {
    await expectShownAs(fitted.locator('tbody tr').nth(i).locator('td').nth(0), r.fitted);
  }
  const out = a.runs.filter((r) => r.deleted !== null && Math.abs(r.deleted) > 3);
  if (out.length === 0) await expect(page.getByText(/No run stands out: every residual, measured against the noise of the other runs, is between −3 and \+3/)).toBeVisible();
  for (const r of out) await expect(page.getByText(`Run ${r.label} stands out`)).toBeVisible();
  await expect(page.getByText('Runs in run-sheet order (by planned run number, not the time logged)')).toBeVisible();
});

test('at phone width nothing on the analysis screen runs off the side', async ({ page }) => {
  await page.goto(`/#/study/${studyId}/analysis`);
  await expect(page.getByRole('img', { name: /Residual against run order/ }).locator('canvas').first()).toBeVisible();
  const widest = await page.evaluate(() => Math.max(...[...document.querySelectorAll('.chart, .chart *')].map((e) => e.getBoundingClientRect().right)));
  expect(widest).toBeLessThanOrEqual(390);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
});

test('a chart is drawn again for its new width when the screen turns sideways', async ({ page }) => {
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto(`/#/study/${studyId}/analysis`);
  const canvas = page.locator('.interaction-chart canvas').first();
  await expect(canvas).toBeVisible();
  const narrow = await canvas.evaluate((c) => c.getBoundingClientRect().width);
  await page.setViewportSize({ width: 844, height: 390 });
  // The chart follows its box: wider than before, and still inside the box (nothing clipped).
  await expect.poll(async () => canvas.evaluate((c) => c.getBoundingClientRect().width)).toBeGreaterThan(narrow + 100);
  const fits = await page.locator('.interaction-chart canvas').first().evaluate((c) => {
    const box = c.closest('figure')!.getBoundingClientRect();
    return c.getBoundingClientRect().right <= box.right + 1;
  });
  expect(fits).toBe(true);
});
