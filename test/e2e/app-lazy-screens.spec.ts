import { test, expect } from '@playwright/test';

// A screen's code arrives on first use (src/ui/app/lazy-screen.tsx): while it comes, a status line
// says so; when it cannot come, the screen says why and offers to try again, and nothing else
// changes. The service worker is kept out here, so the page's own requests can be held back.
test.use({ serviceWorkers: 'block' });

test('a screen whose code is slow shows a status line, then the screen', async ({ page }) => {
  let release: () => void = () => {};
  const held = new Promise<void>((r) => (release = r));
  await page.route(/\/assets\/new-study-[^/]+\.js$/, async (route) => {
    await held;
    await route.continue();
  });
  await page.goto('/#/new');
  await expect(page.getByRole('status')).toHaveText('Opening the screen…');
  await expect(page.getByRole('heading', { level: 2 })).toHaveCount(0);
  release();
  await expect(page.getByRole('heading', { level: 2 })).toHaveText('Plan a new study');
  await expect(page.getByText('Opening the screen…')).toHaveCount(0);
});

// The refused fetch fails only after a while (as on a weak network), so that a screen opened
// again shows the status line while its new fetch runs, never the old failure's "Try again": a tap
// on that joined the running fetch, made before the network was back, and the screen failed again
// (the cause of this test's earlier flakiness, which depended on how fast the abort came).
test('a screen whose code cannot be fetched says so, and opens on "Try again" once it can', async ({ page }) => {
  let refuse = true;
  await page.route(/\/assets\/new-study-[^/]+\.js$/, async (route) => {
    if (!refuse) return route.continue();
    await new Promise((r) => setTimeout(r, 600));
    return route.abort('internetdisconnected');
  });
  await page.goto('/#/new');
  const alert = page.getByRole('alert').filter({ hasText: 'This screen could not be loaded' });
  await expect(alert).toBeVisible();
  await expect(alert).toContainText('the records on this device are not affected');
  // The rest of the app still works: the studies are there.
  await page.goto('/#/');
  await expect(page.getByText('Invented demo: powder-coating cure trial')).toBeVisible();
  await page.goto('/#/new');
  // While the new fetch runs: the status line, and no button that would join it.
  await expect(page.getByRole('status').filter({ hasText: 'Opening the screen…' })).toBeAttached();
  await expect(page.getByRole('button', { name: 'Try again' })).toHaveCount(0);
  await expect(alert).toBeVisible();
  refuse = false;
  await alert.getByRole('button', { name: 'Try again' }).click();
  await expect(page.getByRole('heading', { level: 2 })).toHaveText('Plan a new study');
  await expect(page.getByRole('alert').filter({ hasText: 'could not be loaded' })).toHaveCount(0);
});
