import { test, expect } from '@playwright/test';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

// The update path with two real builds and the real service worker: build 1 is served and
// opened, a run form gets typing, the server switches to build 2 and the page checks for an
// update. The offer appears, the typing stays, nothing reloads until the person accepts; after
// accepting, the typing is back (from its draft) and build 2 is running.
const repo = fileURLToPath(new URL('../..', import.meta.url));
const BUILDS = { first: 'update-test-1', second: 'update-test-2' } as const;

function build(version: string) {
  const out = `${repo}dist-test/${version}`;
  for (const [cmd, args] of [
    ['node_modules/.bin/vite', ['build', '--outDir', out, '--emptyOutDir', '--logLevel', 'warn']],
    ['node', ['sw/build.mjs', out]],
  ] as const) {
    const r = spawnSync(cmd, [...args], { cwd: repo, env: { ...process.env, TRIALBOOK_VERSION: version }, encoding: 'utf8' });
    if (r.status !== 0) throw new Error(`building ${version} failed: ${cmd} ${args.join(' ')}\n${r.stdout}\n${r.stderr}`);
  }
}

async function serve(baseURL: string, name: string) {
  const r = await fetch(`${baseURL}/__test/app-build`, { method: 'POST', body: name });
  if (!r.ok) throw new Error(await r.text());
}

test.describe('update path', () => {
  test.beforeAll(async () => {
    test.setTimeout(180_000);
    build(BUILDS.first);
    build(BUILDS.second);
  });
  test.afterAll(async ({ baseURL }) => serve(baseURL!, 'dist'));

  test('an update is offered while a run form holds typing, waits for the person, and keeps the typing', async ({ page, baseURL }) => {
    test.setTimeout(60_000);
    await serve(baseURL!, BUILDS.first);
    await page.goto('/');
    await expect(page.getByTestId('app-version')).toHaveText(BUILDS.first);
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
    await page.reload();
    await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 10_000 });

    // Type into a logged run's form (a change not saved as a record: kept as a draft).
    await page.getByRole('link', { name: 'Open Invented demo: powder-coating cure trial' }).click();
    await page.locator('.run-card[data-run="3"]').getByRole('link', { name: 'Review run 3' }).click();
    const notes = page.getByRole('textbox', { name: 'Notes' });
    await notes.fill('typed just before the update');
    await expect(page.getByText('Not saved yet (typing kept as a draft)')).toBeVisible();
    const formUrl = page.url();

    // From here on, any navigation of the page would be a reload.
    let navigations = 0;
    page.on('framenavigated', (f) => void (f === page.mainFrame() && navigations++));
    await page.evaluate(() => ((window as unknown as { stillHere: boolean }).stillHere = true));

    await serve(baseURL!, BUILDS.second);
    await page.evaluate(() => navigator.serviceWorker.getRegistration().then((r) => r!.update()));
    const banner = page.locator('.update-banner');
    await expect(banner).toContainText('A new version of Trialbook is ready', { timeout: 20_000 });
    await expect(banner).toContainText('kept as a draft and comes back after the update');
    const accept = banner.getByRole('button', { name: 'Use the new version' });
    await expect(accept).toBeVisible();

    // The new version waits: same page, same typing, old version still running.
    await page.waitForTimeout(1500);
    expect(navigations).toBe(0);
    expect(await page.evaluate(() => (window as unknown as { stillHere?: boolean }).stillHere)).toBe(true);
    await expect(notes).toHaveValue('typed just before the update');
    await expect(page.getByTestId('app-version')).toHaveText(BUILDS.first);
    const waiting = await page.evaluate(() => navigator.serviceWorker.getRegistration().then((r) => r!.waiting !== null));
    expect(waiting).toBe(true);

    await accept.click();
    await expect(page.getByTestId('app-version')).toHaveText(BUILDS.second, { timeout: 15_000 });
    expect(navigations).toBeGreaterThan(0);
    expect(await page.evaluate(() => (window as unknown as { stillHere?: boolean }).stillHere)).toBeUndefined();
    expect(page.url()).toBe(formUrl);
    await expect(page.getByRole('textbox', { name: 'Notes' })).toHaveValue('typed just before the update');
    await expect(page.getByText('Your earlier typing was kept and is back. It is not saved yet.')).toBeVisible();
    await expect(page.locator('.update-banner')).toHaveCount(0);
    // The page is controlled by the new worker, which serves build 2's files.
    const html = await page.evaluate(() => fetch('/').then((r) => r.text()));
    const script = html.match(/src="(\/assets\/[^"]+\.js)"/)![1];
    expect(await page.evaluate((s) => [...document.scripts].some((e) => e.src.endsWith(s)), script)).toBe(true);
  });
});
