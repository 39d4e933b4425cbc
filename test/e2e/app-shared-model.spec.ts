import { test, expect } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { analyze } from '../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../src/core/model/formula.ts';
import { predict } from '../../src/core/predict/predict.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';

// One analysis model per study: the model chosen on the Effects screen is the one the quick card
// predicts from, and it stays chosen while the person moves between the study's screens. The
// expected numbers are the core's own prediction from the same backup (the command line's path).
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const studyId = (JSON.parse(fixtureText) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;
const center = { 'Oven temperature': 180, 'Line speed': 3, 'Powder flow': 40 };

/** The core's prediction at the center with main effects only (order 1) or with interactions (2), written as the screen writes it. */
function expected(response: string, order: 1 | 2) {
  const data = backupResponseData(fixtureText, studyId, response);
  const p = predict(analyze(data, { terms: termsUpToOrder(data.factors.length, order) }).model, center);
  const n = (x: number) => String(Number(x.toPrecision(4)));
  return { pi: `${n(p.pi![0])} – ${n(p.pi![1])}`, terms: p.contributions.length };
}

test('the quick card follows the model chosen on the Effects screen, across the study tabs', async ({ page }) => {
  const main = expected('Gloss', 1);
  const both = expected('Gloss', 2);
  // The two models must differ here, or the test would prove nothing.
  expect(main.pi).not.toBe(both.pi);

  await page.goto(`/#/study/${studyId}/analysis`);
  await page.getByRole('button', { name: 'Gloss' }).click();
  await page.getByRole('button', { name: 'Main effects only' }).click();
  await expect(page.getByRole('list', { name: 'Effects on Gloss' }).locator('.bar-label')).toHaveCount(3);

  await page.getByRole('navigation', { name: 'Study' }).getByRole('link', { name: 'Predict' }).click();
  await expect(page).toHaveURL(new RegExp(`#/study/${studyId}/predict$`));
  // The response shown on the Effects screen is shown here too.
  await expect(page.getByRole('button', { name: 'Gloss' })).toHaveClass(/chosen/);
  await expect(page.getByTestId('pi')).toHaveText(`${main.pi} GU`);
  await expect(page.getByRole('list', { name: 'Contributions to Gloss' }).locator('li')).toHaveCount(main.terms);
  await expect(page.getByText('Model: main effects only (as chosen on the Effects screen)')).toBeVisible();

  // Through another tab and back: still the same choice.
  await page.getByRole('navigation', { name: 'Study' }).getByRole('link', { name: 'Runs' }).click();
  await page.getByRole('navigation', { name: 'Study' }).getByRole('link', { name: 'Effects' }).click();
  await expect(page.getByRole('button', { name: 'Main effects only' })).toHaveClass(/chosen/);
  await page.getByRole('button', { name: 'With interactions' }).click();
  await page.getByRole('link', { name: 'Check a prediction' }).click();
  await expect(page.getByTestId('pi')).toHaveText(`${both.pi} GU`);
  await expect(page.getByRole('list', { name: 'Contributions to Gloss' }).locator('li')).toHaveCount(both.terms);
});
