import { test, expect, type Page, type Locator } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { CAUTION } from '../../src/core/predict/caution.ts';
import { CAUTION_SHORT } from '../../src/core/text/caution-short.ts';
import { readBackupSync, writeBackup, type BackupPayload } from '../../src/io/backup/backup.ts';

// Edges a first tryout on phones stumbled on (390x844 and 360x740): a sign button where a
// keypad has no minus key, the quick card's sticky block kept small, and residual charts whose
// run names never overlap. Studies other than the demo are INVENTED from it for these checks.
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const backup = readBackupSync(fixtureText);
const demo = backup.payload.studies[0];
const shots = tmpdir();

/** Serves `payload` as the study the app adds on first start (in place of the demo). */
async function firstStudy(page: Page, payload: BackupPayload) {
  const text = await writeBackup(payload, { device: backup.device, exportedAt: backup.exportedAt, scope: 'all' });
  await page.route('**/demo-study.json', (route) => route.fulfill({ status: 200, contentType: 'application/json', body: text }));
}

/** INVENTED: the demo with its line speed (2 to 4 m/min) turned into a belt offset of -2 to 2 mm, and gloss given no lower bound. */
function offsetStudy(): BackupPayload {
  const study = {
    ...demo,
    factors: demo.factors.map((f, i) => (i === 1 ? { kind: 'numeric' as const, name: 'Belt offset', letter: 'B', low: -2, high: 2, unit: 'mm' } : f)),
    responses: demo.responses.map((r) => (r.name === 'Gloss' ? { ...r, lowerBound: null } : r)),
  };
  const revisions = backup.payload.revisions.map((r) => ({ ...r, actual: r.actual.map((a, i) => (i === 1 ? ((a as number) - 3) * 2 : a)) }));
  return { studies: [study], revisions };
}

/**
 * INVENTED: the demo's 2^3 replicated four times (32 runs), so that every fitted value is shared
 * by four runs and their names crowd; run 13 reads 2.5 µm high, so it stands out and is ringed.
 */
function crowdedStudy(): BackupPayload {
  const template = backup.payload.revisions.find((r) => r.rev === 1 && !r.excluded)!;
  const runs = [];
  const revisions = [];
  const real = (f: (typeof demo.factors)[number], c: number) => (f.kind === 'numeric' ? (f.low + f.high) / 2 + (c * (f.high - f.low)) / 2 : f.levels[c < 0 ? 0 : 1]);
  for (let rep = 1; rep <= 4; rep++) {
    for (let s = 1; s <= 8; s++) {
      const n = (rep - 1) * 8 + s;
      // Yates' standard order: A changes fastest.
      const coded = [0, 1, 2].map((k) => (((s - 1) >> k) & 1 ? 1 : -1));
      runs.push({ run: n, standardOrder: s, replicate: rep, block: 1, originBlock: 1, kind: 'factorial' as const, coded });
      // Invented readings: a plane plus a small fixed wobble per run.
      const wobble = Math.sin(n * 12.9898) * 0.3 + (n === 13 ? 2.5 : 0);
      revisions.push({
        ...template,
        id: `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`,
        runId: `00000000-0000-4000-9000-${String(n).padStart(12, '0')}`,
        plannedRun: n,
        actual: demo.factors.map((f, k) => real(f, coded[k])),
        readings: [[Number((70 + 5 * coded[0] + 2 * coded[1] - coded[2] + wobble).toFixed(2))], [Number((80 + 3 * coded[0] - wobble).toFixed(2))]],
      });
    }
  }
  const design = { ...demo.design, runs, seed: null, summary: '32 runs (2^3 in four replicates), invented for a crowded residual chart.' };
  return { studies: [{ ...demo, title: 'Invented demo: crowded residuals', design }], revisions };
}

async function noAxeViolations(page: Page, where: string) {
  const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  expect(violations.map((v) => `${where}: ${v.id} ${v.help}: ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join('; ')}`)).toEqual([]);
}

/** The run names over one residual chart: none overlaps another, and every run is named on it or in the list under it. */
async function checkRunNames(chart: Locator, runs: number) {
  await expect(chart.locator('.run-names')).toBeVisible();
  const boxes = await chart.locator('.run-label').evaluateAll((els) => els.map((e) => e.getBoundingClientRect().toJSON() as { x: number; y: number; width: number; height: number }));
  for (let i = 0; i < boxes.length; i++) {
    for (let j = i + 1; j < boxes.length; j++) {
      const a = boxes[i];
      const b = boxes[j];
      const overlap = a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
      expect(overlap, `run names ${i} and ${j} overlap: ${JSON.stringify([a, b])}`).toBe(false);
    }
  }
  // A run that stands out is named first, so it is always on the chart, in its own style.
  const marked = await chart.locator('.residual-table tr.marked th').allTextContents();
  const markedNames = await chart.locator('.run-label.marked').allTextContents();
  expect(markedNames.sort()).toEqual(marked.map((t) => t.replace(' (stands out)', '')).sort());
  const unnamed = chart.getByTestId('unnamed-runs');
  const listed = (await unnamed.count()) === 0 ? 0 : (await unnamed.textContent())!.split(', ').length;
  expect(boxes.length + listed).toBe(runs);
  return { named: boxes.length, listed, marked: marked.length };
}

for (const size of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    test('a negative setting and reading entered with the sign button are saved and shown', async ({ page }) => {
      await firstStudy(page, offsetStudy());
      await page.goto(`/#/study/${demo.id}/run/1`);
      const offset = page.getByRole('textbox', { name: 'Belt offset' });
      await expect(offset).toBeVisible();
      // Only where a minus makes sense: the oven's 160 to 200 °C and a thickness (lower bound 0) get none.
      await expect(page.getByRole('button', { name: /^Make Oven temperature/ })).toHaveCount(0);
      await expect(page.getByRole('button', { name: /^Make Film thickness/ })).toHaveCount(0);
      // Run 1 was logged at -2 mm: the button offers the other sign.
      await expect(offset).toHaveValue('-2');
      await expect(page.getByRole('button', { name: 'Make Belt offset actual positive' })).toBeVisible();
      await offset.fill('1,5');
      const sign = page.getByRole('button', { name: 'Make Belt offset actual negative' });
      const box = await sign.boundingBox();
      expect(box!.height).toBeGreaterThanOrEqual(48); // --target in tokens.css
      expect(box!.width).toBeGreaterThanOrEqual(48);
      await sign.click();
      await expect(offset).toHaveValue('-1,5');
      await expect(page.getByRole('button', { name: 'Make Belt offset actual positive' })).toBeVisible();
      const gloss = page.getByRole('textbox', { name: 'Gloss reading' });
      await gloss.fill('0,4');
      await page.getByRole('button', { name: 'Make Gloss reading negative' }).click();
      await expect(gloss).toHaveValue('-0,4');
      await page.screenshot({ path: join(shots, `trialbook-sign-${size.width}.png`) });
      await page.getByRole('button', { name: 'Save run 1' }).click();
      await expect(page.getByRole('status')).toHaveText('Saved ✓ run 1');

      // Shown back after a reload, and on the run sheet.
      await page.reload();
      await expect(page.getByRole('textbox', { name: 'Belt offset' })).toHaveValue('-1.5');
      await expect(page.getByRole('textbox', { name: 'Gloss reading' })).toHaveValue('-0.4');
      await expect(page.getByRole('button', { name: 'Make Belt offset actual positive' })).toBeVisible();
      await page.goto(`/#/study/${demo.id}`);
      await expect(page.locator('.run-card[data-run="1"]')).toContainText(/Gloss −0\.4 GU/);

      // The quick card's setting field has one too; the coded value follows.
      await page.goto(`/#/study/${demo.id}/predict`);
      const field = page.getByRole('textbox', { name: 'Belt offset (B)' });
      await field.fill('1');
      await page.getByRole('button', { name: 'Make Belt offset negative' }).click();
      await expect(field).toHaveValue('-1');
      await expect(page.getByTestId('coded-1')).toHaveText('coded −0.5');
      await noAxeViolations(page, 'quick card');
      await page.goto(`/#/study/${demo.id}/run/2`);
      await expect(page.getByRole('textbox', { name: 'Belt offset' })).toBeVisible();
      await noAxeViolations(page, 'run form');
    });

    test('a lone minus is refused with a message and nothing is saved', async ({ page }) => {
      await firstStudy(page, offsetStudy());
      await page.goto(`/#/study/${demo.id}/run/1`);
      const history = page.getByRole('button', { name: /^History \(/ });
      const kept = await history.textContent();
      const offset = page.getByRole('textbox', { name: 'Belt offset' });
      await offset.fill('');
      await page.getByRole('button', { name: 'Make Belt offset actual negative' }).click();
      await expect(offset).toHaveValue('-');
      await page.getByRole('button', { name: 'Save run 1' }).click();
      await expect(page.locator('.field-error').first()).toContainText('needs a number');
      await expect(page.getByRole('status')).not.toHaveText(/Saved/);
      // No revision was added: the same count after a reload (the typing comes back as a draft).
      await page.reload();
      await expect(history).toHaveText(kept!);
      await expect(offset).toHaveValue('-');
    });

    test('the quick card keeps its sticky prediction and caution small, with the first setting in view below it', async ({ page }) => {
      await page.goto(`/#/study/${demo.id}/predict`);
      await expect(page.getByTestId('predicted-value')).toBeVisible();
      const sticky = page.locator('.sticky-top');
      // Scroll until the block sticks to the top of the screen.
      await sticky.evaluate((el) => window.scrollTo(0, el.getBoundingClientRect().top + window.scrollY));
      const s = (await sticky.boundingBox())!;
      expect(Math.abs(s.y)).toBeLessThan(1);
      console.log(`quick card sticky block at ${size.width}x${size.height}: ${s.height.toFixed(0)} px, ${((100 * s.height) / size.height).toFixed(1)}% of the height`);
      expect(s.height).toBeLessThanOrEqual(0.4 * size.height);
      // The first setting's number field is in full view below the block, without more scrolling.
      const first = (await page.getByRole('textbox', { name: 'Oven temperature (A)' }).boundingBox())!;
      expect(first.y).toBeGreaterThanOrEqual(s.y + s.height);
      expect(first.y + first.height).toBeLessThanOrEqual(size.height);
      await page.screenshot({ path: join(shots, `trialbook-quick-sticky-${size.width}.png`) });

      // The short caution stays in view; the full three statements are one large tap away.
      const caution = page.getByRole('region', { name: 'Caution' });
      await expect(caution).toContainText(CAUTION_SHORT);
      const more = caution.locator('summary');
      expect((await more.boundingBox())!.height).toBeGreaterThanOrEqual(48);
      await expect(caution.getByText(CAUTION[0])).toBeHidden();
      await more.click();
      for (const line of CAUTION) await expect(caution.getByText(line)).toBeVisible();
      // Opened, the full caution scrolls away with the page instead of covering the settings.
      await expect(sticky).toHaveCSS('position', 'static');

      // A field that takes the focus from far below is scrolled clear of the block (the measured height's scroll padding).
      await more.click();
      await page.evaluate(() => window.scrollTo(0, document.body.scrollHeight));
      await page.getByRole('textbox', { name: 'Oven temperature (A)' }).focus();
      const after = (await page.getByRole('textbox', { name: 'Oven temperature (A)' }).boundingBox())!;
      const s2 = (await sticky.boundingBox())!;
      expect(after.y).toBeGreaterThanOrEqual(s2.y + s2.height);

      // A short screen (a phone with its keyboard up) pins nothing: the field being typed in stays in view.
      await expect(sticky).toHaveCSS('position', 'sticky');
      await page.setViewportSize({ width: size.width, height: 430 });
      await expect(sticky).toHaveCSS('position', 'static');
      await page.setViewportSize(size);
      await expect(sticky).toHaveCSS('position', 'sticky');
    });

    test("the demo's residual charts name every run without two names overlapping", async ({ page }) => {
      await page.goto(`/#/study/${demo.id}/analysis`);
      const charts = page.locator('.residual-chart');
      await expect(charts).toHaveCount(2);
      const runs = await charts.first().locator('.residual-table tbody tr').count();
      for (let i = 0; i < 2; i++) {
        await charts.nth(i).scrollIntoViewIfNeeded();
        await checkRunNames(charts.nth(i), runs);
      }
      await charts.first().screenshot({ path: join(shots, `trialbook-residuals-demo-${size.width}.png`) });
      await noAxeViolations(page, 'analysis');
    });

    test('a crowded residual chart (32 runs on 8 fitted values) names or lists every run, no two names overlapping', async ({ page }) => {
      await firstStudy(page, crowdedStudy());
      await page.goto(`/#/study/${demo.id}/analysis`);
      const charts = page.locator('.residual-chart');
      await expect(charts).toHaveCount(2);
      await expect(charts.first().locator('.residual-table tbody tr')).toHaveCount(32);
      for (let i = 0; i < 2; i++) {
        await charts.nth(i).scrollIntoViewIfNeeded();
        const { named, listed, marked } = await checkRunNames(charts.nth(i), 32);
        expect(marked).toBe(1); // run 13
        console.log(`crowded residual chart ${i + 1} at ${size.width} px: ${named} runs named on the chart, ${listed} listed under it`);
      }
      await charts.first().screenshot({ path: join(shots, `trialbook-residuals-crowded-${size.width}.png`) });
      await charts.nth(1).screenshot({ path: join(shots, `trialbook-residuals-crowded-order-${size.width}.png`) });
    });
  });
}
