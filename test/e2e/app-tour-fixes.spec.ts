import { test, expect } from '@playwright/test';
import { demoStudy as study } from './demo-fixture.ts';

// What a walk through every screen at phone widths found, held in place: the planning form's low
// and high show a whole three-digit setting beside their sign buttons, the Next runs note reads as
// two sentences, and the printed analysis leaves a folded table off paper (not a heading over nothing).
for (const viewport of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test.describe(`at ${viewport.width}x${viewport.height}`, () => {
    test.use({ viewport });

    test('the planning form shows a whole three-digit low and high beside the sign buttons', async ({ page }) => {
      await page.goto('/#/new');
      await expect(page.getByRole('heading', { name: 'Plan a new study' })).toBeVisible();
      for (const [field, value] of [['Factor A low', '1250'], ['Factor A high', '1500']] as const) {
        const input = page.getByLabel(field);
        await input.fill(value);
        // Text wider than the field scrolls inside it: scrollWidth > clientWidth means digits are hidden.
        const [scroll, client] = await input.evaluate((el: HTMLInputElement) => [el.scrollWidth, el.clientWidth]);
        expect(scroll, `${field} hides part of "${value}"`).toBeLessThanOrEqual(client);
      }
      const sign = page.getByRole('button', { name: "Make Factor A's low negative" });
      const box = (await sign.boundingBox())!;
      expect(box.width).toBeGreaterThanOrEqual(48); // --target in tokens.css
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(viewport.width);
    });

    test('the Next runs note for a study with no runs logged ends one sentence before the next', async ({ page }) => {
      await page.goto('/#/new');
      await page.getByLabel('Title', { exact: true }).fill('Invented demo: empty trial');
      for (const [i, letter] of ['A', 'B'].entries()) {
        await page.getByLabel(`Factor ${letter} name`).fill(`Setting ${letter}`);
        await page.getByLabel(`Factor ${letter} low`).fill(String(10 * (i + 1)));
        await page.getByLabel(`Factor ${letter} high`).fill(String(10 * (i + 1) + 5));
      }
      await page.getByLabel('Response 1 name').fill('Peel strength');
      await page.getByRole('button', { name: 'Create study' }).click();
      await expect(page).toHaveURL(/#\/study\/[^/]+$/);
      const id = /#\/study\/([^/]+)$/.exec(page.url())![1];
      await page.goto(`/#/study/${id}/next`);
      const note = page.getByRole('alert').filter({ hasText: 'Log more runs' });
      await expect(note).toHaveText(/^Peel strength: 0 runs .*needed\. Log more runs, then come back here\.$/);
    });
  });
}

test('on paper the analysis leaves the folded residual tables off and keeps an opened one', async ({ page }) => {
  await page.goto(`/#/study/${study.id}/analysis`);
  const tables = page.locator('details.residual-numbers');
  await expect(tables.first()).toBeVisible();
  await tables.first().locator('summary').click();
  await page.emulateMedia({ media: 'print' });
  await expect(tables.first()).toBeVisible();
  const n = await tables.count();
  expect(n).toBeGreaterThan(1);
  for (let i = 1; i < n; i++) await expect(tables.nth(i)).toBeHidden();
});
