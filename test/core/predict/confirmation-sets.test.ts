import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { confirmationRowsOf, confirmationSets, judgeConfirmationSets } from '../../../src/core/predict/confirmation-sets.ts';
import type { LoggedRun, StudyPlan } from '../../../src/core/study/study.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

// Montgomery, Design and Analysis of Experiments, 8th ed., section 6.8: 2^2 with 5 center runs,
// first-order model y-hat = 40.44 + 0.775 x1 + 0.325 x2; residual SS 0.0025 + 0.0027 + 0.1720 on
// 6 df from its ANOVA table. The confirmation readings are INVENTED for the test; the interval is
// the hand computation y-hat +- t(0.975, 6) s sqrt(1/m + x0'(X'X)^-1 x0) (section 10.6, from memory),
// t from jstat.
const data = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
const model = analyze(data, { terms: [1, 2] }).model;
const S = Math.sqrt((0.0025 + 0.0027 + 0.172) / 6);
const T = jStat.studentt.inv(0.975, 6);

function run(plannedRun: number, reading: number | null, excluded = false): LoggedRun {
  return { id: `r${plannedRun}`, studyId: 's', plannedRun, actual: [40, 160], readings: [reading === null ? [] : [reading]], excluded, ...(excluded ? { exclusionReason: 'invented' } : {}) } as unknown as LoggedRun;
}

const study = {
  title: 'Invented confirmation',
  purpose: 'INVENTED',
  factors: model.factors,
  responses: [{ name: 'Yield', goal: 'maximize', lowerBound: null }],
  design: {
    runs: [
      { run: 1, standardOrder: 1, replicate: 1, block: 1, originBlock: 1, kind: 'factorial', coded: [-1, -1] },
      { run: 10, standardOrder: null, replicate: 1, block: 2, originBlock: 2, kind: 'confirmation', coded: [1, 1] },
      { run: 11, standardOrder: null, replicate: 1, block: 2, originBlock: 2, kind: 'confirmation', coded: [1, 1] },
      { run: 12, standardOrder: null, replicate: 1, block: 2, originBlock: 2, kind: 'confirmation', coded: [1, 1] },
      { run: 13, standardOrder: null, replicate: 1, block: 3, originBlock: 3, kind: 'confirmation', coded: [0, 0] },
    ],
  },
} as unknown as StudyPlan;

describe('confirmation sets: gathered by block and setting, judged against the model', () => {
  const rows = confirmationRowsOf(study, [run(10, 41.2), run(11, 41.8), run(12, 41.6), run(13, 50, true)], 0);
  const sets = confirmationSets(rows);
  it('one set per block; an excluded run has no value', () => {
    expect(sets.map((s) => [s.block, s.runs, s.values])).toEqual([
      [2, [10, 11, 12], [41.2, 41.8, 41.6]],
      [3, [13], []],
    ]);
  });
  it('the interval is the hand computation for m = 3 at (1, 1), q = 1/9 + 1/4 + 1/4', () => {
    const [a, b] = judgeConfirmationSets(model, sets);
    const half = T * S * Math.sqrt(1 / 3 + 1 / 9 + 1 / 2);
    const fit = 364 / 9 + 0.775 + 0.325; // Montgomery 8th ed., section 6.8
    expect(a.comparison!.m).toBe(3);
    expect(a.comparison!.interval![0]).toBeCloseTo(fit - half, 3);
    expect(a.comparison!.interval![1]).toBeCloseTo(fit + half, 3);
    expect(a.comparison!.outcome).toBe('confirmed');
    expect(b).toMatchObject({ comparison: null, problem: null });
  });
  it('a value outside a transform\'s domain is a message, not a crash (degenerate input)', () => {
    const logModel = { ...model, transform: { token: 'log', lambda: 0, lowerBound: null } };
    const [a] = judgeConfirmationSets(logModel, [{ block: 2, runs: [10], coded: [1, 1], values: [-1] }]);
    expect(a.comparison).toBeNull();
    expect(a.problem).toMatch(/log transform needs every Yield above 0, got -1/);
  });
  it('no confirmation runs: no sets', () => {
    expect(confirmationSets([])).toEqual([]);
  });
});
