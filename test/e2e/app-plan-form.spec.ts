import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// The planning form at both phone sizes: every message names a factor by its letter and name,
// a reversed low and high is said plainly and swapped with one tap, typed generators are checked
// as typed (a bad one creates nothing), and a hard-to-change factor changes seldom in the run
// order with its seed shown. Invented settings throughout (a demo, not a published example).

const shot = (name: string) => join(tmpdir(), `trialbook-${name}.png`);
const preview = (page: Page) => page.getByRole('region', { name: 'Preview of the plan' });

async function openForm(page: Page) {
  await page.goto('/');
  await page.getByRole('link', { name: 'Plan a new study' }).click();
  await expect(page.getByRole('heading', { name: 'Plan a new study' })).toBeVisible();
}

async function fillFactor(page: Page, letter: string, name: string, low: string, high: string) {
  await page.getByLabel(`Factor ${letter} name`).fill(name);
  await page.getByLabel(`Factor ${letter} low`).fill(low);
  await page.getByLabel(`Factor ${letter} high`).fill(high);
}

/** Five named numeric factors, a title and a response: ready for the 1/2 fraction. */
async function fiveFactors(page: Page, title: string) {
  await page.getByLabel('Title', { exact: true }).fill(title);
  const names = ['Oven', 'Speed', 'Feed', 'Gap', 'Dwell'];
  for (let i = 0; i < names.length; i++) {
    const letter = 'ABCDE'[i];
    if (i >= 2) await page.getByRole('button', { name: '+ Add a factor' }).click();
    await fillFactor(page, letter, names[i], '10', '20');
  }
  await page.getByLabel('Response 1 name').fill('Gloss');
}

/** The first factor's planned setting on each run card of the run sheet, in run order, once `runs` cards are shown. */
async function firstSettings(page: Page, runs: number): Promise<string[]> {
  await expect(page.locator('.run-card')).toHaveCount(runs);
  return page.locator('.run-card').evaluateAll((cards) => cards.map((c) => c.querySelector('.setting dd')?.textContent?.trim() ?? ''));
}

/** True when the element is on screen above the plan bar held at the foot (not covered by it). */
async function clearOfBar(page: Page, selector: string): Promise<boolean> {
  const el = (await page.locator(selector).boundingBox())!;
  const bar = (await page.locator('.plan-bar').boundingBox())!;
  return el.y >= 0 && el.y + el.height <= bar.y + 1;
}

const changes = (xs: readonly string[]) => xs.slice(1).filter((x, i) => x !== xs[i]).length;

for (const size of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    test('messages name factors by letter and name; a reversed low and high is swapped and the study keeps the swapped range', async ({ page }) => {
      await openForm(page);
      await page.getByLabel('Title', { exact: true }).fill('Swap trial');
      await fillFactor(page, 'A', 'Oven temperature', '180', '190');
      await page.getByLabel('Factor B low').fill('2');
      await page.getByLabel('Factor B high').fill('4');
      await page.getByLabel('Response 1 name').fill('Gloss');
      // No name yet: the message names the row by its letter, as its fields do.
      await expect(page.locator('[data-factor="B"] .field-error')).toHaveText('Factor B: type a name for this factor, such as Temperature.');
      await page.getByLabel('Factor B name').fill('Line speed');
      await expect(page.locator('[data-factor="B"] .field-error')).toHaveCount(0);

      // Equal settings: a plain message, no swap offered.
      await page.getByLabel('Factor A high').fill('180');
      await expect(page.locator('[data-factor="A"] .field-error')).toHaveText('Factor A (Oven temperature): the low and the high setting are both 180. Type two different settings, the smaller as the low.');
      await expect(page.getByRole('button', { name: 'Swap low and high' })).toHaveCount(0);

      // 200 above 160: said next to the fields, with the swap.
      await page.getByLabel('Factor A low').fill('200');
      await page.getByLabel('Factor A high').fill('160');
      const reversed = 'Factor A (Oven temperature): the low setting (200) is above the high setting (160). The low must be the smaller number: tap "Swap low and high", or type them again.';
      await expect(page.locator('[data-factor="A"] .field-error')).toHaveText(reversed);
      // Seen while typing: not under the plan bar.
      expect(await clearOfBar(page, '[data-factor="A"] .field-error')).toBe(true);
      await expect(preview(page)).toContainText(`Not ready yet: ${reversed}`);
      const swap = page.getByRole('button', { name: 'Swap low and high' });
      await swap.scrollIntoViewIfNeeded();
      const box = await swap.boundingBox();
      expect(box!.height).toBeGreaterThanOrEqual(48);
      expect(box!.width).toBeGreaterThanOrEqual(size.width * 0.7);
      await page.screenshot({ path: shot(`plan-form-reversed-${size.width}`) });

      // A categorical factor with two identical level names.
      await page.getByRole('group', { name: 'Factor B levels are' }).getByRole('button', { name: 'Named levels' }).click();
      await page.getByLabel('Factor B level 1').fill('matte');
      await page.getByLabel('Factor B level 2').fill('Matte');
      await expect(page.locator('[data-factor="B"] .field-error')).toHaveText('Factor B (Line speed): both levels are called "matte". Give the two levels different names, such as matte and gloss.');
      await page.getByLabel('Factor B level 2').fill('gloss');

      // Creating now is refused with the same words, and nothing is made.
      await page.getByRole('button', { name: 'Create study' }).click();
      await expect(page.locator('.problem')).toHaveText(reversed);
      await expect(page).toHaveURL(/#\/new$/);

      await swap.click();
      await expect(page.getByLabel('Factor A low')).toHaveValue('160');
      await expect(page.getByLabel('Factor A high')).toHaveValue('200');
      await expect(page.getByLabel('Factor A name')).toHaveValue('Oven temperature');
      await expect(page.locator('[data-factor="A"] .field-error')).toHaveCount(0);
      await expect(preview(page).locator('.plan-runs')).toHaveText('4 runs');
      await page.getByRole('button', { name: 'Create study' }).click();
      await expect(page).toHaveURL(/#\/study\/[^/]+$/);
      const settings = await firstSettings(page, 4);
      expect([...new Set(settings)].sort()).toEqual(['160', '200']);
    });

    test('typed generators: a bad one is refused beside the box and nothing is created; a good one shows its resolution and aliases', async ({ page }) => {
      await openForm(page);
      const title = `Generators trial ${size.width}`;
      await fiveFactors(page, title);
      await page.getByRole('button', { name: /^1\/2 · 16 runs · resolution V$/ }).click();
      const box = page.getByLabel('Generators (optional)');
      await expect(page.locator('#ns-generators-hint')).toHaveText("Blank: the catalog's generators (E = ABCD) are used. Type your own to replace them.");

      await box.fill('E = ABXD');
      const bad = 'In "E = ABXD", "X" is not the letter of a factor above. Use the letters A, B, C, D, E (a minus sign may come before the product).';
      await expect(page.locator('#ns-generators-error')).toHaveText(bad);
      await expect(box).toHaveAttribute('aria-invalid', 'true');
      expect(await clearOfBar(page, '#ns-generators-error')).toBe(true);
      await expect(preview(page)).toContainText(`Not ready yet: ${bad}`);
      await page.screenshot({ path: shot(`plan-form-generators-bad-${size.width}`) });
      await page.getByRole('button', { name: 'Create study' }).click();
      await expect(page.locator('.problem')).toHaveText(bad);
      await expect(page).toHaveURL(/#\/new$/);

      // E = ABC: a resolution IV half fraction (I = ABCE), its aliases listed before creating.
      await box.fill('e = abc');
      await expect(page.locator('#ns-generators-error')).toHaveCount(0);
      await expect(preview(page).locator('.plan-resolution')).toHaveText('IV');
      await expect(preview(page).locator('.plan-relation')).toHaveText('I = ABCE');
      await expect(preview(page).locator('.plan-aliases')).toContainText('AB = CE');
      await expect(preview(page).locator('.plan-summary')).toContainText('resolution IV');
      await preview(page).scrollIntoViewIfNeeded();
      await page.screenshot({ path: shot(`plan-form-generators-good-${size.width}`) });
      await page.getByRole('button', { name: 'Create study' }).click();
      await expect(page).toHaveURL(/#\/study\/[^/]+$/);
      await expect(page.locator('.run-card')).toHaveCount(16);
      // One study of that title in the list: the refused attempt created nothing.
      await page.goto('/');
      await expect(page.getByRole('link', { name: `Open ${title}` })).toBeVisible();
      await expect(page.locator('.card', { hasText: title })).toHaveCount(1);
    });

    test('a hard-to-change factor changes seldom in the run order, with the cost said and the seed shown', async ({ page }) => {
      await openForm(page);
      await fiveFactors(page, `Hard to change ${size.width}`);
      await page.getByRole('button', { name: /^1\/2 · 16 runs · resolution V$/ }).click();
      await page.getByLabel('Seed of the run order').fill('4242');
      await page.getByRole('group', { name: 'Hard-to-change factor' }).getByRole('button', { name: 'A · Oven' }).click();
      const cost = page.locator('.hard-factor-cost');
      await expect(cost).toContainText('Factor A (Oven) changes 1 time in this run order (');
      await expect(cost).toContainText('seed 4242 is recorded with the plan');
      await expect(cost).toContainText('the runs are not fully randomized');
      const unsorted = Number(/\((\d+) times in the fully randomized order/.exec((await cost.textContent()) ?? '')?.[1]);
      expect(unsorted).toBeGreaterThan(1);
      await expect(preview(page)).toContainText('Randomized, seed 4242');
      await expect(preview(page).locator('.plan-notes')).toContainText('split-plot');
      await cost.scrollIntoViewIfNeeded();
      await page.screenshot({ path: shot(`plan-form-hard-${size.width}`) });
      await page.getByRole('button', { name: 'Create study' }).click();
      await expect(page).toHaveURL(/#\/study\/[^/]+$/);
      const settings = await firstSettings(page, 16);
      expect(changes(settings)).toBe(1);
      expect(changes(settings)).toBeLessThan(unsorted);
    });

    test('the planning form has no accessibility violations with its messages, swap and generators shown (axe-core, WCAG 2.1 AA rules)', async ({ page }) => {
      await openForm(page);
      await fiveFactors(page, 'Axe trial');
      await page.getByLabel('Factor A low').fill('30');
      await page.getByRole('button', { name: /^1\/2 · 16 runs · resolution V$/ }).click();
      await page.getByLabel('Generators (optional)').fill('E = AB');
      await page.getByRole('group', { name: 'Hard-to-change factor' }).getByRole('button', { name: 'B · Speed' }).click();
      await expect(page.getByRole('button', { name: 'Swap low and high' })).toBeVisible();
      const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
      expect(violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join('; ')}`)).toEqual([]);
      const width = await page.evaluate(() => document.documentElement.scrollWidth);
      expect(width).toBeLessThanOrEqual(size.width);
      await page.screenshot({ path: shot(`plan-form-full-${size.width}`), fullPage: true });
      // Removing the hard-to-change factor leaves none marked, and says so.
      await page.getByRole('button', { name: 'Remove factor B' }).click();
      const hard = page.getByRole('group', { name: 'Hard-to-change factor' });
      await expect(hard.getByRole('button', { name: 'None' })).toHaveAttribute('aria-pressed', 'true');
      await expect(page.locator('.hard-factor-cost')).toHaveText('None: every factor is randomized.');
    });
  });
}
