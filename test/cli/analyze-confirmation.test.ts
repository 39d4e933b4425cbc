/**
 * The confirmation verdict in the analyze report, from a backup and from the CSV the app exports.
 * The study is the INVENTED demo backup with three INVENTED confirmation runs added as a block at
 * Oven temperature 200 °C, Line speed 3 m/min, Powder flow 40 g/min. The expected interval is
 * computed independently here, y-hat +- t(0.975, df) s sqrt(1/m + x0'(X'X)^-1 x0) (Montgomery,
 * Design and Analysis of Experiments, 8th ed., section 10.6, from memory), with the fit from
 * ml-regression-multivariate-linear and t and (X'X)^-1 from jstat over the runs the app fits
 * (test/helpers/reference-interval.ts).
 */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { csv } from '../../src/cli/commands/csv.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';
import { demoFileWithConfirmation, DEMO_BACKUP, DEMO_STUDY } from '../helpers/confirmation-backup.ts';
import { fixturePath } from '../helpers/fixtures.ts';
import { referenceInterval } from '../helpers/reference-interval.ts';

const original = DEMO_BACKUP;
const STUDY = DEMO_STUDY;

describe('analyze: the confirmation verdict', async () => {
  const { file: backupFile } = await demoFileWithConfirmation();
  const dir = mkdtempSync(join(tmpdir(), 'trialbook-'));

  it('keeps the confirmation runs out of the fit: the same fit as without them', async () => {
    const before = JSON.parse(await analyze.run([fixturePath('trialbook-demo-backup.json'), '--study', STUDY, '--response', 'Gloss', '--order', '1', '--json']));
    const after = JSON.parse(await analyze.run([backupFile, '--study', STUDY, '--response', 'Gloss', '--order', '1', '--json']));
    expect(after.n).toBe(before.n);
    after.terms.forEach((t: { coef: number }, i: number) => expect(t.coef).toBeCloseTo(before.terms[i].coef, 12));
    expect(after.warnings.join(' ')).toMatch(/3 path and confirmation runs kept out of the model/);
    expect(before.confirmations).toBeUndefined();
  });

  it('JSON: the mean of 3 runs and the interval for the mean of 3 new runs, checked against a reference regression', async () => {
    const out = JSON.parse(await analyze.run([backupFile, '--study', STUDY, '--response', 'Gloss', '--order', '1', '--json']));
    expect(out.confirmations).toHaveLength(1);
    const c = out.confirmations[0];
    expect(c.runs).toEqual([12, 13, 14]);
    expect(c.settings).toEqual({ 'Oven temperature': 200, 'Line speed': 3, 'Powder flow': 40 });
    expect(c.m).toBe(3);
    expect(c.mean).toBeCloseTo((93.1 + 92.4 + 94.0) / 3, 12);

    // Reference: the main-effects fit of the runs the app uses (columns A, B, C), by general-purpose libraries.
    const data = backupResponseData(original, STUDY, 'Gloss');
    const { fit, half } = referenceInterval(data.coded, data.y, [1, 0, 0], 3);
    expect(c.predicted).toBeCloseTo(fit, 8);
    expect(c.interval[0]).toBeCloseTo(fit - half, 8);
    expect(c.interval[1]).toBeCloseTo(fit + half, 8);
    expect(c.outcome).toBe(c.mean >= fit - half && c.mean <= fit + half ? 'confirmed' : 'not-confirmed');
    expect(c.statement).toMatch(/^(Confirmed|Not confirmed): the mean of the 3 confirmation runs/);
  });

  it('text: a section of its own with the verdict and the caution', async () => {
    const out = await analyze.run([backupFile, '--study', STUDY, '--response', 'Gloss', '--order', '1']);
    expect(out).toMatch(/Confirmation runs \(kept out of the fit, judged against it\)\n {2}- Confirmation runs 12 to 14 \(block 2\) at Oven temperature 200 °C, Line speed 3 m\/min, Powder flow 40 g\/min: (Confirmed|Not confirmed)/);
    expect(out).toMatch(/Caution\n {2}- A prediction is a statistical estimate/);
  });

  it('the CSV the app exports gives the same verdict', async () => {
    const csvFile = join(dir, 'export.csv');
    writeFileSync(csvFile, await csv.run([backupFile, '--study', STUDY]));
    const fromBackup = JSON.parse(await analyze.run([backupFile, '--study', STUDY, '--response', 'Gloss', '--order', '1', '--json']));
    const fromCsv = JSON.parse(await analyze.run([csvFile, '--response', 'Gloss', '--order', '1', '--json']));
    expect(fromCsv.n).toBe(fromBackup.n);
    expect(fromCsv.confirmations).toHaveLength(1);
    expect(fromCsv.confirmations[0].mean).toBeCloseTo(fromBackup.confirmations[0].mean, 10);
    expect(fromCsv.confirmations[0].interval[0]).toBeCloseTo(fromBackup.confirmations[0].interval[0], 8);
    expect(fromCsv.confirmations[0].outcome).toBe(fromBackup.confirmations[0].outcome);
  });

  it('a confirmation row whose value is not a number is refused with its row and column (degenerate input)', async () => {
    const csvFile = join(dir, 'bad.csv');
    const good = await csv.run([backupFile, '--study', STUDY]);
    const lines = good.split(/\r?\n/);
    const header = lines[0].split(',');
    const col = header.findIndex((h) => /^Gloss( \(GU\))?$/.test(h));
    const i = lines.findIndex((l) => l.split(',')[4] === 'confirmation');
    const cells = lines[i].split(',');
    cells[col] = 'ninety';
    lines[i] = cells.join(',');
    writeFileSync(csvFile, lines.join('\n'));
    await expect(analyze.run([csvFile, '--response', 'Gloss', '--order', '1'])).rejects.toThrow(/Gloss needs a number, got "ninety"/);
  });
});
