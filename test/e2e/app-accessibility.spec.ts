import { test, expect } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';

// Every main screen of the demo study, checked by axe-core (WCAG 2.1 A and AA rules) at the phone size.
const screens = ['', '/analysis', '/predict', '/next', '/export', '/run/3'];

test('the main screens have no accessibility violations (axe-core, WCAG 2.1 AA rules)', async ({ page }) => {
  await page.goto('/');
  const open = page.getByRole('link', { name: /^Open Invented demo/ });
  await expect(open).toBeVisible();
  await open.click();
  await expect(page).toHaveURL(/#\/study\/[^/]+$/);
  const base = page.url();
  const results: string[] = [];
  for (const s of [...screens.map((x) => base + x), new URL('/#/', base).href, new URL('/#/new', base).href]) {
    await page.goto(s);
    await page.waitForLoadState('networkidle');
    await expect(page.getByRole('heading', { level: 1 })).toBeVisible();
    const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
    for (const v of violations) results.push(`${s}: ${v.id} (${v.impact}) ${v.help}: ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join('; ')}`);
  }
  expect(results).toEqual([]);
});

test('the check itself finds a known violation (an image without a text alternative)', async ({ page }) => {
  await page.goto('/');
  await page.setContent('<!doctype html><html lang="en"><title>t</title><main><img src="/icon.svg"></main></html>');
  const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a']).analyze();
  expect(violations.map((v) => v.id)).toContain('image-alt');
});
