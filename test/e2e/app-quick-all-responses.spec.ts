import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyze } from '../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../src/core/model/formula.ts';
import { defaultDesirabilityEntry, readDesirabilityEntry } from '../../src/core/optimum/desirability-entry.ts';
import { desirabilityAt } from '../../src/core/optimum/desirability-search.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';
import { demoStudy, demoText } from './demo-fixture.ts';

// The quick card's block "All responses at these settings" on the INVENTED demo study (Film
// thickness with a target of 70 µm, Gloss to maximize): each prediction, d and the overall D
// shown are the core's desirabilityAt at the card's settings, from models fitted here from the
// same backup (interactions, the Effects screen's default) with the several-responses screen's
// starting limits, after Derringer and Suich (1980), Journal of Quality Technology 12, 214-219.
const href = `/#/study/${demoStudy.id}/predict`;
const data = demoStudy.responses.map((r) => backupResponseData(demoText, demoStudy.id, r.name));
const models = data.map((d) => analyze(d, { terms: termsUpToOrder(3, 2) }).model);
const specs = demoStudy.responses.map((r, i) => readDesirabilityEntry(r.name, defaultDesirabilityEntry(r, data[i].y))!);

/** What the block should read at coded settings, written as the screen writes numbers. */
function expected(coded: number[]) {
  const at = desirabilityAt(models, specs, coded);
  const n = (x: number, digits: number) => String(Number(x.toPrecision(digits))).replace('-', '−');
  return {
    rows: at.responses.map((r, i) => [demoStudy.responses[i].name, `${n(r.fit, 4)} ${demoStudy.responses[i].unit}`, n(r.d, 3)]),
    D: n(at.D, 3),
  };
}

async function readBlock(page: Page) {
  const rows = await page.getByTestId('all-at-row').evaluateAll((trs) => trs.map((tr) => [...tr.children].map((c) => c.textContent ?? '')));
  return { rows, D: await page.getByTestId('all-at-D').textContent() };
}

for (const size of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    test('the block shows every response with its prediction and d and the overall D, and follows a change of setting', async ({ page }) => {
      await page.goto(href);
      const block = page.getByTestId('all-at');
      await expect(block.getByRole('heading', { name: 'All responses at these settings' })).toBeVisible();
      await expect(page.getByTestId('all-at-row')).toHaveCount(2);
      const center = expected([0, 0, 0]);
      await expect.poll(() => readBlock(page)).toEqual(center);
      await expect(block).toContainText("d uses each response's goal with limits from the logged values; set them on the all-responses screen.");
      // The block is not in the sticky top block, which stays small.
      await expect(page.locator('.sticky-top [data-testid="all-at"]')).toHaveCount(0);

      await page.getByRole('textbox', { name: 'Oven temperature (A)' }).fill('190');
      await expect(page.getByTestId('coded-0')).toHaveText('coded +0.5');
      const moved = expected([0.5, 0, 0]);
      expect(moved).not.toEqual(center); // the check can see a change
      await expect.poll(() => readBlock(page)).toEqual(moved);

      // A setting that cannot be read changes nothing in the block.
      await page.getByRole('textbox', { name: 'Line speed (B)' }).fill('fast');
      await expect(page.locator('.factor .field-error')).toBeVisible();
      expect(await readBlock(page)).toEqual(moved);

      await block.scrollIntoViewIfNeeded();
      await page.screenshot({ path: join(tmpdir(), `trialbook-quick-all-${size.width}.png`) });
      const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
      expect(violations.map((v) => `${v.id} ${v.help}: ${v.nodes.map((x) => x.target.join(' ')).slice(0, 3).join('; ')}`)).toEqual([]);
      // The block's link is a full-size touch target.
      const link = (await block.getByRole('link', { name: 'All 2 responses at once ›' }).boundingBox())!;
      expect(link.height).toBeGreaterThanOrEqual(48);
    });

    test('a response on a transformed scale shows words instead of numbers, and the block says why there is no overall D', async ({ page }) => {
      await page.goto(`/#/study/${demoStudy.id}/analysis`);
      await page.getByRole('button', { name: 'Gloss', exact: true }).click();
      await page.getByRole('group', { name: 'Scale' }).getByRole('button', { name: 'Log' }).click();
      await page.getByRole('link', { name: 'Predict', exact: true }).click();
      const center = expected([0, 0, 0]);
      await expect(page.getByTestId('all-at-row').nth(1)).toHaveText('Glosstransformed scale');
      await expect(page.getByTestId('all-at-row').nth(0)).toHaveText(center.rows[0].join(''));
      await expect(page.getByTestId('all-at-D')).toHaveCount(0);
      await expect(page.getByTestId('all-at-missing')).toHaveText('No overall D: Gloss has no d here. Open the all-responses screen to see why and to set its goal or limits.');
      await page.getByTestId('all-at').scrollIntoViewIfNeeded();
      await page.screenshot({ path: join(tmpdir(), `trialbook-quick-all-transformed-${size.width}.png`) });
    });
  });
}
