import { test, expect } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { analyze } from '../../src/core/fit/analyze.ts';
import { contourGrid } from '../../src/core/optimum/contour-grid.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';

// The contour chart on the quick card (demo study, invented data; the model with two-factor
// interactions, so the lines bend): its table holds the core's grid of fitted values, the other
// factor is held at the card's setting, the canvas is drawn, and d3-contour loads only when the
// chart is shown. Phone sizes 390x844 and 360x740.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const studyId = (JSON.parse(fixtureText) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;
const n4 = (x: number) => String(Number(x.toPrecision(4)));

for (const size of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    test('the table holds the core grid, the held factor follows the card, and the lines are drawn', async ({ page }) => {
      const asked: string[] = [];
      page.on('request', (r) => asked.push(r.url()));
      await page.goto('/#/');
      await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
      await page.waitForLoadState('networkidle');
      expect(asked.some((u) => /d3-contour/.test(u))).toBe(false); // not in the first screen's download

      await page.goto(`/#/study/${studyId}/predict`);
      await page.getByRole('group', { name: 'Response' }).getByRole('button', { name: 'Gloss' }).click();
      const model = analyze(backupResponseData(fixtureText, studyId, 'Gloss')).model;
      const table = page.getByTestId('contour-table');
      const check = async (held: number[]) => {
        const g = contourGrid(model, 0, 1, held);
        const n = g.xs.length;
        // Rows run from the top of the chart (highest Line speed) down; columns from the lowest Oven temperature.
        for (const [row, j] of [
          [0, n - 1],
          [2, 20],
          [4, 0],
        ] as const) {
          for (const [col, i] of [
            [0, 0],
            [2, 20],
            [4, n - 1],
          ] as const) {
            await expect(table.locator('tbody tr').nth(row).locator('td').nth(col)).toHaveText(n4(g.values[i + j * n]));
          }
        }
      };
      await check([0, 0, 0]);
      await expect(table.locator('thead th').nth(1)).toHaveText('160');
      await expect(table.locator('tbody th').first()).toHaveText('4');
      await expect(page.getByTestId('contour-canvas')).toHaveAttribute('data-state', 'ready');
      expect(asked.some((u) => /d3-contour/.test(u))).toBe(true);
      // Something was drawn in the line color (#1d5fa8) on the canvas.
      const blue = await page.getByTestId('contour-canvas').evaluate((c: HTMLCanvasElement) => {
        const d = c.getContext('2d')!.getImageData(0, 0, c.width, c.height).data;
        let k = 0;
        for (let i = 0; i < d.length; i += 4) if (d[i] === 0x1d && d[i + 1] === 0x5f && d[i + 2] === 0xa8) k++;
        return k;
      });
      expect(blue).toBeGreaterThan(100);

      // Powder flow held at 45 g/min (coded +0.5) on the card: the grid follows.
      await page.getByRole('textbox', { name: 'Powder flow (C)' }).fill('45');
      await expect(page.getByText('The other factors are held at the settings above: Powder flow 45 g/min.')).toBeVisible();
      await check([0, 0, 0.5]);
      // The card's sticky prediction block would cover the chart in an element picture; set it in place for the picture.
      await page.locator('.sticky-top').evaluate((el: HTMLElement) => el.style.setProperty('position', 'static'));
      await page.locator('.contour-card').screenshot({ path: `test-results/contour-${size.width}.png` });
    });

    test('no accessibility violations with the contour chart shown (axe-core, WCAG 2.1 AA rules)', async ({ page }) => {
      await page.goto(`/#/study/${studyId}/predict`);
      await expect(page.getByTestId('contour-canvas')).toHaveAttribute('data-state', 'ready');
      const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
      expect(violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
    });
  });
}
