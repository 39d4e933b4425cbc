import { test, expect } from '@playwright/test';

// Offline start: after one visit, the app loads from the service worker with the network off,
// and its records (IndexedDB) are there; a path it never cached still fails (nothing is faked).
test('the app starts offline from its service worker after one visit', async ({ page, context }) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(/Trialbook/);
  await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
  // The first install does not take over an open page (clientsClaim is off): one reload does.
  await page.reload();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 10_000 });
  await expect(page.getByText('Invented demo: powder-coating cure trial')).toBeVisible();

  await context.setOffline(true);
  const response = await page.reload();
  expect(response?.fromServiceWorker()).toBe(true);
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(/Trialbook/);
  await expect(page.getByText('Invented demo: powder-coating cure trial')).toBeVisible();
  const uncached = await page.evaluate(() => fetch(`/not-in-the-app-${Date.now()}.txt`).then(() => 'answered', () => 'failed'));
  expect(uncached).toBe('failed');
  // No update is waiting, so no banner.
  await expect(page.locator('.update-banner')).toHaveCount(0);
  await context.setOffline(false);
});
