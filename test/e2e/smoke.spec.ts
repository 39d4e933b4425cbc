import { test, expect } from '@playwright/test';

// The built app loads at a 390x844 touch viewport and shows its title.
test('the app shell loads on a phone-sized screen', async ({ page }) => {
  await page.goto('/');
  await expect(page).toHaveTitle(/Trialbook/);
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(/Trialbook/);
  const width = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(width).toBeLessThanOrEqual(390); // nothing forces sideways scrolling
});
