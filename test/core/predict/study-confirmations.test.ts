import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import MLR from 'ml-regression-multivariate-linear';
import { studyConfirmations } from '../../../src/core/predict/study-confirmations.ts';
import { readBackupSync } from '../../../src/io/backup/backup.ts';
import { backupResponseData, selectStudy, studyRuns } from '../../../src/io/backup/select-study.ts';
import { CONFIRMATION_GLOSS, DEMO_STUDY, demoBackupText, demoWithConfirmation } from '../../helpers/confirmation-backup.ts';

/**
 * The 95% interval for the mean of m new runs, y-hat +- t(0.975, df) s sqrt(1/m + x0'(X'X)^-1 x0)
 * (Montgomery, Design and Analysis of Experiments, 8th ed., section 10.6, from memory), computed
 * here with ml-regression-multivariate-linear (the fit) and jstat (t and the inverse), over the
 * columns A, B, C, AB, AC, BC of the default model.
 */
function referenceInterval(coded: number[][], y: number[], x0: number[], m: number) {
  const cols = (x: readonly number[]) => [x[0], x[1], x[2], x[0] * x[1], x[0] * x[2], x[1] * x[2]];
  const X = coded.map(cols);
  const reg = new MLR(X, y.map((v) => [v]));
  const fit = reg.predict(cols(x0))[0];
  const df = X.length - 7;
  const s = Math.sqrt(y.reduce((a, v, i) => a + (v - reg.predict(X[i])[0]) ** 2, 0) / df);
  const A = X.map((r) => [1, ...r]);
  const xtx = A[0].map((_, i) => A[0].map((__, j) => A.reduce((acc, r) => acc + r[i] * r[j], 0)));
  const inv = jStat.inv(xtx) as number[][];
  const v = [1, ...cols(x0)];
  const q = v.reduce((acc, vi, i) => acc + vi * v.reduce((a2, vj, j) => a2 + inv[i][j] * vj, 0), 0);
  const half = jStat.studentt.inv(0.975, df) * s * Math.sqrt(1 / m + q);
  return { fit, lo: fit - half, hi: fit + half };
}

describe('studyConfirmations: every response with confirmation runs, judged against the default model', async () => {
  const backup = readBackupSync(await demoWithConfirmation());
  const study = selectStudy(backup, DEMO_STUDY);
  const results = studyConfirmations(study, studyRuns(backup, study.id));

  it('one entry per response, the Gloss set as a reference regression library computes it', () => {
    expect(results.map((r) => r.response)).toEqual(study.responses.map((r) => r.name));
    const gloss = results.find((r) => r.response === 'Gloss')!;
    expect(gloss.model).toBe('two-way');
    expect(gloss.judged).toHaveLength(1);
    const c = gloss.judged[0].comparison!;
    expect(c.m).toBe(3);
    expect(c.mean).toBeCloseTo(CONFIRMATION_GLOSS.reduce((a, b) => a + b) / 3, 12);
    // The runs the model is fitted to: the backup without the confirmation runs.
    const data = backupResponseData(demoBackupText(), DEMO_STUDY, 'Gloss');
    const ref = referenceInterval(data.coded.map((r) => [...r]), [...data.y], [1, 0, 0], 3);
    expect(c.fit).toBeCloseTo(ref.fit, 8);
    expect(c.interval![0]).toBeCloseTo(ref.lo, 8);
    expect(c.interval![1]).toBeCloseTo(ref.hi, 8);
  });

  it('degenerate input: a study without confirmation runs gives none', () => {
    const plain = readBackupSync(demoBackupText());
    const s = selectStudy(plain, DEMO_STUDY);
    expect(studyConfirmations(s, studyRuns(plain, s.id))).toEqual([]);
  });

  it('a response whose runs cannot be analyzed carries the reason, and its sets no verdict', () => {
    // Every logged Gloss value made equal: a constant response cannot be analyzed (validate-response.ts).
    const runs = studyRuns(backup, study.id).map((r) => ({ ...r, readings: r.readings.map((x, j) => (j === 1 ? [90] : x)) }));
    const gloss = studyConfirmations(study, runs).find((r) => r.response === 'Gloss')!;
    expect(gloss.problem).toMatch(/\S/);
    expect(gloss.judged.every((j) => j.comparison === null && j.problem === gloss.problem)).toBe(true);
  });
});
