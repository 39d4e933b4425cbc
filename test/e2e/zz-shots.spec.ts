import { test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const study = JSON.parse(fixtureText).payload.studies[0];
const pages = (process.env.SHOTS ?? 'next').split(',');
for (const w of [360]) {
  test(`shots ${w}`, async ({ page }) => {
    await page.setViewportSize({ width: w, height: 740 });
    for (const p of pages) {
      await page.goto(`/#/study/${study.id}/${p === 'sheet' ? '' : p}`);
      await page.waitForTimeout(800);
      if (p === 'next') { await page.getByRole('textbox', { name: /^Step of/ }).fill('10'); await page.getByRole('textbox', { name: /^Target/ }).fill('72'); }
      const h = await page.evaluate(() => document.documentElement.scrollHeight);
      for (let y = 0, i = 0; y < h && i < 8; y += 700, i++) {
        await page.evaluate((yy) => window.scrollTo(0, yy), y);
        await page.waitForTimeout(100);
        await page.screenshot({ path: `test-results/shot-${p.replace(/\//g, '_')}-${w}-${i}.png`, scale: 'css' });
      }
    }
  });
}
