import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { analyze } from '../../src/core/fit/analyze.ts';
import { CAUTION } from '../../src/core/predict/caution.ts';
import { steepestPath } from '../../src/core/predict/steepest-path.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';
import { demoStudy as study, demoText as fixtureText } from './demo-fixture.ts';

// The Next runs screen: the path of steepest ascent as the core computes it, turned into planned
// path runs of the study; a solve for a target; confirmation runs planned there, logged, and
// judged. The caution is on the screen with every proposed setting. Phone sizes 390x844 and 360x740.
const n = (x: number) => String(Number(x.toPrecision(4)));

for (const size of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    test('the path of steepest ascent matches the core and becomes planned path runs on the run sheet', async ({ page }) => {
      await page.goto(`/#/study/${study.id}/next`);
      await page.getByRole('group', { name: 'Response' }).getByRole('button', { name: 'Gloss' }).click();
      await expect(page.getByRole('heading', { name: 'Path of steepest ascent' })).toBeVisible();
      await page.getByRole('group', { name: 'Base factor' }).getByRole('button', { name: 'Oven temperature' }).click();
      await page.getByRole('textbox', { name: 'Step of Oven temperature (°C)' }).fill('10');
      await page.getByRole('textbox', { name: 'Number of steps' }).fill('3');
      const model = analyze(backupResponseData(fixtureText, study.id, 'Gloss')).model;
      const core = steepestPath(model, { base: 'Oven temperature', step: 10, steps: 3 });
      const steps = page.getByTestId('path-steps').locator('li');
      await expect(steps).toHaveCount(4);
      for (const s of core.steps) await expect(steps.nth(s.step)).toContainText(`Predicted ${n(s.fit)} GU`);
      // 180 + 2 x 10 = 200 °C is the tested end; step 3 (210 °C) is beyond it.
      await expect(steps.nth(3)).toContainText('outside the tested range');
      await expect(steps.nth(2)).not.toContainText('outside the tested range');
      for (const line of CAUTION) await expect(page.getByLabel('Caution').last()).toContainText(line);
      await page.screenshot({ path: `test-results/next-runs-path-${size.width}.png`, fullPage: true });

      await page.getByRole('button', { name: 'Add the 3 steps as planned runs' }).click();
      // Added runs stay for good: the button asks first, beside itself, and "not now" adds nothing.
      const question = page.getByRole('alertdialog', { name: 'Add the 3 steps to the run sheet as planned runs?' });
      await expect(question).toBeVisible();
      await question.getByRole('button', { name: 'Not now' }).click();
      await expect(question).toHaveCount(0);
      await expect(page.getByRole('status')).toHaveCount(0);
      await page.getByRole('button', { name: 'Confirm at step 1' }).click();
      await expect(page.getByRole('alertdialog', { name: 'Add 3 confirmation runs at path step 1 to the run sheet?' })).toBeVisible();
      await page.getByRole('button', { name: 'Not now' }).click();
      await page.getByRole('button', { name: 'Add the 3 steps as planned runs' }).click();
      await question.getByRole('button', { name: 'Yes, add them' }).click();
      const first = study.design.runs.length + 1;
      await expect(page.getByRole('status')).toContainText(`Added runs ${first} to ${first + 2} to the run sheet as block 2`);
      await expect(page.getByRole('table', { name: /observed against predicted/ }).locator('tbody tr')).toHaveCount(3);
      // One tap, one block: the same path cannot be added twice by a second tap.
      await expect(page.getByRole('button', { name: 'These steps are on the run sheet' })).toBeDisabled();

      await page.getByRole('link', { name: 'Runs' }).click();
      await expect(page.locator('.run-card')).toHaveCount(study.design.runs.length + 3);
      const card = page.locator(`.run-card[data-run="${first}"]`);
      await expect(card).toContainText('path run');
      await expect(card).toContainText('190 °C');
      await page.reload();
      await expect(page.locator('.run-card')).toHaveCount(study.design.runs.length + 3);
    });

    test('solve, plan two confirmation runs, log them, and see the verdict', async ({ page }) => {
      await page.goto(`/#/study/${study.id}/next`);
      await page.getByRole('group', { name: 'Factor to move' }).getByRole('button', { name: 'Oven temperature' }).click();
      await page.getByRole('textbox', { name: 'Target Film thickness (µm)' }).fill('72');
      const result = page.getByTestId('solve-result');
      await expect(result).toContainText('Oven temperature:');
      await expect(result).toContainText('Predicted Film thickness there: 72 µm');
      await page.getByRole('textbox', { name: 'How many confirmation runs to plan' }).fill('2');
      await page.getByRole('button', { name: 'Plan confirmation runs at this setting' }).click();
      await page.getByRole('alertdialog', { name: /^Add 2 confirmation runs at Oven temperature .* °C to the run sheet\?$/ }).getByRole('button', { name: 'Yes, add them' }).click();
      const first = study.design.runs.length + 1;
      await expect(page.getByRole('status')).toContainText(`Added runs ${first} to ${first + 1}`);
      await expect(page.getByTestId('confirmation')).toContainText('None logged yet with a value for this response');
      // The runs are planned at the setting the screen showed, which the run form starts from.
      const shown = (await result.locator('strong').first().innerText()).replace(' °C', '').replace('−', '-');
      await page.goto(`/#/study/${study.id}/run/${first}`);
      await expect(page.getByRole('textbox', { name: 'Oven temperature' })).toHaveValue(shown);
      await page.goto(`/#/study/${study.id}/next`);
      await page.screenshot({ path: `test-results/next-runs-confirm-${size.width}.png`, fullPage: true });
      for (const [run, value] of [
        [first, '72.4'],
        [first + 1, '71.8'],
      ] as const) {
        await logThickness(page, run, value);
      }
      // The studies list counts the added runs with the plan's, as the run sheet does.
      await page.goto('/');
      await expect(page.locator('.card').first()).toContainText(`of ${study.design.runs.length + 2} planned runs logged`);
      await page.goto(`/#/study/${study.id}/next`);
      await expect(page.getByTestId('confirmation')).toContainText(/^.*(Confirmed|Not confirmed): the mean of the 2 confirmation runs, 72\.1, lies (inside|outside) the 95% interval for the mean of 2 new runs/);
      await page.screenshot({ path: `test-results/next-runs-verdict-${size.width}.png`, fullPage: true });
    });

    test('a step that is not a number gets a message and adds nothing', async ({ page }) => {
      await page.goto(`/#/study/${study.id}/next`);
      await page.getByRole('textbox', { name: /^Step of/ }).fill('ten');
      await expect(page.getByRole('alert')).toContainText('needs a number');
      await expect(page.getByRole('button', { name: /steps as planned runs/ })).toHaveCount(0);
    });

    test('no accessibility violations (axe-core, WCAG 2.1 AA rules)', async ({ page }) => {
      await page.goto(`/#/study/${study.id}/next`);
      await page.getByRole('textbox', { name: /^Step of/ }).fill('10');
      await page.getByRole('textbox', { name: /^Target/ }).fill('72');
      await expect(page.getByTestId('path-steps')).toBeVisible();
      const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
      expect(violations.map((v) => `${v.id}: ${v.nodes.map((x) => x.target.join(' ')).join('; ')}`)).toEqual([]);
    });
  });
}

async function logThickness(page: Page, run: number, value: string) {
  await page.goto(`/#/study/${study.id}/run/${run}`);
  await page.getByRole('textbox', { name: 'Film thickness reading' }).fill(value);
  await page.getByRole('button', { name: `Save run ${run}` }).click();
  await expect(page.getByRole('status')).toHaveText(`Saved ✓ run ${run}`);
}
