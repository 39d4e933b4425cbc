import { test, expect } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { CAUTION } from '../../src/core/predict/caution.ts';
import { demoStudy as study } from './demo-fixture.ts';

// "Add axial runs" on the Next screen: the demo study (invented data, a 2^3 with 3 center runs)
// augmented into a central composite design in the same study. The preview's axial settings are
// checked against the Box and Hunter (1957) axial distance worked out here by hand, and the
// added runs join the run sheet as a new block. Phone sizes 390x844 and 360x740.
// Box and Hunter (1957): alpha = sqrt(k (1 + ns0/ns) / (1 + nc0/nc)); k = 3, nc = 8, nc0 = 3, ns = 6, ns0 = 3.
const alpha = Math.sqrt((3 * (1 + 3 / 6)) / (1 + 3 / 8));
const real = (low: number, high: number, x: number) => String(Number(((low + high) / 2 + (x * (high - low)) / 2).toPrecision(4)));

for (const size of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    test('previews the axial block in real units with the warning and the caution, then adds it to the run sheet', async ({ page }) => {
      await page.goto(`/#/study/${study.id}/next`);
      await expect(page.getByRole('heading', { name: 'Add axial runs' })).toBeVisible();
      const preview = page.getByTestId('axial-preview');
      await expect(preview).toContainText('9 new runs: 6 axial, 3 center');
      await expect(preview).toContainText('can estimate the full second-order model');
      const temp = preview.getByRole('row', { name: /Oven temperature/ });
      await expect(temp.locator('th')).toHaveText('Oven temperature (°C)');
      await expect(temp.locator('td').nth(0)).toHaveText(`${real(160, 200, -alpha)}`);
      await expect(temp.locator('td').nth(1)).toHaveText(`${real(160, 200, alpha)}`);
      const speed = preview.getByRole('row', { name: /Line speed/ });
      await expect(speed.locator('th')).toHaveText('Line speed (m/min)');
      await expect(speed.locator('td').nth(1)).toHaveText(`${real(2, 4, alpha)}`);
      // alpha > 1: every axial setting lies past the factorial range, so each factor is warned about.
      await expect(page.getByTestId('axial-warnings').locator('li')).toHaveCount(3);
      for (const line of CAUTION) await expect(preview.getByLabel('Caution')).toContainText(line);
      await page.locator('.add-axial').screenshot({ path: `test-results/axial-preview-${size.width}.png` });

      // On the faces: alpha = 1, inside the factorial range, no warning; the caution stays.
      await page.getByRole('group', { name: 'How far out the axial runs go' }).getByRole('button', { name: 'On the faces (±1)' }).click();
      await expect(page.getByTestId('axial-warnings')).toHaveCount(0);
      await expect(preview.getByRole('row', { name: /Oven temperature/ }).locator('td').nth(0)).toHaveText('160');
      for (const line of CAUTION) await expect(preview.getByLabel('Caution')).toContainText(line);
      // Bad input: a count that is not a whole number says so and offers no button.
      await page.getByRole('textbox', { name: 'Center runs in the new block' }).fill('two');
      await expect(page.getByRole('alert')).toContainText('The number of center runs needs a number');
      await expect(page.getByRole('button', { name: /runs to the run sheet/ })).toHaveCount(0);
      await page.getByRole('textbox', { name: 'Center runs in the new block' }).fill('2');
      await expect(preview).toContainText('8 new runs: 6 axial, 2 center');

      await page.getByRole('button', { name: 'Add the 8 runs to the run sheet' }).click();
      const first = study.design.runs.length + 1;
      await expect(page.getByRole('status')).toContainText(`Added runs ${first} to ${first + 7} to the run sheet as block 2`);
      await expect(page.getByRole('button', { name: /runs to the run sheet/ })).toHaveCount(0);

      await page.getByRole('link', { name: 'Runs' }).click();
      await expect(page.locator('.run-card')).toHaveCount(study.design.runs.length + 8);
      await expect(page.locator('.run-card', { hasText: 'axial point' })).toHaveCount(6);
      await page.goto(`/#/study/${study.id}/next`);
      await expect(page.getByTestId('axial-done')).toContainText(`in block 2`);
    });

    test('no accessibility violations with the axial preview shown (axe-core, WCAG 2.1 AA rules)', async ({ page }) => {
      await page.goto(`/#/study/${study.id}/next`);
      await expect(page.getByTestId('axial-preview')).toBeVisible();
      const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
      expect(violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
    });
  });
}
