import { test, expect } from '@playwright/test';
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { hrefTo, ROUTE_NAMES, ROUTES } from '../../src/ui/app/routes.ts';
import { READY } from './screen-ready.ts';

// The screens load their code on first use (src/ui/app/lazy-screen.tsx). After one visit with the
// network on, the service worker holds every chunk of the built app, so each screen, opened
// fresh with the network off, loads all its code from the worker; nothing is asked of the network.
const assets = fileURLToPath(new URL('../../dist/assets/', import.meta.url));
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const studyId = (JSON.parse(fixtureText) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;


test('after one visit, every screen opens offline with all its code from the service worker', async ({ page, context }) => {
  const files = readdirSync(assets).filter((f) => /\.(js|css)$/.test(f));
  expect(files.filter((f) => f.endsWith('.js')).length, 'the app is split into several chunks').toBeGreaterThan(5);

  await page.goto('/');
  await expect(page.getByRole('heading', { level: 2 })).toHaveText('Studies');
  await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
  // The first install does not take over an open page (clientsClaim is off): one reload does.
  await page.reload();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 10_000 });
  await expect(page.getByText('Invented demo: powder-coating cure trial')).toBeVisible();

  // Every script and stylesheet of the build is in the worker's cache (its precache list).
  const cached = await page.evaluate(async () => {
    const paths: string[] = [];
    for (const name of await caches.keys()) for (const req of await (await caches.open(name)).keys()) paths.push(new URL(req.url).pathname);
    return paths;
  });
  for (const f of files) expect(cached, f).toContain(`/assets/${f}`);

  await context.setOffline(true);
  const failed: string[] = [];
  const fromNetwork: string[] = [];
  page.on('requestfailed', (r) => {
    // Leaving a page cancels its idle preloads (net::ERR_ABORTED); a miss offline fails otherwise.
    if (r.failure()?.errorText !== 'net::ERR_ABORTED') failed.push(`${r.url()} (${r.failure()?.errorText})`);
  });
  page.on('response', (r) => {
    if (!r.fromServiceWorker() && r.url().startsWith('http')) fromNetwork.push(r.url());
  });
  const loadedScripts = new Set<string>();
  page.on('response', (r) => {
    const path = new URL(r.url()).pathname;
    if (path.startsWith('/assets/') && path.endsWith('.js')) loadedScripts.add(path);
  });

  for (const name of ROUTE_NAMES) {
    for (const pattern of ROUTES[name].paths) {
      const params: Record<string, string | number> = {};
      if (pattern.includes(':studyId')) params.studyId = studyId;
      if (pattern.includes(':plannedRun')) params.plannedRun = 2;
      // A fresh page load each time, so no screen's code is already in memory from the last one.
      await page.goto('about:blank');
      const response = await page.goto('/' + hrefTo(name, params as never));
      expect(response?.fromServiceWorker(), `${name} page from the worker`).toBe(true);
      const [selector, text] = READY[name];
      await expect(page.locator(selector).first(), name).toHaveText(text);
      await expect(page.getByText('This screen could not be loaded')).toHaveCount(0);
      if (name === 'analysis') {
        // The charts' library is its own chunk: it too comes from the worker.
        await expect(page.getByRole('img', { name: /Residual against run order/ }).locator('canvas').first()).toBeVisible();
      }
    }
  }
  expect(failed).toEqual([]);
  expect(fromNetwork).toEqual([]);
  // Each fresh page also preloads the other screens when idle; across all of them every chunk came,
  // but the demo study's, which loads only on a device with no study, and the import worker's,
  // which starts only when a file is imported, and the contour lines' (d3-contour), which load only
  // when the contour chart is first shown, and the confirmation verdicts' file, which loads only
  // when it is saved from the export screen (all four are in the cache, above).
  const screensCode = files.filter(
    (f) => f.endsWith('.js') && !f.startsWith('demo-study-') && !f.startsWith('import-worker-') && !f.startsWith('d3-contour-') && !f.startsWith('confirmations-file-'),
  );
  await expect.poll(() => screensCode.filter((f) => !loadedScripts.has(`/assets/${f}`))).toEqual([]);
  await context.setOffline(false);
});
