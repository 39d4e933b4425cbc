import { test, expect, type Page } from '@playwright/test';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** Screenshots go to the system's temporary folder, never into the repository. */
const shot = (name: string) => join(tmpdir(), `trialbook-${name}.png`);

// Planning a study on the phone: the form builds the plan live with the core's design builder,
// the preview shows its run count, resolution and defining relation, "Create study" stores it and
// opens its run sheet; a factor with equal levels is explained and nothing is created.

async function openForm(page: Page) {
  await page.goto('/');
  await page.getByRole('link', { name: 'Plan a new study' }).click();
  await expect(page).toHaveURL(/#\/new$/);
  await expect(page.getByRole('heading', { name: 'Plan a new study' })).toBeVisible();
}

async function fillFactor(page: Page, letter: string, name: string, low: string, high: string, unit = '') {
  await page.getByLabel(`Factor ${letter} name`).fill(name);
  await page.getByLabel(`Factor ${letter} low`).fill(low);
  await page.getByLabel(`Factor ${letter} high`).fill(high);
  if (unit) await page.getByLabel(`Factor ${letter} unit`).fill(unit);
}

const preview = (page: Page) => page.getByRole('region', { name: 'Preview of the plan' });

test('a half fraction of four factors with two center runs is planned, created and opens its run sheet', async ({ page }) => {
  await openForm(page);
  await page.getByLabel('Title', { exact: true }).fill('Bracket weld trial');
  await page.getByLabel('Purpose').fill('Find weld settings that give a strong seam.');
  await fillFactor(page, 'A', 'Current', '180', '220', 'A');
  await fillFactor(page, 'B', 'Wire speed', '6', '9', 'm/min');
  await page.getByRole('button', { name: '+ Add a factor' }).click();
  await fillFactor(page, 'C', 'Gas flow', '12', '18', 'L/min');
  await page.getByRole('button', { name: '+ Add a factor' }).click();
  await page.getByLabel('Factor D name').fill('Wire');
  await page.getByRole('group', { name: 'Factor D levels are' }).getByRole('button', { name: 'Named levels' }).click();
  await page.getByLabel('Factor D level 1').fill('solid');
  await page.getByLabel('Factor D level 2').fill('flux core');
  await page.getByLabel('Response 1 name').fill('Seam strength');
  await page.getByLabel('Response 1 unit').fill('kN');

  // Four factors: full factorial of 16 runs, or the catalog's 1/2 (8 runs, resolution IV).
  await expect(preview(page).locator('.plan-runs')).toHaveText('16 runs');
  await expect(preview(page).locator('.plan-resolution')).toContainText('Full factorial');
  await page.getByRole('button', { name: /^1\/2 · 8 runs · resolution IV$/ }).click();
  await page.getByRole('button', { name: 'One more: Center runs' }).click();
  await page.getByRole('button', { name: 'One more: Center runs' }).click();
  await expect(page.getByLabel('Center runs', { exact: true })).toHaveValue('2');
  await page.getByLabel('Seed of the run order').fill('4242');

  // A categorical factor has no middle: each center run is repeated at both wire types.
  await expect(preview(page).locator('.plan-runs')).toHaveText('12 runs');
  await expect(preview(page).locator('.plan-summary')).toContainText('8 factorial + 4 center');
  await expect(preview(page).locator('.plan-resolution')).toHaveText('IV');
  await expect(preview(page).locator('.plan-relation')).toHaveText('I = ABCD');
  await expect(preview(page)).toContainText('seed 4242');
  await expect(preview(page).locator('.plan-notes')).toContainText('repeated at every combination');

  // Made numeric, Wire gives 8 factorial + 2 center = 10 runs.
  await page.getByRole('group', { name: 'Factor D levels are' }).getByRole('button', { name: 'Numbers' }).click();
  await fillFactor(page, 'D', 'Wire diameter', '0.8', '1.2', 'mm');
  await expect(preview(page).locator('.plan-runs')).toHaveText('10 runs');
  await expect(preview(page).locator('.plan-summary')).toContainText('8 factorial + 2 center');
  await expect(preview(page).locator('.plan-resolution')).toHaveText('IV');

  // Glove-sized: every button and box at least 48 px tall, text at least 18 px.
  const small = await page.evaluate(() =>
    [...document.querySelectorAll('.new-study button, .new-study input, .new-study textarea')]
      .filter((el) => el.getBoundingClientRect().height < 48)
      .map((el) => el.getAttribute('aria-label') ?? el.id ?? el.textContent),
  );
  expect(small).toEqual([]);
  const fontPx = await page.evaluate(() => parseFloat(getComputedStyle(document.querySelector('.new-study .quiet')!).fontSize));
  expect(fontPx).toBeGreaterThanOrEqual(18);
  await page.screenshot({ path: shot('new-study-form'), fullPage: true });
  const width = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(width).toBeLessThanOrEqual(390);

  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page).toHaveURL(/#\/study\/[^/]+$/);
  await expect(page.locator('.run-card')).toHaveCount(10);
  await expect(page.locator('.run-card .run-kind', { hasText: 'center point' })).toHaveCount(2);
  await expect(page.locator('.run-card').first()).toContainText('Current');
  await expect(page.locator('.run-card').first()).toContainText('Wire diameter');
  await expect(page.locator('.progress')).toContainText('0 of 10');
  await page.screenshot({ path: shot('new-study-sheet') });

  // The study is in the list, and the same seed gave the order the preview promised.
  await page.goto('/');
  const card = page.locator('.card', { hasText: 'Bracket weld trial' });
  await expect(card).toContainText('0 of 10');
  await expect(card).toContainText('4 factors');
  await card.getByRole('link', { name: 'Open Bracket weld trial' }).click();
  await expect(page.locator('.run-card')).toHaveCount(10);
});

test('a factor with equal low and high shows the core message and creates nothing', async ({ page }) => {
  await openForm(page);
  const before = await page.evaluate(() => location.hash);
  await page.getByLabel('Title', { exact: true }).fill('Equal levels trial');
  await fillFactor(page, 'A', 'Oven temperature', '180', '180', '°C');
  await fillFactor(page, 'B', 'Line speed', '2', '4', 'm/min');
  await page.getByLabel('Response 1 name').fill('Gloss');
  const message = 'Factor A (Oven temperature): the low and the high setting are both 180. Type two different settings, the smaller as the low.';
  await expect(page.locator('[data-factor="A"] .field-error')).toHaveText(message);
  await expect(page.getByLabel('Factor A low')).toHaveAttribute('aria-invalid', 'true');
  await expect(preview(page)).toContainText(`Not ready yet: ${message}`);
  await expect(preview(page).locator('.plan-runs')).toHaveCount(0);

  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page.locator('.problem')).toHaveText(message);
  expect(await page.evaluate(() => location.hash)).toBe(before);
  await page.screenshot({ path: shot('new-study-error'), fullPage: true });

  // Fixing the level clears the message; the study was never made.
  await page.getByLabel('Factor A high').fill('200');
  await expect(page.locator('.problem')).toHaveCount(0);
  await expect(preview(page).locator('.plan-runs')).toHaveText('4 runs');
  await page.goto('/');
  await expect(page.locator('.card').first()).toBeVisible();
  await expect(page.locator('.card', { hasText: 'Equal levels trial' })).toHaveCount(0);
});

test('a response goal of target needs a target value before the study is created', async ({ page }) => {
  await openForm(page);
  await page.getByLabel('Title', { exact: true }).fill('Target trial');
  await fillFactor(page, 'A', 'Pressure', '2', '3', 'bar');
  await fillFactor(page, 'B', 'Time', '10', '20', 's');
  await page.getByLabel('Response 1 name').fill('Thickness');
  await page.getByRole('group', { name: 'Response 1 goal' }).getByRole('button', { name: 'Hit a target' }).click();
  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page.locator('.problem')).toHaveText('Thickness: the goal is a target, so it needs a target value');
  await expect(page).toHaveURL(/#\/new$/);
  await page.getByLabel('Response 1 target').fill('70');
  await page.getByRole('button', { name: 'Create study' }).click();
  await expect(page.locator('.run-card')).toHaveCount(4);
});
