import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { CAUTION } from '../../src/core/predict/caution.ts';

// The second-order journey on the phone, in one study: a 2^2 with four center runs shows
// curvature, the Next tab adds the axial block, the quadratic model gives the best setting (and,
// for a saddle, the ridge table), the quick card draws the contour chart, and several responses
// are weighed at once. The readings are INVENTED for this test, two known surfaces in coded
// units x1 = (Temperature - 180) / 20, x2 = (Speed - 3) / 1, plus a small repeatable noise:
//   Yield = 80 + 1.5 x1 + 1 x2 - 4 x1^2 - 3 x2^2 (a top inside the box), and
//   Haze  = 5 + 0.6 x1 - 0.5 x2 + 1.2 x1^2 - 1.0 x2^2 (a saddle).
const yieldAt = (x1: number, x2: number) => 80 + 1.5 * x1 + x2 - 4 * x1 * x1 - 3 * x2 * x2;
const hazeAt = (x1: number, x2: number) => 5 + 0.6 * x1 - 0.5 * x2 + 1.2 * x1 * x1 - 1.0 * x2 * x2;
function noise(seed: number): () => number {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32 - 0.5) * 0.1;
}

const shot = (name: string) => join(tmpdir(), `trialbook-journey-${name}.png`);

/** The whole page as pictures one screen tall, at CSS pixels (for looking at), in the temporary folder. */
async function look(page: Page, name: string) {
  const { w, h } = await page.evaluate(() => ({ w: document.documentElement.clientWidth, h: document.documentElement.scrollHeight }));
  for (let y = 0, i = 0; y < h; y += 800, i++) await page.screenshot({ path: shot(`${name}-${i}`), clip: { x: 0, y, width: w, height: Math.min(800, h - y) }, fullPage: true, scale: 'css' });
}

async function axe(page: Page, where: string): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return violations.map((v) => `${where}: ${v.id} ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(', ')}`);
}

/** Logs planned runs from..to with the invented surfaces at each run's planned setting. */
async function logRuns(page: Page, studyId: string, from: number, to: number, r: () => number) {
  for (let n = from; n <= to; n++) {
    await page.goto(`/#/study/${encodeURIComponent(studyId)}/run/${n}`);
    const x1 = (Number(await page.getByRole('textbox', { name: 'Temperature', exact: true }).inputValue()) - 180) / 20;
    const x2 = Number(await page.getByRole('textbox', { name: 'Speed', exact: true }).inputValue()) - 3;
    await page.getByRole('textbox', { name: 'Yield reading' }).fill((yieldAt(x1, x2) + r()).toFixed(3));
    await page.getByRole('textbox', { name: 'Haze reading' }).fill((hazeAt(x1, x2) + r()).toFixed(3));
    await page.getByRole('button', { name: `Save run ${n}` }).click();
    await expect(page.getByRole('status')).toHaveText(`Saved ✓ run ${n}`);
  }
}

test('from curvature to axial runs, the quadratic model, the contour chart and several responses, at 390x844 and 360x740', async ({ page }) => {
  test.setTimeout(180_000);
  const problems: string[] = [];
  await page.goto('/');
  await page.getByRole('link', { name: 'Plan a new study' }).click();
  await page.getByLabel('Title', { exact: true }).fill('Press fit second-order trial (invented)');
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
  await page.getByRole('button', { name: '+ Add a response' }).click();
  await page.getByLabel('Response 2 name').fill('Haze');
  await page.getByLabel('Response 2 unit').fill('%');
  await page.getByRole('group', { name: 'Response 2 goal' }).getByRole('button', { name: 'Minimize' }).click();
  for (let i = 0; i < 4; i++) await page.getByRole('button', { name: 'One more: Center runs' }).click();
  await page.getByLabel('Seed of the run order').fill('2711');
  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page).toHaveURL(/#\/study\/[^/]+$/);
  await expect(page.locator('.run-card')).toHaveCount(8);
  const studyId = decodeURIComponent(/#\/study\/([^/]+)$/.exec(page.url())![1]);
  const base = `/#/study/${encodeURIComponent(studyId)}`;
  const r = noise(11);
  await logRuns(page, studyId, 1, 8, r);

  // Curvature: the center runs sit well above the factorial average.
  await page.goto(`${base}/analysis`);
  await expect(page.locator('.part-fit')).toContainText('Curvature is significant');

  // The Next tab adds the axial block and its center runs as block 2.
  await page.goto(`${base}/next`);
  await expect(page.getByRole('heading', { name: 'Add axial runs' })).toBeVisible();
  await look(page, 'next-390');
  problems.push(...(await axe(page, 'next')));
  const add = page.getByRole('button', { name: /^Add the \d+ runs to the run sheet$/ });
  const added = Number(/Add the (\d+) runs/.exec((await add.innerText()).trim())![1]);
  await add.click();
  await expect(page.getByRole('status')).toContainText('to the run sheet as block 2');
  await logRuns(page, studyId, 9, 8 + added, r);

  // The quadratic model for each response: Yield has its top inside the box; Haze is a saddle, with its ridge table.
  await page.goto(`${base}/analysis`);
  await page.getByRole('button', { name: 'Quadratic (with curvature)' }).click();
  await expect(page.getByTestId('so-nature')).toHaveText('maximum');
  await expect(page.getByTestId('so-place')).toHaveText('It lies inside the tested box.');
  await expect(page.getByTestId('so-ridge')).toHaveCount(0);
  await look(page, 'analysis-yield-390');
  problems.push(...(await axe(page, 'analysis Yield')));
  await page.getByRole('group', { name: 'Response' }).getByRole('button', { name: 'Haze' }).click();
  await page.getByRole('button', { name: 'Quadratic (with curvature)' }).click();
  await expect(page.getByTestId('so-nature')).toHaveText('saddle');
  const ridge = page.getByTestId('so-ridge');
  await expect(ridge.locator('caption')).toHaveText('Lowest Haze at each distance from the center');
  const rows = ridge.locator('tbody tr');
  expect(await rows.count()).toBeGreaterThanOrEqual(10);
  await expect(rows.first().locator('th')).toHaveText('0.1');
  // The ridge of lowest Haze falls as the radius grows (each ring holds the one inside it: Hoerl 1959).
  const fits = (await rows.locator('.so-ridge-fit').allInnerTexts()).map((t) => parseFloat(t.replace('−', '-')));
  for (let i = 1; i < fits.length; i++) expect(fits[i]).toBeLessThanOrEqual(fits[i - 1] + 1e-9);
  await look(page, 'analysis-haze-390');
  problems.push(...(await axe(page, 'analysis Haze')));

  // The quick card: the contour chart of the quadratic model, with the caution, and the link on.
  await page.goto(`${base}/predict`);
  await expect(page.getByRole('heading', { name: 'Contour chart' })).toBeVisible();
  for (const line of CAUTION) await expect(page.locator('.sticky-top').getByLabel('Caution')).toContainText(line);
  await look(page, 'quick-390');
  problems.push(...(await axe(page, 'quick card')));

  // The Next tab does not offer a first-order path for a model with squares: it points to the quick card.
  await page.goto(`${base}/next`);
  await expect(page.getByTestId('path-needs-first-order')).toContainText('has squares');
  await expect(page.getByRole('button', { name: 'Larger (ascent)' })).toHaveCount(0);
  await page.getByTestId('path-needs-first-order').getByRole('link', { name: 'Open the quick card' }).click();
  await expect(page.getByRole('heading', { name: 'Contour chart' })).toBeVisible();

  // Several responses: the best compromise has D above 0 and keeps every setting inside the box.
  await page.getByRole('link', { name: 'All 2 responses at once ›' }).first().click();
  const D = parseFloat(await page.getByTestId('mr-D').innerText());
  expect(D).toBeGreaterThan(0);
  expect(D).toBeLessThanOrEqual(1);
  for (const c of await page.getByTestId('mr-settings').locator('.mr-coded').allInnerTexts()) expect(Math.abs(parseFloat(c.replace('coded ', '').replace('−', '-')))).toBeLessThanOrEqual(1);
  await look(page, 'several-390');
  problems.push(...(await axe(page, 'several responses')));

  // The narrow phone: the same screens fit 360 px.
  await page.setViewportSize({ width: 360, height: 740 });
  for (const [where, path] of [
    ['analysis-haze-360', `${base}/analysis`],
    ['quick-360', `${base}/predict`],
    ['several-360', `${base}/responses`],
    ['next-360', `${base}/next`],
  ] as const) {
    await page.goto(path);
    await expect(page.locator('h2').first()).toBeVisible();
    if (where.startsWith('analysis')) await expect(page.getByTestId('so-ridge')).toBeVisible();
    await look(page, where);
    expect(await page.evaluate(() => document.documentElement.scrollWidth), where).toBeLessThanOrEqual(360);
  }
  expect(problems).toEqual([]);
});
