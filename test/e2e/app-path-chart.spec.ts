import { test, expect } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { demoStudy as study } from './demo-fixture.ts';

// The path chart: once path runs of the INVENTED demo study are logged, observed and predicted
// Gloss are drawn by step (uPlot, loaded when first shown); before any is logged there is only
// the table, which stays under the chart. Phone sizes 390x844 and 360x740.
const shot = (name: string) => join(tmpdir(), `trialbook-${name}.png`);

for (const size of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    test('the chart draws once path runs are logged, with the table kept below it', async ({ page }) => {
      await page.goto(`/#/study/${study.id}/next`);
      await page.getByRole('group', { name: 'Response' }).getByRole('button', { name: 'Gloss' }).click();
      await page.getByRole('group', { name: 'Base factor' }).getByRole('button', { name: 'Oven temperature' }).click();
      await page.getByRole('textbox', { name: 'Step of Oven temperature (°C)' }).fill('10');
      await page.getByRole('textbox', { name: 'Number of steps' }).fill('3');
      await page.getByRole('button', { name: 'Add the 3 steps as planned runs' }).click();
      await page.getByRole('button', { name: 'Yes, add them' }).click();
      const first = study.design.runs.length + 1;
      await expect(page.getByRole('status')).toContainText(`Added runs ${first} to ${first + 2}`);
      const table = page.getByRole('table', { name: /observed against predicted/ });
      await expect(table.locator('tbody tr')).toHaveCount(3);
      // Nothing logged yet: no chart, only the table.
      await expect(page.getByRole('img', { name: /observed and predicted Gloss by step/ })).toHaveCount(0);

      for (const [run, value] of [
        [first, '88'],
        [first + 1, '91'],
      ] as const) {
        await page.goto(`/#/study/${study.id}/run/${run}`);
        await page.getByRole('textbox', { name: 'Gloss reading' }).fill(value);
        await page.getByRole('button', { name: `Save run ${run}` }).click();
        await expect(page.getByRole('status')).toHaveText(`Saved ✓ run ${run}`);
      }
      await page.goto(`/#/study/${study.id}/next`);
      await page.getByRole('group', { name: 'Response' }).getByRole('button', { name: 'Gloss' }).click();
      const chart = page.getByRole('img', { name: /observed and predicted Gloss by step: 3 steps, 2 logged/ });
      await expect(chart.locator('canvas').first()).toBeVisible();
      await expect(page.getByRole('table', { name: /observed against predicted/ }).locator('tbody tr').nth(2)).toContainText('not logged');
      await chart.evaluate((el) => el.scrollIntoView());
      await page.screenshot({ path: shot(`path-chart-${size.width}`) });
      const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
      expect(violations.map((v) => `${v.id}: ${v.nodes.map((x) => x.target.join(' ')).join('; ')}`)).toEqual([]);
    });
  });
}
