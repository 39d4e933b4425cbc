import fc from 'fast-check';
import MLR from 'ml-regression-multivariate-linear';
import { describe, expect, it } from 'vitest';
import { modelColumns, modelMatrix } from '../../../src/core/fit/columns.ts';
import { fitOnPlan } from '../../../src/core/fit/fit-on-plan.ts';
import { fitQr } from '../../../src/core/fit/fit-qr.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { halfFractionCorners } from '../../helpers/half-fraction.ts';

const terms = termsUpToOrder(4, 2); // A..D and the six two-factor interactions
const cols = modelColumns([], terms);
const corners = [...halfFractionCorners(), [0, 0, 0, -1], [0, 0, 0, 1], [0, 0, 0, 1]]; // with three center runs
const letters = (c: (typeof cols)[number]): number => (c.kind === 'term' ? c.term : 0);

describe('fitOnPlan', () => {
  it('a 2^(4-1) (D = ABC) with one setting at 0.8: the plan keeps 8 columns and aliases BC, BD, CD as Montgomery 8th ed. section 8.2 gives (AD = BC, AC = BD, AB = CD)', () => {
    const actual = corners.map((r, i) => (i === 1 ? [0.8, ...r.slice(1)] : r));
    const y = [5, 7, 4, 9, 6, 8, 3, 10, 6, 7, 6.5]; // invented
    const fit = fitOnPlan(cols, modelMatrix(cols, corners, null), modelMatrix(cols, actual, null), y);
    expect(fit.kept.length).toBe(8);
    const aliased = fit.aliased.map((a) => [letters(cols[a.column]), a.combination.map((w) => [letters(cols[w.column]), Math.round(w.weight)])]);
    expect(aliased).toEqual([
      [0b0110, [[0b1001, 1]]], // BC = AD
      [0b1010, [[0b0101, 1]]], // BD = AC
      [0b1100, [[0b0011, 1]]], // CD = AB
    ]);
    // the actual settings alone would separate one more column (the off-target run breaks a chain)
    expect(fitQr(cols, modelMatrix(cols, actual, null), y).kept.length).toBe(9);
    // estimates: least squares on the actual settings over the kept columns, as a reference library computes them
    const keptCols = Array.from(fit.kept, (j) => cols[j]);
    const x = actual.map((r) => keptCols.slice(1).map((c) => (c.kind === 'term' ? termProduct(c.term, r) : 1)));
    const ref = new MLR(x, y.map((v) => [v]), { intercept: true });
    const refCoef = [ref.weights[keptCols.length - 1][0], ...ref.weights.slice(0, keptCols.length - 1).map((w) => w[0])];
    refCoef.forEach((b, j) => expect(fit.coef[j]).toBeCloseTo(b, 9)); // ml-regression-multivariate-linear
  });
  it('property: a perturbation of a regular fraction by less than 0.1 coded never separates an alias chain (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -0.099, max: 0.099, noNaN: true }), { minLength: 33, maxLength: 33 }), fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: 11, maxLength: 11 }), (d, y) => {
        const actual = corners.map((r, i) => [r[0] + d[3 * i], r[1] + d[3 * i + 1], r[2] + d[3 * i + 2], r[3]]);
        const plan = fitQr(cols, modelMatrix(cols, corners, null), y, true);
        const fit = fitOnPlan(cols, modelMatrix(cols, corners, null), modelMatrix(cols, actual, null), y);
        expect(Array.from(fit.kept)).toEqual(Array.from(plan.kept));
        expect(fit.aliased.map((a) => a.column)).toEqual(plan.aliased.map((a) => a.column));
      }),
      { numRuns: 200 },
    );
  });
  it('degenerate input: actual equal to nominal gives the plain QR fit', () => {
    const y = [1, 2, 3, 4, 5, 6, 7, 9, 5, 4, 6]; // invented
    const x = modelMatrix(cols, corners, null);
    const a = fitOnPlan(cols, x, x, y);
    const b = fitQr(cols, x, y);
    expect(Array.from(a.coef)).toEqual(Array.from(b.coef));
    expect(a.rss).toBeCloseTo(b.rss, 12);
  });
});

function termProduct(t: number, r: readonly number[]): number {
  let p = 1;
  for (let f = 0; f < r.length; f++) if (t & (1 << f)) p *= r[f];
  return p;
}

describe('fitOnPlan given the actual settings', () => {
  it('instead of their matrix (the fit kept by its settings): the same fit to the last bit, found again or not', () => {
    // The 2^(4-1) (D = ABC, Montgomery 8th ed. section 8.2) with three center runs, two settings
    // off target and one lost run (floor data).
    const actual = corners.map((r, i) => (i === 1 ? [0.8, ...r.slice(1)] : i === 4 ? [r[0], 1.06, r[2], r[3]] : r)).filter((_, i) => i !== 6);
    const nominal = corners.filter((_, i) => i !== 6);
    const y = [5, 7, 4, 9, 6, 3, 10, 6, 7, 6.5]; // invented
    for (let round = 0; round < 2; round++) {
      for (const lean of [false, true]) {
        const ref = fitOnPlan(cols, modelMatrix(cols, nominal, null), modelMatrix(cols, actual, null), y, undefined, lean);
        const bySettings = fitOnPlan(cols, modelMatrix(cols, nominal, null), { coded: actual, blocks: null }, y, undefined, lean);
        expect(ref.kept.length).toBe(8);
        for (const key of ['kept', 'coef', 'covUnscaled', 'seqSS', 'fitted', 'residuals', 'leverage'] as const) {
          expect(bySettings[key].length).toBe(ref[key].length);
          for (let i = 0; i < ref[key].length; i++) expect(Object.is(bySettings[key][i], ref[key][i])).toBe(true);
        }
        expect(bySettings.aliased).toEqual(ref.aliased);
        expect(Array.from(bySettings.basis ?? [])).toEqual(Array.from(ref.basis ?? []));
      }
    }
  });
});
