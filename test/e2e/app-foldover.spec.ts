import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// A foldover on the phone: an INVENTED five-factor study planned as the catalog's 1/4 fraction
// (8 runs, resolution III); the Next tab shows what the mirror image separates before anything is
// written (resolution III to IV: Montgomery, Design and Analysis of Experiments, 8th ed., section
// 8.6.1, from memory), one tap adds the 8 folded runs as block 2 with the phone offline (it is all
// on the device), and they appear on the run sheet. Phone sizes 390x844 and 360x740.

const shot = (name: string) => join(tmpdir(), `trialbook-${name}.png`);

async function planFraction(page: Page): Promise<string> {
  await page.goto('/#/new');
  await expect(page.getByRole('heading', { name: 'Plan a new study' })).toBeVisible();
  await page.getByLabel('Title', { exact: true }).fill('Invented demo: five-factor glue trial');
  for (const [i, letter] of ['A', 'B', 'C', 'D', 'E'].entries()) {
    if (i >= 2) await page.getByRole('button', { name: '+ Add a factor' }).click();
    await page.getByLabel(`Factor ${letter} name`).fill(`Setting ${letter}`);
    await page.getByLabel(`Factor ${letter} low`).fill(String(10 * (i + 1)));
    await page.getByLabel(`Factor ${letter} high`).fill(String(10 * (i + 1) + 5));
  }
  await page.getByLabel('Response 1 name').fill('Peel strength');
  await page.getByRole('button', { name: /^1\/4 · 8 runs · resolution III$/ }).click();
  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page).toHaveURL(/#\/study\/[^/]+$/);
  return /#\/study\/([^/]+)$/.exec(page.url())![1];
}

for (const size of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    test('the mirror image is previewed, added offline as block 2, and its runs are on the run sheet', async ({ page, context }) => {
      const id = await planFraction(page);
      await expect(page.locator('.run-card')).toHaveCount(8);
      await page.goto(`/#/study/${id}/next`);
      const part = page.getByTestId('foldover');
      await expect(part.getByRole('button', { name: 'Mirror image (every sign switched)' })).toHaveAttribute('aria-pressed', 'true');
      const preview = part.getByTestId('foldover-preview');
      await expect(preview).toContainText('8 new runs, as block 2');
      await expect(preview).toContainText('The runs planned so far are resolution III; with these 8 folded runs the study is resolution IV.');
      await expect(preview).toContainText('The combined design separates');
      await expect(preview).toContainText('16 runs (2 blocks), resolution IV (with its foldover)');
      await part.getByRole('heading', { name: 'Foldover' }).evaluate((h) => h.scrollIntoView());
      await page.screenshot({ path: shot(`foldover-preview-${size.width}`) });
      await part.getByRole('button', { name: 'Add these 8 runs to the run sheet' }).scrollIntoViewIfNeeded();
      await page.screenshot({ path: shot(`foldover-button-${size.width}`) });

      await context.setOffline(true);
      await part.getByRole('button', { name: 'Add these 8 runs to the run sheet' }).click();
      await expect(part.getByRole('status')).toContainText('Added runs 9 to 16 to the run sheet as block 2');
      // The plan is read again: a second mirror image would repeat the runs, and the screen says so.
      await expect(part.getByRole('alert')).toContainText('would repeat the same runs');
      await expect(part.getByRole('button', { name: /^Add these/ })).toHaveCount(0);
      await part.getByRole('status').scrollIntoViewIfNeeded();
      await page.screenshot({ path: shot(`foldover-added-${size.width}`) });

      await part.getByRole('link', { name: 'Open the run sheet' }).click();
      await expect(page.locator('.run-card')).toHaveCount(16);
      await expect(page.locator('.run-card[data-run="12"]')).toContainText('factorial point');
      await context.setOffline(false);
      await page.reload();
      await expect(page.locator('.run-card')).toHaveCount(16);
    });

    test('folding on one factor gives its own preview; a full factorial shows no foldover', async ({ page }) => {
      const id = await planFraction(page);
      await page.goto(`/#/study/${id}/next`);
      const part = page.getByTestId('foldover');
      await part.getByRole('button', { name: 'Switch A only (Setting A)' }).click();
      await expect(part.getByTestId('foldover-preview')).toContainText('the first fraction with the signs of A (Setting A) switched');
      await page.goto('/');
      // The invented demo study is a full factorial: nothing to fold.
      await page.getByRole('link', { name: /^Open Invented demo: powder-coating/ }).click();
      await page.getByRole('link', { name: 'Next' }).click();
      await expect(page.getByRole('heading', { name: 'Next runs' })).toBeVisible();
      await expect(page.getByTestId('foldover')).toHaveCount(0);
    });

    test('no accessibility violations on the foldover part (axe-core, WCAG 2.1 AA rules)', async ({ page }) => {
      const id = await planFraction(page);
      await page.goto(`/#/study/${id}/next`);
      await expect(page.getByTestId('foldover-preview')).toBeVisible();
      const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
      expect(violations.map((v) => `${v.id}: ${v.nodes.map((x) => x.target.join(' ')).join('; ')}`)).toEqual([]);
    });
  });
}
