import { test, expect } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { analyze } from '../../src/core/fit/analyze.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';

// The analysis screen lists the model's effects, largest first, with the fit figures and the
// analysis's own warnings, for the response chosen.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const studyId = (JSON.parse(fixtureText) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;

function ranked(response: string) {
  const a = analyze(backupResponseData(fixtureText, studyId, response));
  const terms = [...a.terms].sort((x, y) => Math.abs(y.effect) - Math.abs(x.effect));
  return { a, labels: terms.map((t) => `${t.name.split(':').join(' × ')} (${t.letters})`) };
}

test('the analysis screen lists the effects ranked by size, with R² and warnings', async ({ page }) => {
  await page.goto(`/#/study/${studyId}/analysis`);
  const { a, labels } = ranked('Film thickness');
  const list = page.getByRole('list', { name: 'Effects on Film thickness' });
  await expect(list.locator('.bar-label')).toHaveText(labels);
  // The largest (oven temperature, about +7.9 µm) is a main effect that stands out from the noise.
  await expect(list.locator('li').first()).toContainText('Oven temperature (A)');
  await expect(list.locator('li').first()).toContainText('From 160 °C to 200 °C, Film thickness rises by');
  // p < 0.05: 'clear' or 'likely' in the words of core/text/effect-words.ts.
  await expect(list.locator('li').first()).toContainText(/(Clear|Likely) \(p [=<]/);
  await expect(page.getByText(`R² ${(Math.round(a.r2 * 1000) / 10).toFixed(1)}%`)).toBeVisible();
  await expect(page.getByText(`${a.n} runs used`)).toBeVisible();
  await expect(page.getByText('1 excluded run skipped')).toBeVisible();
  await expect(page.getByText('No clear curvature')).toBeVisible();
});

test('choosing another response and main effects only changes the list', async ({ page }) => {
  await page.goto(`/#/study/${studyId}/analysis`);
  await page.getByRole('button', { name: 'Gloss' }).click();
  const { labels } = ranked('Gloss');
  const list = page.getByRole('list', { name: 'Effects on Gloss' });
  await expect(list.locator('.bar-label')).toHaveText(labels);
  await page.getByRole('button', { name: 'Main effects only' }).click();
  await expect(list.locator('.bar-label')).toHaveCount(3);
  await expect(page.getByRole('button', { name: 'Main effects only' })).toHaveAttribute('aria-pressed', 'true');
});

test('the half-normal chart loads its chart code only on the analysis screen', async ({ page }) => {
  const requests: string[] = [];
  page.on('request', (r) => requests.push(r.url()));
  await page.goto('/');
  await expect(page.locator('.card')).toHaveCount(1);
  // The uPlot library chunk itself (uPlot.esm-*.js), not the small hook module that loads it.
  expect(requests.filter((u) => /\/uPlot[.-]/.test(u))).toEqual([]);
  await page.goto(`/#/study/${studyId}/analysis`);
  await expect(page.getByRole('img', { name: /Half-normal plot of \d+ effects/ }).locator('canvas').first()).toBeVisible();
  expect(requests.filter((u) => /\/uPlot[.-]/.test(u)).length).toBeGreaterThan(0);
});
