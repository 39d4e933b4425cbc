import { test, expect } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { hrefTo, parseRoute, ROUTE_NAMES, ROUTES } from '../../src/ui/app/routes.ts';
import { READY } from './screen-ready.ts';

// Every screen of the route table opens at its address, and every link the screens draw parses
// back to a screen of the table and to the address it was drawn with.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const studyId = (JSON.parse(fixtureText) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;


test('every screen opens at its address, and its links parse back to screens of the table', async ({ page }) => {
  for (const name of ROUTE_NAMES) {
    for (const pattern of ROUTES[name].paths) {
      const params: Record<string, string | number> = {};
      if (pattern.includes(':studyId')) params.studyId = studyId;
      if (pattern.includes(':plannedRun')) params.plannedRun = 2;
      const address = hrefTo(name, params as never);
      expect(parseRoute(address)).toEqual({ name, params });
      await page.goto('/' + address);
      const [selector, text] = READY[name];
      await expect(page.locator(selector).first()).toHaveText(text);
      await expect(page.getByText('No such page')).toHaveCount(0);
      const links = await page.locator('a[href^="#"]').evaluateAll((as) => as.map((a) => a.getAttribute('href')!));
      expect(links.length).toBeGreaterThan(0);
      for (const link of links) {
        const route = parseRoute(link);
        expect(route.name, `link ${link} on ${address}`).not.toBe('missing');
        if (route.name !== 'missing') expect(hrefTo(route.name, route.params as never)).toBe(link);
      }
    }
  }
});

test('an address that names no screen says so and links back to the studies', async ({ page }) => {
  await page.goto('/#/study/x/nothing-here');
  await expect(page.getByRole('heading', { name: 'No such page' })).toBeVisible();
  await expect(page.getByText('The address "/study/x/nothing-here" is not a page of Trialbook.')).toBeVisible();
  await page.getByRole('link', { name: 'Go to the studies' }).click();
  await expect(page.locator('h2').first()).toHaveText('Studies');
});
