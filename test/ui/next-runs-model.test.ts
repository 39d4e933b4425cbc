/**
 * The Next screen's confirmation cards and the command line's confirmation verdict, on the same
 * study: the INVENTED demo backup with three INVENTED confirmation runs (test/helpers/
 * confirmation-backup.ts). Both come from core/predict/confirmation-sets.ts, so the card's
 * "place: verdict" must be the report's line word for word, with the same model and transform.
 * The interval is also computed here independently from the prediction interval for the mean of
 * m new runs, y-hat +- t(0.975, df) s sqrt(1/m + x0'(X'X)^-1 x0) (Montgomery, Design and Analysis
 * of Experiments, 8th ed., section 10.6, from memory), with the fit from
 * ml-regression-multivariate-linear and t and (X'X)^-1 from jstat (test/helpers/
 * reference-interval.ts), on the log scale for a log-transformed response.
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { backupResponseData } from '../../src/io/backup/select-study.ts';
import { shortNumber } from '../../src/core/text/number-text.ts';
import { importBackup } from '../../src/store/files.ts';
import { NextRunsModel } from '../../src/ui/models/next-runs-model.ts';
import { openStudyAnalysis } from '../../src/ui/models/study-analysis-model.ts';
import { CONFIRMATION_GLOSS, demoFileWithConfirmation, demoWithConfirmation, DEMO_BACKUP, DEMO_STUDY } from '../helpers/confirmation-backup.ts';
import { referenceInterval } from '../helpers/reference-interval.ts';
import { freshStore } from '../store/helpers.ts';

const studyId = (JSON.parse(DEMO_BACKUP) as { payload: { studies: { id: string }[] } }).payload.studies[0].id;

async function opened(text: string) {
  const store = await freshStore();
  await importBackup(store, text);
  const shared = openStudyAnalysis(store, studyId);
  await shared.load();
  shared.show(1); // Gloss
  const model = new NextRunsModel(store, shared);
  await model.refreshBlocks(studyId);
  return { shared, model };
}

function cliText(file: string, options: string[]): Promise<string> {
  return analyze.run([file, '--study', DEMO_STUDY, '--response', 'Gloss', ...options]);
}

/** The command line's line for the one confirmation set, from its text report. */
async function cliLine(file: string, options: string[]): Promise<string> {
  const out = await cliText(file, options);
  const lines = out.split('\n').filter((l) => l.startsWith('  - Confirmation run'));
  expect(lines).toHaveLength(1);
  return lines[0].slice(4);
}

/** Fit and half-width of the interval for the mean of m new runs at coded (1, 0, 0), from reference libraries (test/helpers/reference-interval.ts). */
function reference(y: readonly number[], columns: (x: readonly number[]) => number[], m: number) {
  return referenceInterval(backupResponseData(DEMO_BACKUP, DEMO_STUDY, 'Gloss').coded.map(columns), y, columns([1, 0, 0]), m);
}

describe('Next screen confirmation cards: the same verdict as the command line', async () => {
  const { file, text } = await demoFileWithConfirmation();

  it('main effects: the card reads as the report line, and its interval is the reference one', async () => {
    const { shared, model } = await opened(text);
    shared.chooseModel(1, 'main');
    const cards = model.confirmations.value;
    expect(cards).toHaveLength(1);
    const c = cards[0];
    expect(`${c.place}: ${c.verdict}`).toBe(await cliLine(file, ['--order', '1']));
    expect(c.note).toBe('invented');
    expect(c.progress).toBeNull();
    expect(model.confirmationScale.value).toBeNull();
    const { fit, half } = reference(backupResponseData(DEMO_BACKUP, DEMO_STUDY, 'Gloss').y, (x) => [...x], 3);
    const mean = CONFIRMATION_GLOSS.reduce((a, b) => a + b, 0) / 3;
    expect(c.verdict).toContain(`${shortNumber(mean)}, lies ${Math.abs(mean - fit) <= half ? 'inside' : 'outside'} the 95% interval for the mean of 3 new runs, ${shortNumber(fit - half)} to ${shortNumber(fit + half)} (predicted ${shortNumber(fit)})`);
    expect(c.outcome).toBe(Math.abs(mean - fit) <= half ? 'confirmed' : 'not-confirmed');
  });

  it('log transform with interactions: judged on the log scale, as the report is', async () => {
    const { shared, model } = await opened(text);
    shared.chooseTransform(1, 'log');
    const c = model.confirmations.value[0];
    expect(`${c.place}: ${c.verdict}`).toBe(await cliLine(file, ['--transform', 'log']));
    // Both say which scale the figures are on.
    expect(model.confirmationScale.value).toBe('The figures are on the scale the model is fitted on, ln(Gloss), not in Gloss itself.');
    expect(await cliText(file, ['--transform', 'log'])).toContain(`\n  ${model.confirmationScale.value}\n`);
    // Main effects and the three two-factor interactions, on ln(Gloss).
    const two = (x: readonly number[]) => [x[0], x[1], x[2], x[0] * x[1], x[0] * x[2], x[1] * x[2]];
    const { fit, half } = reference(backupResponseData(DEMO_BACKUP, DEMO_STUDY, 'Gloss').y.map(Math.log), two, 3);
    const mean = CONFIRMATION_GLOSS.map(Math.log).reduce((a, b) => a + b, 0) / 3;
    expect(c.verdict).toContain(`the mean of the 3 confirmation runs, ${shortNumber(mean)}, lies ${Math.abs(mean - fit) <= half ? 'inside' : 'outside'} the 95% interval for the mean of 3 new runs, ${shortNumber(fit - half)} to ${shortNumber(fit + half)}`);
  });

  it('runs planned but not all logged: the count on the card, the same verdict as the report', async () => {
    const noneLogged = await demoFileWithConfirmation(0);
    const noneFile = noneLogged.file;
    const { model: none } = await opened(noneLogged.text);
    const c0 = none.confirmations.value[0];
    expect(`${c0.place}: ${c0.verdict}`).toBe(await cliLine(noneFile, []));
    expect(c0.outcome).toBe('not-logged');
    expect(c0.progress).toBeNull();
    expect(c0.verdict).toBe('None logged yet with a value for this response; log them to see the verdict.');
    const { model: two } = await opened(await demoWithConfirmation(2));
    expect(two.confirmations.value[0].progress).toBe('2 of 3 confirmation runs logged with a value for this response.');
    expect(two.confirmations.value[0].verdict).toMatch(/^(Confirmed|Not confirmed): the mean of the 2 confirmation runs/);
  });

  it('a study with no confirmation runs has no card (degenerate input)', async () => {
    const { model } = await opened(DEMO_BACKUP);
    expect(model.confirmations.value).toEqual([]);
  });
});
