import MLR from 'ml-regression-multivariate-linear';
import { describe, expect, it } from 'vitest';
import { modelColumns, modelMatrix } from '../../../src/core/fit/columns.ts';
import { yatesCells } from '../../../src/core/fit/fit-yates.ts';
import { residualSs, residualSsBasis, residualSsQr, residualSsYates } from '../../../src/core/fit/residual-ss.ts';
import { fitQr } from '../../../src/core/fit/fit-qr.ts';
import { householderQr } from '../../../src/core/linalg/householder-qr.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { termValue } from '../../../src/core/model/term.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

const yieldData = fixtureData('montgomery-8e-ex6-1-yield-2x2.csv', { factors: ['Concentration (%)', 'Catalyst (lb)'], response: 'Yield' });
const etch = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });

/** RSS of y on the intercept and `terms` by the reference library (ml-regression-multivariate-linear). */
function referenceRss(coded: readonly (readonly number[])[], terms: readonly number[], y: readonly number[]): number {
  const x = coded.map((row) => terms.map((t) => termValue(t, row)));
  const fit = new MLR(x, y.map((v) => [v]), { intercept: true });
  const pred = fit.predict(x) as number[][];
  return y.reduce((s, v, i) => s + (v - pred[i][0]) ** 2, 0);
}

describe('residualSsYates and residualSsQr', () => {
  const terms = termsUpToOrder(2, 2);
  it('the 2^2 yield data: SS_E 31.34 on 8 df, SS_T 323.00 less SS_A 208.33, SS_B 75.00, SS_AB 8.33 (Montgomery 8th ed., section 6.2, ANOVA table, printed to two decimals), both forms', () => {
    const yates = residualSsYates(yatesCells(yieldData.coded, 2)!, 2, terms);
    expect(yates.df).toBe(8);
    expect(residualSs(yates, Float64Array.from(yieldData.y))).toBeCloseTo(323 - 208.3333333 - 75 - 8.3333333, 6);
    const cols = modelColumns([], terms);
    const qr = residualSsQr(householderQr(modelMatrix(cols, yieldData.coded, null), 12, cols.length));
    expect(qr.df).toBe(8);
    expect(residualSs(qr, Float64Array.from(yieldData.y))).toBeCloseTo(323 - 208.3333333 - 75 - 8.3333333, 6);
  });
  it('the 2^3 etch data with center runs added and a part of the model: the same as the reference library, for several responses', () => {
    const coded = [...etch.coded, [0, 0, 0], [0, 0, 0], [0, 0, 0]];
    const model = [1, 2, 4, 5]; // A, B, C, AC
    const yates = residualSsYates(yatesCells(coded, 3)!, 3, model);
    const cols = modelColumns([], model);
    const qr = residualSsQr(householderQr(modelMatrix(cols, coded, null), coded.length, cols.length));
    for (const y of [[...etch.y, 700, 650, 720], [...etch.y, 700, 650, 720].map((v) => Math.log(v)), coded.map((_, i) => ((i * 7919) % 13) - 6)]) {
      const ref = referenceRss(coded, model, y);
      expect(residualSs(yates, Float64Array.from(y)) / ref).toBeCloseTo(1, 10);
      expect(residualSs(qr, Float64Array.from(y)) / ref).toBeCloseTo(1, 10);
    }
  });
  it("cross: a'Ma and a'Mb by polarisation of the reference library's RSS ((RSS(a + b) - RSS(a - b)) / 4), for a part of the model and for the full model (Parseval), all three forms", () => {
    const coded = [...etch.coded, [0, 0, 0], [0, 0, 0], [0, 0, 0]];
    const a = [...etch.y, 700, 650, 720];
    const b = coded.map((_, i) => ((i * 7919) % 13) - 6 + 1e3);
    for (const model of [[1, 2, 4, 5], termsUpToOrder(3, 3)]) {
      const yates = residualSsYates(yatesCells(coded, 3)!, 3, model);
      const cols = modelColumns([], model);
      const qr = residualSsQr(householderQr(modelMatrix(cols, coded, null), coded.length, cols.length));
      const fit = fitQr(cols, modelMatrix(cols, coded, null), a);
      const basis = residualSsBasis(fit.basis!, coded.length, fit.kept.length);
      const aa = referenceRss(coded, model, a);
      const ab = (referenceRss(coded, model, a.map((v, i) => v + b[i])) - referenceRss(coded, model, a.map((v, i) => v - b[i]))) / 4;
      expect(residualSs(basis, Float64Array.from(a)) / aa).toBeCloseTo(1, 10);
      for (const form of [yates, qr, basis]) {
        const out = new Float64Array(2);
        form.cross(Float64Array.from(a), Float64Array.from(b), out);
        expect(out[0] / aa).toBeCloseTo(1, 10);
        expect(Math.abs(out[1] - ab)).toBeLessThan(1e-8 * aa);
      }
    }
  });
  it('degenerate input: a response the model fits exactly gives 0, never a negative sum', () => {
    const yates = residualSsYates(yatesCells(yieldData.coded, 2)!, 2, terms);
    expect(residualSs(yates, Float64Array.from(yieldData.coded, (r) => 3 + r[0] - 2 * r[0] * r[1]))).toBeGreaterThanOrEqual(0);
    expect(residualSs(yates, Float64Array.from(yieldData.coded, (r) => 3 + r[0] - 2 * r[0] * r[1]))).toBeLessThan(1e-20);
  });
});
