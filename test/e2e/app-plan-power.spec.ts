import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildDesign, type DesignSpec } from '../../src/core/design/build-design.ts';
import { planPower } from '../../src/core/plan/power.ts';
import { powerInWords } from '../../src/core/plan/power-words.ts';
import { analyze } from '../../src/core/fit/analyze.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';

// The power of the plan on the planning form, live as replicates, center runs or the design
// change; a wrong effect or noise explained with nothing else changed; no test possible when the
// model leaves no residual df; Plackett-Burman screening designs offered and created; the noise
// taken from an earlier study's residual SD (the invented demo study). Expected sentences come
// from the core's planPower and powerInWords for the same plan (their own tests check them
// against published power tables).

const shot = (name: string) => join(tmpdir(), `trialbook-${name}.png`);
const preview = (page: Page) => page.getByRole('region', { name: 'Preview of the plan' });
const status = (page: Page) => page.locator('.plan-power');

const FACTORS: DesignSpec['factors'] = [
  { kind: 'numeric', name: 'Temperature', low: 160, high: 200 },
  { kind: 'numeric', name: 'Time', low: 10, high: 20 },
  { kind: 'numeric', name: 'Speed', low: 2, high: 4 },
  { kind: 'numeric', name: 'Pressure', low: 1, high: 3 },
  { kind: 'numeric', name: 'Flow', low: 5, high: 9 },
];

async function openForm(page: Page) {
  await page.goto('/');
  await expect(page.getByRole('link', { name: /^Open Invented demo/ })).toBeVisible();
  await page.getByRole('link', { name: 'Plan a new study' }).click();
  await expect(page.getByRole('heading', { name: 'Plan a new study' })).toBeVisible();
}

async function fillFactors(page: Page, k: number) {
  for (let i = 0; i < k; i++) {
    const letter = 'ABCDE'[i];
    if (i >= 2) await page.getByRole('button', { name: '+ Add a factor' }).click();
    const f = FACTORS[i] as { name: string; low: number; high: number };
    await page.getByLabel(`Factor ${letter} name`).fill(f.name);
    await page.getByLabel(`Factor ${letter} low`).fill(String(f.low));
    await page.getByLabel(`Factor ${letter} high`).fill(String(f.high));
  }
}

function expected(k: number, spec: Partial<DesignSpec>, effect: number, sigma: number): string {
  return powerInWords(planPower(buildDesign({ factors: FACTORS.slice(0, k), seed: 1, ...spec }), { effect, sigma }));
}

for (const size of [{ width: 390, height: 844 }, { width: 360, height: 740 }]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    test('the power follows replicates and center runs live; a wrong effect or noise is explained and changes nothing else', async ({ page }) => {
      await openForm(page);
      await fillFactors(page, 3);
      await page.getByLabel('Response 1 name').fill('Strength');
      await expect(status(page)).toContainText('Type the smallest effect that matters');
      await page.getByLabel('Effect that matters').fill('2');
      await page.getByLabel('Run-to-run noise (SD)').fill('1.5');
      // 2^3 with main effects and the three two-factor interactions: 1 residual df.
      await expect(status(page)).toHaveText(expected(3, {}, 2, 1.5));
      await page.getByRole('button', { name: 'One more: Center runs' }).click();
      await page.getByRole('button', { name: 'One more: Center runs' }).click();
      await expect(status(page)).toHaveText(expected(3, { centerRuns: 2 }, 2, 1.5));
      await page.getByRole('button', { name: 'One more: Replicates' }).click();
      const twice = expected(3, { centerRuns: 2, replicates: 2 }, 2, 1.5);
      await expect(status(page)).toHaveText(twice);
      expect(twice).toContain('With these 20 runs and noise of about 1.5, an effect of 2 is found');
      await status(page).scrollIntoViewIfNeeded();
      await page.screenshot({ path: shot(`plan-power-${size.width}`), fullPage: false });

      // Bad input: an effect of 0 and a negative noise; the plan itself stays as it was.
      await page.getByLabel('Effect that matters').fill('0');
      await expect(status(page)).toHaveText('The effect to detect must be a number greater than 0, got 0');
      await expect(page.getByLabel('Effect that matters')).toHaveAttribute('aria-invalid', 'true');
      await page.getByLabel('Effect that matters').fill('2');
      await page.getByLabel('Run-to-run noise (SD)').fill('-1.5');
      await expect(status(page)).toHaveText('The run-to-run standard deviation (sigma) must be a number greater than 0, got -1.5');
      await expect(preview(page).locator('.plan-runs')).toHaveText('20 runs');
      await page.getByLabel('Run-to-run noise (SD)').fill('1.5');
      await expect(status(page)).toHaveText(twice);
    });

    test('a half fraction with every estimable term leaves no residual df: no test is possible, Lenth is named', async ({ page }) => {
      await openForm(page);
      await fillFactors(page, 4);
      await page.getByRole('button', { name: /^1\/2 · 8 runs · resolution IV$/ }).click();
      await page.getByLabel('Effect that matters').fill('3');
      await page.getByLabel('Run-to-run noise (SD)').fill('1');
      await expect(status(page)).toContainText('the model leaves no residual degrees of freedom, so no t test of an effect is possible');
      await expect(status(page)).toHaveText(expected(4, { fraction: '1/2' }, 3, 1));
      await page.getByRole('button', { name: 'One more: Center runs' }).click();
      await expect(status(page)).toContainText('an effect of 3 is found');
    });

    test('a 12-run Plackett-Burman screen of 5 factors is offered, shows its power and is created', async ({ page }) => {
      await openForm(page);
      await fillFactors(page, 5);
      await page.getByLabel('Title', { exact: true }).fill(`Screen ${size.width}`);
      await page.getByLabel('Response 1 name').fill('Strength');
      await expect(page.getByRole('button', { name: 'Screening · 20 runs (Plackett-Burman)' })).toBeVisible();
      await page.getByRole('button', { name: 'Screening · 12 runs (Plackett-Burman)' }).click();
      await expect(preview(page).locator('.plan-runs')).toHaveText('12 runs');
      await expect(preview(page).locator('.plan-summary')).toContainText('a Plackett-Burman screening design for 5 factors');
      await expect(preview(page).locator('.plan-resolution')).toContainText('Screening design');
      await expect(preview(page).locator('.plan-notes')).toContainText('Partial aliasing');
      await page.getByLabel('Effect that matters').fill('2');
      await page.getByLabel('Run-to-run noise (SD)').fill('1');
      // Main effects only for a screen: 12 - 1 - 5 = 6 residual df.
      await expect(status(page)).toHaveText(expected(5, { plackettBurman: 12 }, 2, 1));
      await page.screenshot({ path: shot(`plan-screening-${size.width}`), fullPage: true });
      const axe = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
      expect(axe.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join('; ')}`)).toEqual([]);
      await page.getByRole('button', { name: 'Create study' }).click();
      await expect(page).toHaveURL(/#\/study\/[^/]+$/);
      await expect(page.getByText(`Screen ${size.width}`).first()).toBeVisible();
    });

    test('the noise can be taken from an earlier study whose response has the same name (the invented demo)', async ({ page }) => {
      const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
      const demoId = (JSON.parse(fixtureText) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;
      const a = analyze(backupResponseData(fixtureText, demoId, 'Gloss'));
      const sigma = Number(a.sigma!.toPrecision(3));
      await openForm(page);
      await fillFactors(page, 3);
      await expect(page.getByText('Take the noise from an earlier study', { exact: true })).toHaveCount(0);
      await page.getByLabel('Response 1 name').fill('gloss');
      const choice = page.getByRole('button', { name: new RegExp(`· Gloss: ${String(sigma).replace('.', '\\.')} \\(${a.df.residual} df\\)$`) });
      await expect(choice).toBeVisible();
      await choice.click();
      await expect(choice).toHaveAttribute('aria-pressed', 'true');
      await expect(page.getByLabel('Run-to-run noise (SD)')).toHaveValue(String(sigma));
      await page.getByLabel('Effect that matters').fill('4');
      await expect(status(page)).toHaveText(expected(3, {}, 4, sigma));
      await page.getByText('Take the noise from an earlier study', { exact: true }).scrollIntoViewIfNeeded();
      await page.screenshot({ path: shot(`plan-noise-${size.width}`) });
      const axe = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
      expect(axe.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join('; ')}`)).toEqual([]);
    });
  });
}

test('more factors than the chosen screening design takes: the plan says so and nothing is created', async ({ page }) => {
  await openForm(page);
  await page.getByLabel('Title', { exact: true }).fill('Too wide a screen');
  await page.getByLabel('Response 1 name').fill('Strength');
  for (let i = 0; i < 11; i++) {
    const letter = 'ABCDEFGHJKLM'[i];
    if (i >= 2) await page.getByRole('button', { name: '+ Add a factor' }).click();
    await page.getByLabel(`Factor ${letter} name`).fill(`Setting ${i + 1}`);
    await page.getByLabel(`Factor ${letter} low`).fill('0');
    await page.getByLabel(`Factor ${letter} high`).fill('1');
  }
  await page.getByRole('button', { name: 'Screening · 12 runs (Plackett-Burman)' }).click();
  await expect(preview(page).locator('.plan-runs')).toHaveText('12 runs');
  await page.getByRole('button', { name: '+ Add a factor' }).click();
  await page.getByLabel('Factor M name').fill('Setting 12');
  await page.getByLabel('Factor M low').fill('0');
  await page.getByLabel('Factor M high').fill('1');
  // Plackett and Burman (1946): a 12-run design has 11 columns.
  await expect(page.getByText('The 12-run Plackett-Burman design is not offered for 12 factors; choose one of the above.')).toBeVisible();
  await expect(preview(page)).toContainText('Not ready yet: A 12-run Plackett-Burman design takes up to 11 factors, got 12');
  await expect(page.getByRole('button', { name: 'Screening · 12 runs (Plackett-Burman)' })).toHaveCount(0);
  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page).toHaveURL(/#\/new$/);
  await page.goto('/');
  await expect(page.getByText('Too wide a screen')).toHaveCount(0);
});
