import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** Screenshots go to the system's temporary folder, never into the repository. */
const shot = (name: string) => join(tmpdir(), `trialbook-so-${name}.png`);

// The second-order step on the phone: plan a rotatable central composite design for two factors,
// log its runs, fit the quadratic model and read the stationary point and the best setting.
// The responses are INVENTED for this test: a known surface plus small noise,
//   Yield = 80 - 2 (x1 - 0.3)^2 - 1.5 (x2 + 0.2)^2 + 0.5 x1 x2 (+ noise within +-0.05),
// in coded units x1 = (Temperature - 180) / 20, x2 = (Speed - 3) / 1.
function surface(x1: number, x2: number): number {
  return 80 - 2 * (x1 - 0.3) ** 2 - 1.5 * (x2 + 0.2) ** 2 + 0.5 * x1 * x2;
}
/** Its stationary point: gradient zero, -4 (x1 - 0.3) + 0.5 x2 = 0 and -3 (x2 + 0.2) + 0.5 x1 = 0 (solved by Cramer's rule). */
function stationary(): [number, number] {
  const [a, b, c, d, e, f] = [-4, 0.5, -1.2, 0.5, -3, 0.6]; // a x1 + b x2 = c, d x1 + e x2 = f
  const det = a * e - b * d;
  return [(c * e - b * f) / det, (a * f - c * d) / det];
}
function noise(seed: number): () => number {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32 - 0.5) * 0.1;
}

const preview = (page: Page) => page.getByRole('region', { name: 'Preview of the plan' });

async function axe(page: Page, where: string): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return violations.map((v) => `${where}: ${v.id} (${v.impact}) ${v.help}: ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join('; ')}`);
}

async function planForm(page: Page) {
  await page.goto('/');
  await page.getByRole('link', { name: 'Plan a new study' }).click();
  await page.getByLabel('Title', { exact: true }).fill('Press fit curvature trial (invented)');
  await page.getByLabel('Factor A name').fill('Temperature');
  await page.getByLabel('Factor A low').fill('160');
  await page.getByLabel('Factor A high').fill('200');
  await page.getByLabel('Factor A unit').fill('°C');
  await page.getByLabel('Factor B name').fill('Speed');
  await page.getByLabel('Factor B low').fill('2');
  await page.getByLabel('Factor B high').fill('4');
  await page.getByLabel('Factor B unit').fill('m/min');
  await page.getByLabel('Response 1 name').fill('Yield');
  await page.getByLabel('Response 1 unit').fill('%');
  await page.getByRole('group', { name: 'Kind of design' }).getByRole('button', { name: 'Central composite' }).click();
  await page.getByLabel('Seed of the run order').fill('4242');
}

test('a rotatable central composite design is planned, logged and analyzed with the quadratic model', async ({ page }) => {
  test.setTimeout(120_000);
  const problems: string[] = [];
  await planForm(page);

  // The comparison before creating: 4 + 4 + 5 = 13 runs, alpha = 4^(1/4) = 1.414, rotatable,
  // SPV at the center 13 x 0.2 = 2.6 (second-order-plan.ts's worked example).
  await expect(preview(page).locator('.plan-runs')).toHaveText('13 runs');
  await expect(page.getByTestId('so-alpha')).toHaveText('1.414');
  await expect(page.getByTestId('so-rotatable')).toHaveText('Yes');
  await expect(page.getByTestId('so-spv-center')).toHaveText('2.6');
  // 180 - 1.414 x 20 = 151.7 and 208.3 °C: outside the factorial range, with the caution.
  await expect(preview(page).locator('.so-warnings')).toContainText('Axial runs set Temperature to 151.7 °C and 208.3 °C, outside the factorial range 160 to 200 °C');
  await expect(preview(page).getByRole('region', { name: 'Caution' })).toContainText("machine's rated limits");
  // Face-centred: alpha 1, no warning; back to rotatable.
  await page.getByRole('button', { name: 'On the faces (1)' }).click();
  await expect(page.getByTestId('so-alpha')).toHaveText('1');
  await expect(preview(page).locator('.so-warnings')).toHaveCount(0);
  await page.getByRole('button', { name: 'Rotatable' }).click();
  await page.screenshot({ path: shot('plan-390'), fullPage: true });
  problems.push(...(await axe(page, 'plan')));

  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page).toHaveURL(/#\/study\/[^/]+$/);
  await expect(page.locator('.run-card')).toHaveCount(13);
  await expect(page.locator('.run-card .run-kind', { hasText: 'axial point' })).toHaveCount(4);
  const studyId = decodeURIComponent(/#\/study\/([^/]+)$/.exec(page.url())![1]);

  const r = noise(7);
  let sawAxialWarning = false;
  for (let n = 1; n <= 13; n++) {
    await page.goto(`/#/study/${encodeURIComponent(studyId)}/run/${n}`);
    const t = Number(await page.getByRole('textbox', { name: 'Temperature', exact: true }).inputValue());
    const s = Number(await page.getByRole('textbox', { name: 'Speed', exact: true }).inputValue());
    const x1 = (t - 180) / 20;
    const x2 = s - 3;
    if (Math.abs(x1) > 1.01 || Math.abs(x2) > 1.01) {
      await expect(page.locator('.axial-warning')).toContainText('This axial run sets');
      await expect(page.locator('.axial-warning').getByRole('region', { name: 'Caution' })).toBeVisible();
      if (!sawAxialWarning) {
        await page.screenshot({ path: shot('axial-run-390'), fullPage: true });
        problems.push(...(await axe(page, 'axial run')));
      }
      sawAxialWarning = true;
    } else {
      await expect(page.locator('.axial-warning')).toHaveCount(0);
    }
    await page.getByRole('textbox', { name: 'Yield reading' }).fill((surface(x1, x2) + r()).toFixed(3));
    await page.getByRole('button', { name: `Save run ${n}` }).click();
    await expect(page.getByRole('status')).toHaveText(`Saved ✓ run ${n}`);
  }
  expect(sawAxialWarning).toBe(true);

  await page.goto(`/#/study/${encodeURIComponent(studyId)}/analysis`);
  await page.getByRole('button', { name: 'Quadratic (with curvature)' }).click();
  await expect(page.getByTestId('so-nature')).toHaveText('maximum');
  await expect(page.getByTestId('so-place')).toHaveText('It lies inside the tested box.');
  const [x1s, x2s] = stationary();
  const items = page.getByTestId('so-stationary').locator('strong');
  const tReal = parseFloat((await items.nth(0).innerText()).replace('−', '-'));
  const sReal = parseFloat((await items.nth(1).innerText()).replace('−', '-'));
  // Known surface: x_s = (0.281, -0.153), i.e. 185.6 °C and 2.847 m/min; noise within +-0.05 moves it little.
  expect(Math.abs(tReal - (180 + 20 * x1s))).toBeLessThan(1.5);
  expect(Math.abs(sReal - (3 + x2s))).toBeLessThan(0.1);
  // The goal is to maximize and the top lies inside the box: the best setting is the same point.
  const best = page.getByTestId('so-best').locator('strong');
  expect(Math.abs(parseFloat(await best.nth(0).innerText()) - tReal)).toBeLessThan(0.2);
  await expect(page.getByRole('heading', { name: 'Highest Yield inside the tested box' })).toBeVisible();
  await expect(page.locator('.so-summary')).toContainText('one new run between');
  await expect(page.locator('.so-kinds')).toContainText('Squares (curvature)');
  await page.screenshot({ path: shot('analysis-390'), fullPage: true });
  problems.push(...(await axe(page, 'analysis')));

  // The quick card predicts from the quadratic model; an axial setting is inside the tested range.
  await page.goto(`/#/study/${encodeURIComponent(studyId)}/predict`);
  await page.getByRole('textbox', { name: 'Temperature (A)' }).fill('208');
  await expect(page.locator('.factor.outside')).toHaveCount(0);
  await page.screenshot({ path: shot('quick-390'), fullPage: true });

  // The narrow phone.
  await page.setViewportSize({ width: 360, height: 740 });
  await page.goto(`/#/study/${encodeURIComponent(studyId)}/analysis`);
  await expect(page.getByTestId('so-nature')).toHaveText('maximum');
  await page.screenshot({ path: shot('analysis-360'), fullPage: true });
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
  await planForm(page);
  await expect(page.getByTestId('so-alpha')).toHaveText('1.414');
  await page.screenshot({ path: shot('plan-360'), fullPage: true });
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);
  expect(problems).toEqual([]);
});

test('a categorical factor rules out the second-order designs with a plain message; Box-Behnken needs 3 factors', async ({ page }) => {
  await planForm(page);
  await page.getByRole('group', { name: 'Factor B levels are' }).getByRole('button', { name: 'Named levels' }).click();
  await page.getByLabel('Factor B level 1').fill('old die');
  await page.getByLabel('Factor B level 2').fill('new die');
  await expect(page.locator('.new-study .field-error').first()).toContainText('so they need numeric factors: Factor B (Speed) has named levels');
  await expect(preview(page)).toContainText('Not ready yet');
  const before = await page.evaluate(() => location.hash);
  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page.locator('.problem')).toContainText('numeric factors');
  expect(await page.evaluate(() => location.hash)).toBe(before);
  await page.getByRole('group', { name: 'Factor B levels are' }).getByRole('button', { name: 'Numbers' }).click();
  await page.getByRole('group', { name: 'Kind of design' }).getByRole('button', { name: 'Box-Behnken' }).click();
  await expect(preview(page)).toContainText('A Box-Behnken design takes 3 to 7 factors, got 2');
});
