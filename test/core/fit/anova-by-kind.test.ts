import { describe, expect, it } from 'vitest';
import MLR from 'ml-regression-multivariate-linear';
import jStat from 'jstat';
import { analyze } from '../../../src/core/fit/analyze.ts';
import { anovaByKind, termKind } from '../../../src/core/fit/anova-by-kind.ts';
import { parseTerms } from '../../../src/core/model/formula.ts';
import { squareTerm } from '../../../src/core/model/term.ts';
import type { ResponseData } from '../../../src/core/study/response-data.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

/** Residual sum of squares of a least-squares fit by ml-regression-multivariate-linear 2.0.4 (the reference library). */
function rss(data: ResponseData, columns: (x: readonly number[]) => number[]): number {
  const X = data.coded.map((r) => columns(r));
  const m = new MLR(X, data.y.map((v) => [v]), { intercept: true });
  return X.reduce((s, row, i) => s + (data.y[i] - m.predict(row)[0]) ** 2, 0);
}

describe('anovaByKind: Montgomery, Design and Analysis of Experiments, 8th ed., Example 11.2', () => {
  const data = fixtureData('montgomery-8e-ex11-2-ccd-yield.csv', { factors: ['Time', 'Temperature'], response: 'Yield', levels: { Time: ['80', '90'], Temperature: ['170', '180'] } });
  const a = analyze(data, { terms: parseTerms('quadratic', data.factors) });
  const rows = anovaByKind(a.anova, a.terms)!;

  it('groups linear, two-factor and quadratic with the printed sequential sums of squares', () => {
    expect(rows.map((r) => [r.kind, r.df])).toEqual([['linear', 2], ['two-factor', 1], ['quadratic', 2]]);
    // Printed sequential model sums of squares (from memory): linear 10.04, 2FI 0.25, quadratic 17.95
    expect(rows[0].ss).toBeCloseTo(10.04, 2);
    expect(rows[1].ss).toBeCloseTo(0.25, 2);
    expect(rows[2].ss).toBeCloseTo(17.95, 2);
  });

  it('each group is the extra sum of squares of nested fits by the reference library, with its F test (jstat)', () => {
    const mean = data.y.reduce((s, v) => s + v, 0) / data.y.length;
    const sst = data.y.reduce((s, v) => s + (v - mean) ** 2, 0);
    const linear = rss(data, (x) => [x[0], x[1]]);
    const twoWay = rss(data, (x) => [x[0], x[1], x[0] * x[1]]);
    const full = rss(data, (x) => [x[0], x[1], x[0] * x[1], x[0] ** 2, x[1] ** 2]);
    expect(rows[0].ss).toBeCloseTo(sst - linear, 8);
    expect(rows[1].ss).toBeCloseTo(linear - twoWay, 8);
    expect(rows[2].ss).toBeCloseTo(twoWay - full, 8);
    const msRes = full / 7;
    expect(rows[2].f!).toBeCloseTo(rows[2].ss / 2 / msRes, 8);
    expect(rows[2].p!).toBeCloseTo(1 - jStat.centralF.cdf(rows[2].f!, 2, 7), 10);
  });

  it('an adjusted table, or kinds out of order, have no grouped reading (null)', () => {
    expect(anovaByKind({ ...a.anova, type: 'adjusted' }, a.terms)).toBeNull();
    const swapped = [a.terms[3], ...a.terms.slice(0, 3), a.terms[4]];
    expect(anovaByKind(a.anova, swapped)).toBeNull();
  });

  it('termKind: main effect, interaction, square', () => {
    expect(termKind(1)).toBe('linear');
    expect(termKind(3)).toBe('two-factor');
    expect(termKind(squareTerm(0))).toBe('quadratic');
  });

  it('degenerate: no terms give no rows; no residual df gives null F and p', () => {
    expect(anovaByKind(a.anova, [])).toEqual([]);
    const noRes = { ...a.anova, rows: a.anova.rows.map((r) => (r.source === 'Residual' ? { ...r, df: 0, ss: 0 } : r)) };
    expect(anovaByKind(noRes, a.terms)!.every((r) => r.f === null && r.p === null)).toBe(true);
  });
});
