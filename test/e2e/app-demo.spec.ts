import { test, expect, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

// The app opens on the invented demo study: on first start with an empty store it merges the
// demo backup (public/demo-study.json) into the store, once.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const publicText = readFileSync(fileURLToPath(new URL('../../public/demo-study.json', import.meta.url)), 'utf8');
const demo = JSON.parse(fixtureText) as { payload: { studies: { id: string; title: string; design: { runs: unknown[] } }[] } };
const study = demo.payload.studies[0];

async function noSidewaysScroll(page: Page) {
  const width = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(width).toBeLessThanOrEqual(390);
}

test('the served demo file is the invented demo backup from the fixtures', () => {
  expect(publicText).toBe(fixtureText);
  expect(study.title).toMatch(/^Invented demo/);
});

test('the demo study appears on first load, marked as invented, and only once after reloads', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(/Trialbook/);
  const card = page.locator('.card', { hasText: study.title });
  await expect(card).toHaveCount(1);
  await expect(card).toContainText('Invented demo data: not a real trial');
  await expect(card).toContainText(`11 of ${study.design.runs.length} planned runs logged`);
  await noSidewaysScroll(page);
  await page.reload();
  await page.reload();
  await expect(page.locator('.card', { hasText: study.title })).toHaveCount(1);
});

test('the run sheet lists the planned runs in run order with planned settings in real units', async ({ page }) => {
  await page.goto('/');
  await page.getByRole('link', { name: `Open ${study.title}` }).click();
  await expect(page).toHaveURL(new RegExp(`#/study/${study.id}$`));
  const runs = page.locator('.run-card');
  await expect(runs).toHaveCount(study.design.runs.length);
  await expect(runs.locator('.run-no')).toHaveText(study.design.runs.map((_, i) => `Run ${i + 1}`));
  // Run 1 is planned at A low, B low, C high (the demo's randomized order): 160 °C, 2 m/min, 50 g/min.
  const first = runs.first();
  await expect(first.locator('.setting', { hasText: 'Oven temperature' })).toContainText('160 °C');
  await expect(first.locator('.setting', { hasText: 'Line speed' })).toContainText('2 m/min');
  await expect(first.locator('.setting', { hasText: 'Powder flow' })).toContainText('50 g/min');
  // Run 5 is a center point; run 9 was excluded in the demo with a reason.
  await expect(runs.nth(4)).toContainText('center point');
  await expect(runs.nth(4).locator('.setting', { hasText: 'Oven temperature' })).toContainText('180 °C');
  await expect(runs.nth(8)).toContainText('Excluded');
  await expect(runs.nth(8)).toContainText('conveyor stopped mid-run');
  await expect(page.locator('.demo-badge').first()).toBeVisible();
  await noSidewaysScroll(page);
});

test('every screen fits a 390 px phone without sideways scrolling, and unknown addresses say so', async ({ page }) => {
  for (const path of ['/#/', `/#/study/${study.id}`, `/#/study/${study.id}/run/1`, `/#/study/${study.id}/analysis`, `/#/study/${study.id}/predict`, '/#/export']) {
    await page.goto(path);
    await expect(page.locator('main h2, main .study-title').first()).toBeVisible();
    await noSidewaysScroll(page);
  }
  await page.goto('/#/nowhere');
  await expect(page.getByRole('heading', { name: 'No such page' })).toBeVisible();
  await page.goto('/#/study/not-a-study');
  await expect(page.getByRole('alert')).toContainText('There is no study with id "not-a-study"');
});

test('buttons and tabs are at least 48 px tall on every study screen', async ({ page }) => {
  for (const path of [`/#/study/${study.id}`, `/#/study/${study.id}/run/2`, `/#/study/${study.id}/analysis`, `/#/study/${study.id}/predict`, `/#/study/${study.id}/export`]) {
    await page.goto(path);
    await expect(page.locator('.tabs, .save-bar').first()).toBeVisible();
    const small = await page.evaluate(() =>
      [...document.querySelectorAll<HTMLElement>('button, a.btn, a.tab, input.num, input.text, .choice-btn')]
        .filter((el) => el.offsetParent !== null && el.getBoundingClientRect().height < 48)
        .map((el) => `${el.tagName} "${el.textContent?.trim() ?? ''}" ${el.getBoundingClientRect().height}px`),
    );
    expect(small, path).toEqual([]);
    const body = await page.evaluate(() => parseFloat(getComputedStyle(document.body).fontSize));
    expect(body).toBeGreaterThanOrEqual(18);
  }
});
