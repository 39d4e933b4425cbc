import { test, expect, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';
import { readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { analyze } from '../../src/core/fit/analyze.ts';
import { termsUpToOrder } from '../../src/core/model/formula.ts';
import { defaultDesirabilityEntry, readDesirabilityEntry } from '../../src/core/optimum/desirability-entry.ts';
import { maximizeDesirability } from '../../src/core/optimum/desirability-search.ts';
import { CAUTION } from '../../src/core/predict/caution.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';

// The several-responses screen on the demo study (invented data: a 2^3 with center runs, Film
// thickness with a target of 70 µm and Gloss to maximize). The figures shown are checked two ways:
// against the core worked out here from the same backup (the screen's wiring), and against the
// definitions of Derringer and Suich (1980), Journal of Quality Technology 12, 214-219: each d
// from its shown prediction and limits, and D as the geometric mean of the shown d's.
const shot = (name: string) => join(tmpdir(), `trialbook-mr-${name}.png`);

/** The whole page as pictures one screen tall, at CSS pixels (for looking at), in the temporary folder. */
async function look(page: Page, name: string) {
  const { w, h } = await page.evaluate(() => ({ w: document.documentElement.clientWidth, h: document.documentElement.scrollHeight }));
  for (let y = 0, i = 0; y < h; y += 800, i++) await page.screenshot({ path: shot(`${name}-${i}`), clip: { x: 0, y, width: w, height: Math.min(800, h - y) }, fullPage: true, scale: 'css' });
}
const fixtureText = readFileSync(fileURLToPath(new URL('../fixtures/trialbook-demo-backup.json', import.meta.url)), 'utf8');
const study = (JSON.parse(fixtureText) as { payload: { studies: { id: string; responses: { name: string; goal: 'maximize' | 'minimize' | 'target'; target?: number; unit?: string }[] }[] } }).payload.studies[0];
const href = `/#/study/${study.id}/responses`;

/** The core's answer for the starting values (models with interactions, the Effects screen's default). */
function expected() {
  const data = study.responses.map((r) => backupResponseData(fixtureText, study.id, r.name));
  const models = data.map((d) => analyze(d, { terms: termsUpToOrder(3, 2) }).model);
  const entries = study.responses.map((r, i) => defaultDesirabilityEntry(r, data[i].y));
  const specs = entries.map((e, i) => readDesirabilityEntry(study.responses[i].name, e)!);
  return { entries, specs, best: maximizeDesirability(models, specs, data[0].coded) };
}

const parse = (s: string) => parseFloat(s.replace('−', '-'));

async function shownDs(page: Page): Promise<number[]> {
  const texts = await page.getByTestId('mr-responses').locator('.mr-d span').allInnerTexts();
  return texts.map((t) => parse(t.replace('d = ', '')));
}

async function axe(page: Page): Promise<string[]> {
  const { violations } = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(', ')}`);
}

for (const size of [
  { width: 390, height: 844 },
  { width: 360, height: 740 },
]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    test('reached from the quick card; starting values from the study; the best compromise with each prediction, interval and d', async ({ page }) => {
      const want = expected();
      await page.goto(`/#/study/${study.id}/predict`);
      await page.getByRole('link', { name: 'All 2 responses at once ›' }).first().click();
      await expect(page).toHaveURL(new RegExp(`#/study/${study.id}/responses$`));
      await expect(page.getByRole('heading', { level: 2 })).toHaveText('Several responses at once');

      // Starting values: the study's goals, values spanning the logged ones.
      const [thick, gloss] = want.entries;
      await expect(page.getByRole('group', { name: 'Goal for Film thickness' }).getByRole('button', { name: 'Target' })).toHaveAttribute('aria-pressed', 'true');
      await expect(page.getByRole('textbox', { name: 'Film thickness: Target (µm)' })).toHaveValue('70');
      await expect(page.getByRole('textbox', { name: 'Film thickness: Lowest (µm)' })).toHaveValue(thick.acceptable);
      await expect(page.getByRole('textbox', { name: 'Film thickness: Highest (µm)' })).toHaveValue(thick.highest);
      await expect(page.getByRole('group', { name: 'Goal for Gloss' }).getByRole('button', { name: 'Maximize' })).toHaveAttribute('aria-pressed', 'true');
      await expect(page.getByRole('textbox', { name: 'Gloss: Acceptable (GU)' })).toHaveValue(gloss.acceptable);
      await expect(page.getByRole('textbox', { name: 'Gloss: Ideal (GU)' })).toHaveValue(gloss.ideal);

      // The result agrees with the core, settings in the box, in real units and coded.
      const D = parse(await page.getByTestId('mr-D').innerText());
      expect(D).toBeCloseTo(want.best.D, 3);
      expect(D).toBeGreaterThan(0);
      const settings = page.getByTestId('mr-settings').locator('li');
      await expect(settings).toHaveCount(3);
      await expect(settings.nth(0)).toContainText('Oven temperature');
      await expect(settings.nth(0)).toContainText('°C');
      await expect(settings.nth(0)).toContainText('coded');
      for (let i = 0; i < 3; i++) {
        const c = parse((await settings.nth(i).locator('.mr-coded').innerText()).replace('coded ', '').replace('+', ''));
        expect(Math.abs(c)).toBeLessThanOrEqual(1);
        expect(c).toBeCloseTo(want.best.coded[i], 1);
      }
      // Each response: prediction, interval, d by the definitions from the shown prediction; D their geometric mean.
      const rows = page.getByTestId('mr-responses').locator('.mr-response');
      await expect(rows).toHaveCount(2);
      await expect(rows.nth(0)).toContainText('One new run (95%):');
      const fits = (await rows.locator('.mr-response-fit').allInnerTexts()).map(parse);
      const ds = await shownDs(page);
      const [t, g] = want.specs;
      const dThick = fits[0] <= t.target! ? (fits[0] - t.low) / (t.target! - t.low) : (t.high - fits[0]) / (t.high - t.target!);
      const dGloss = Math.min(1, Math.max(0, (fits[1] - g.low) / (g.high - g.low)));
      expect(ds[0]).toBeCloseTo(dThick, 2);
      expect(ds[1]).toBeCloseTo(dGloss, 2);
      expect(D).toBeCloseTo(Math.sqrt(ds[0] * ds[1]), 2);
      for (const line of CAUTION) await expect(page.getByTestId('mr-result').getByLabel('Caution')).toContainText(line);
      await look(page, `start-${size.width}`);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(size.width);
      // Glove-sized controls.
      const small = await page.evaluate(() => [...document.querySelectorAll('.several button, .several input, .several summary')].filter((el) => el.getBoundingClientRect().height < 48).map((el) => el.id || el.textContent));
      expect(small).toEqual([]);
      expect(await axe(page)).toEqual([]);
    });

    test('bad input says what to do and changes nothing; Ignore leaves a response out; limits no setting meets give D = 0 in words', async ({ page }) => {
      await page.goto(href);
      const Dtext = page.getByTestId('mr-D');
      await expect(Dtext).toBeVisible();
      const before = await Dtext.innerText();
      const ideal = page.getByRole('textbox', { name: 'Gloss: Ideal (GU)' });

      await ideal.fill('9o');
      await expect(page.getByRole('alert')).toContainText('Gloss: the ideal value needs a number (digits, with a point or a comma for decimals), got "9o"');
      await expect(page.getByRole('alert')).toContainText('The best setting shown still uses the values from before this change.');
      await expect(ideal).toHaveAttribute('aria-invalid', 'true');
      await expect(Dtext).toHaveText(before);
      await look(page, `bad-${size.width}`);
      await ideal.fill('10');
      await expect(page.getByRole('alert')).toContainText('to maximize, the ideal value must be above the acceptable one');
      await expect(Dtext).toHaveText(before);

      // Gloss left out: D is Film thickness's d alone, and Gloss is still predicted there.
      await page.getByRole('group', { name: 'Goal for Gloss' }).getByRole('button', { name: 'Ignore' }).click();
      await expect(page.getByRole('alert')).toHaveCount(0);
      await expect(page.getByTestId('mr-responses').locator('.mr-response')).toHaveCount(2);
      await expect(page.getByTestId('mr-responses')).toContainText('Gloss (ignored)');
      const ds = await shownDs(page);
      expect(ds).toHaveLength(1);
      expect(parse(await Dtext.innerText())).toBeCloseTo(ds[0], 3);
      // Back to Maximize: what was typed for it comes back (the ideal of 10, still refused).
      await page.getByRole('group', { name: 'Goal for Gloss' }).getByRole('button', { name: 'Maximize' }).click();
      await expect(ideal).toHaveValue('10');
      await page.getByRole('button', { name: 'Back to the starting values' }).click();
      await expect(Dtext).toHaveText(before);

      // Limits above anything the model predicts in the box: D = 0, and the words name Gloss.
      await page.getByRole('textbox', { name: 'Gloss: Ideal (GU)' }).fill('300');
      await page.getByRole('textbox', { name: 'Gloss: Acceptable (GU)' }).fill('200');
      await expect(Dtext).toHaveText('0');
      await expect(page.getByTestId('mr-none')).toContainText('No setting inside the tested box brings every response within its acceptable values (overall desirability 0).');
      await expect(page.getByTestId('mr-none')).toContainText('Gloss is predicted at');
      await expect(page.getByTestId('mr-none')).toContainText('below its acceptable 200 GU');
      await expect(page.getByRole('heading', { name: 'Nearest setting found' })).toBeVisible();
      for (const line of CAUTION) await expect(page.getByTestId('mr-result').getByLabel('Caution')).toContainText(line);
      await look(page, `zero-${size.width}`);

      // Importance and shape, folded away: a shape of 0 is refused.
      const card = page.getByRole('group', { name: 'Gloss' });
      await card.getByText('Importance and shape').click();
      await page.getByRole('textbox', { name: 'Gloss: Shape', exact: true }).fill('0');
      await expect(page.getByRole('alert')).toContainText('Gloss: the shape must be a number above 0, got 0. 1 is the usual choice.');
      await expect(Dtext).toHaveText('0');
      await look(page, `shape-${size.width}`);
      expect(await axe(page)).toEqual([]);
    });
  });
}
