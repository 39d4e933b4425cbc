import { test, expect } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { analyze } from '../../src/core/fit/analyze.ts';
import { CAUTION } from '../../src/core/predict/caution.ts';
import { predict } from '../../src/core/predict/predict.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';

// The quick card predicts at the settings on the sliders with the same core the command line
// uses, shows both 95% intervals and the caution, and warns outside the tested range.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const studyId = (JSON.parse(fixtureText) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;

/** The core's prediction, written the way the screen writes numbers (4 significant digits). */
function expected(response: string, settings: Record<string, number>) {
  const model = analyze(backupResponseData(fixtureText, studyId, response)).model;
  const p = predict(model, settings);
  const n = (x: number) => String(Number(x.toPrecision(4)));
  return { fit: n(p.fit), ci: `${n(p.ci![0])} – ${n(p.ci![1])}`, pi: `${n(p.pi![0])} – ${n(p.pi![1])}` };
}

test('the quick card shows the prediction with its intervals and the caution, at the center', async ({ page }) => {
  await page.goto(`/#/study/${studyId}/predict`);
  const e = expected('Film thickness', { 'Oven temperature': 180, 'Line speed': 3, 'Powder flow': 40 });
  await expect(page.getByTestId('predicted-value')).toHaveText(`${e.fit} µm`);
  await expect(page.getByTestId('ci')).toHaveText(`${e.ci} µm`);
  await expect(page.getByTestId('pi')).toHaveText(`${e.pi} µm`);
  for (const line of CAUTION) await expect(page.getByLabel('Caution')).toContainText(line);
  await expect(page.getByTestId('coded-0')).toHaveText('coded 0');
  await expect(page.getByText('Outside the tested range')).toHaveCount(0);
  // Every term's contribution is listed (six terms: three main effects, three interactions).
  await expect(page.getByRole('list', { name: 'Contributions to Film thickness' }).locator('li')).toHaveCount(6);
});

test('a typed setting updates the prediction, and a slider beyond the tested range warns', async ({ page }) => {
  await page.goto(`/#/study/${studyId}/predict`);
  await page.getByRole('textbox', { name: 'Oven temperature (A)' }).fill('190');
  await expect(page.getByTestId('coded-0')).toHaveText('coded +0.5');
  const e = expected('Film thickness', { 'Oven temperature': 190, 'Line speed': 3, 'Powder flow': 40 });
  await expect(page.getByTestId('predicted-value')).toHaveText(`${e.fit} µm`);
  await expect(page.locator('.predicted [role="alert"]')).toHaveCount(0);

  // The slider's end is half a range past the tested high setting: coded +1.5, 210 °C.
  const slider = page.getByRole('slider', { name: 'Oven temperature slider' });
  await slider.focus();
  await page.keyboard.press('End');
  await expect(page.getByTestId('coded-0')).toHaveText('coded +1.5');
  await expect(page.getByRole('textbox', { name: 'Oven temperature (A)' })).toHaveValue('210');
  await expect(page.locator('.predicted [role="alert"]')).toHaveText('⚠ Outside the tested range');
  await expect(page.getByText('Oven temperature = 210 °C is outside the tested range (160 to 200 °C)')).toBeVisible();
  const out = expected('Film thickness', { 'Oven temperature': 210, 'Line speed': 3, 'Powder flow': 40 });
  await expect(page.getByTestId('predicted-value')).toHaveText(`${out.fit} µm`);
  // The caution stays with the prediction.
  for (const line of CAUTION) await expect(page.getByLabel('Caution')).toContainText(line);

  await page.getByRole('button', { name: 'Back to the center' }).click();
  await expect(page.getByTestId('coded-0')).toHaveText('coded 0');
  await expect(page.locator('.predicted [role="alert"]')).toHaveCount(0);
});

test('a setting that is not a number gets a message and leaves the prediction as it was', async ({ page }) => {
  await page.goto(`/#/study/${studyId}/predict`);
  await page.getByRole('button', { name: 'Gloss' }).click();
  const e = expected('Gloss', { 'Oven temperature': 180, 'Line speed': 3, 'Powder flow': 40 });
  await expect(page.getByTestId('predicted-value')).toHaveText(`${e.fit} GU`);
  await page.getByRole('textbox', { name: 'Line speed (B)' }).fill('3,5,1');
  await expect(page.locator('.factor .field-error')).toContainText('Line speed needs a number (digits, with a point or a comma for decimals), got "3,5,1". The prediction still uses 3 m/min.');
  await expect(page.getByTestId('predicted-value')).toHaveText(`${e.fit} GU`);
  await expect(page.getByTestId('coded-1')).toHaveText('coded 0');
});
