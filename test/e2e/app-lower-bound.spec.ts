import { test, expect } from '@playwright/test';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// A response that cannot be negative, declared on the planning form: the study keeps the bound,
// the Effects screen says what it means and gives the Box-Cox suggestion for the response minus
// it, and a log scale chosen there brings predictions back above it. The readings are invented
// (a grinding trial: roughness rises with feed and falls with wheel speed, its spread growing
// with its size, so Box-Cox points to log; checked with the command line's analyze on the same
// numbers: lambda about -0.16, 95% interval about -0.70 to 0.39).

const shot = (name: string) => join(tmpdir(), `trialbook-${name}.png`);
const phone = { viewport: { width: 390, height: 844 }, deviceScaleFactor: 3, isMobile: true, hasTouch: true };
test.use(phone);
for (const size of [
    { width: 390, height: 844 },
    { width: 360, height: 740 },
]) {
  test.describe(`at ${size.width}x${size.height}`, () => {
    test.use({ viewport: size });

    // Invented readings by planned setting (feed mm/rev, wheel speed m/s): two replicates each.
    const READINGS: Record<string, [string, string]> = {
      '0.1|20': ['0.42', '0.55'],
      '0.3|20': ['2.9', '3.9'],
      '0.1|30': ['0.21', '0.26'],
      '0.3|30': ['1.3', '1.9'],
    };

    test('a response marked "cannot be negative" is planned, logged and analyzed with its bound', async ({ page }) => {
      await page.goto('/');
      await page.getByRole('link', { name: 'Plan a new study' }).click();
      await page.getByLabel('Title', { exact: true }).fill('Grinding trial (invented)');
      await page.getByLabel('Factor A name').fill('Feed');
      await page.getByLabel('Factor A low').fill('0.1');
      await page.getByLabel('Factor A high').fill('0.3');
      await page.getByLabel('Factor A unit').fill('mm/rev');
      await page.getByLabel('Factor B name').fill('Wheel speed');
      await page.getByLabel('Factor B low').fill('20');
      await page.getByLabel('Factor B high').fill('30');
      await page.getByLabel('Factor B unit').fill('m/s');
      await page.getByLabel('Response 1 name').fill('Roughness');
      await page.getByLabel('Response 1 unit').fill('µm');
      await page.getByRole('group', { name: 'Response 1 goal' }).getByRole('button', { name: 'Minimize' }).click();
      const floor = page.getByRole('group', { name: 'Response 1 lowest value it can take' });
      await floor.getByRole('button', { name: 'Another lowest value' }).click();
      // An empty box under "another lowest value" is explained and nothing is created.
      await page.getByRole('button', { name: 'Create study' }).click();
      await expect(page.locator('.problem')).toHaveText('Roughness: type the lowest value it can take, or choose "No lowest value".');
      await expect(page).toHaveURL(/#\/new$/);
      await floor.getByRole('button', { name: 'Cannot be negative' }).click();
      await expect(floor.getByRole('button', { name: 'Cannot be negative' })).toHaveAttribute('aria-pressed', 'true');
      await expect(page.getByLabel('Response 1 lowest value', { exact: true })).toHaveCount(0);
      await page.getByRole('button', { name: 'One more: Replicates' }).click();
      await page.locator('.plan-card', { hasText: 'Response 1' }).screenshot({ path: shot(`lower-bound-form-${size.width}`) });
      await page.getByRole('button', { name: 'Create study' }).click();
      await expect(page).toHaveURL(/#\/study\/[^/]+$/);
      const studyId = (await page.evaluate(() => location.hash)).split('/')[2];
      await expect(page.locator('.run-card')).toHaveCount(8);

      // Log every run with the invented reading of its planned setting.
      const seen: Record<string, number> = {};
      const planned: string[] = [];
      for (let run = 1; run <= 8; run++) {
        const card = page.locator(`.run-card[data-run="${run}"] .settings dd`);
        await expect(card).toHaveCount(2);
        planned.push((await card.allTextContents()).map((t) => /^[\d.]+/.exec(t.trim())?.[0]).join('|'));
      }
      for (let run = 1; run <= 8; run++) {
        const key = planned[run - 1];
        expect(Object.keys(READINGS)).toContain(key);
        const value = READINGS[key][seen[key] ?? 0];
        seen[key] = (seen[key] ?? 0) + 1;
        await page.goto(`/#/study/${studyId}/run/${run}`);
        await page.getByRole('textbox', { name: 'Roughness reading' }).fill(value);
        await page.getByRole('button', { name: `Save run ${run}` }).click();
        await expect(page.getByRole('status')).toHaveText(`Saved ✓ run ${run}`);
      }

      await page.goto(`/#/study/${studyId}/analysis`);
      await expect(page.getByTestId('bound-note')).toHaveText(/^Roughness cannot be negative: the Log, Square root and Inverse scales keep every prediction above 0/);
      await expect(page.getByTestId('box-cox')).toHaveText('Box-Cox suggests: Log');
      await page.getByTestId('bound-note').scrollIntoViewIfNeeded();
      await page.screenshot({ path: shot(`lower-bound-effects-${size.width}`) });
      await page.getByRole('group', { name: 'Scale' }).getByRole('button', { name: 'Log' }).click();

      // The quick card follows the chosen scale: the prediction is brought back to micrometres, and says so.
      await page.getByRole('link', { name: 'Predict', exact: true }).click();
      await expect(page.getByText(/Fitted on the log scale of Roughness and brought back to its units/)).toBeVisible();
      await page.getByText(/Fitted on the log scale/).scrollIntoViewIfNeeded();
      await page.screenshot({ path: shot(`lower-bound-predict-${size.width}`) });
    });
  });
}
