import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import MLR from 'ml-regression-multivariate-linear';
import { adjustedCurvature, cellKinds, curvature, runKinds } from '../../../src/core/fit/curvature.ts';
import { yatesCells } from '../../../src/core/fit/fit-yates.ts';
import { modelColumns } from '../../../src/core/fit/columns.ts';
import { pureError } from '../../../src/core/fit/pure-error.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { CENTER_TOLERANCE } from '../../../src/core/tolerance.ts';
import { fixtureData } from '../../helpers/fixtures.ts';
import { laserData, laserFactors } from '../../helpers/half-fraction.ts';

describe('runKinds', () => {
  const factors = defineFactors([
    { kind: 'numeric', name: 'Time', low: 30, high: 40 },
    { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
  ]);
  it('factorial at +-1 (within CENTER_TOLERANCE), center with numeric factors at 0 and categorical ones at either level, else other', () => {
    expect(CENTER_TOLERANCE).toBe(0.1); // our own choice: 5% of the range either side
    expect(runKinds(factors, [[1, -1], [-0.95, 1], [0, 1], [0.05, -1], [0.5, 1], [0, 0]])).toEqual(['factorial', 'factorial', 'center', 'center', 'other', 'other']);
  });
  it('degenerate input: no runs give no kinds', () => {
    expect(runKinds(factors, [])).toEqual([]);
  });
});

describe('curvature (Montgomery 8th ed., section 6.8, Eq. 6.30)', () => {
  const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
  const kinds = runKinds(d.factors, d.coded);
  const c = curvature(kinds, d.y, pureError(d.coded, d.y, null))!;

  it('the printed example: ybar_F = 40.425, ybar_C = 40.46, SS_pure quadratic = 0.0027', () => {
    expect(c.nFactorial).toBe(4);
    expect(c.nCenter).toBe(5);
    expect(c.estimate).toBeCloseTo(40.425 - 40.46, 12);
    expect(c.ss).toBeCloseTo((4 * 5 * 0.035 ** 2) / 9, 12); // 0.0027222
  });

  it("t^2 equals the printed F = SS / MS_E = 0.0027 / 0.0430, and p agrees with jstat's t distribution on 4 df", () => {
    expect(c.t! ** 2).toBeCloseTo(c.ss / 0.043, 10);
    expect(c.p!).toBeCloseTo(2 * (1 - jStat.studentt.cdf(Math.abs(c.t!), 4)), 10);
  });

  it('degenerate input: null without center runs; no se without pure error; no t when pure error is zero', () => {
    expect(curvature(['factorial', 'factorial'], [1, 2], { ss: 0, df: 0 })).toBeNull();
    expect(curvature(['center', 'center'], [1, 2], { ss: 0.5, df: 1 })).toBeNull();
    const noPe = curvature(['factorial', 'factorial', 'center'], [1, 3, 5], { ss: 0, df: 0 })!;
    expect(noPe.estimate).toBe(-3);
    expect(noPe.se).toBeNull();
    expect(noPe.p).toBeNull();
    const zero = curvature(['factorial', 'factorial', 'center', 'center'], [1, 3, 5, 5], { ss: 0, df: 1 })!;
    expect(zero.se).toBe(0);
    expect(zero.t).toBeNull();
  });
});

describe('adjustedCurvature (regression form with a center-run column)', () => {
  const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
  const kinds = runKinds(d.factors, d.coded);
  const pe = pureError(d.coded, d.y, null);
  const cols = modelColumns([], [1, 2, 3]);

  it('on the complete balanced 2^2 with 5 centers it equals the mean difference (Montgomery 8th ed., section 6.8: 40.425 - 40.46)', () => {
    const a = adjustedCurvature(cols, d.coded, null, kinds, d.y, pe)!;
    const m = curvature(kinds, d.y, pe)!;
    expect(a.estimate).toBeCloseTo(40.425 - 40.46, 10);
    expect(a.se!).toBeCloseTo(m.se!, 10);
    expect(a.p!).toBeCloseTo(m.p!, 10);
    expect(a.ss).toBeCloseTo(m.ss, 10);
  });

  it('with centers unbalanced across a categorical factor, it matches a direct least-squares fit by ml-regression-multivariate-linear, and differs from the mean difference', () => {
    const data = laserData();
    // drop one center run at N2 and add two at air: centers air, air, N2 (invented responses)
    const coded = [...data.coded.slice(0, 9), [0, 0, 0, -1], [0, 0, 0, 1]];
    const y = [...data.y.slice(0, 9), 1.32, 2.37];
    const k = runKinds(laserFactors, coded);
    const pe2 = pureError(coded, y, null);
    const terms = [1, 2, 4, 8, 3, 5, 9]; // A, B, C, D, AB, AC, AD: one term per chain of the fraction
    const c = adjustedCurvature(modelColumns([], terms), coded, null, k, y, pe2)!;
    const x = coded.map((r, i) => [...terms.map((t) => [0, 1, 2, 3].reduce((p, f) => (t & (1 << f) ? p * r[f] : p), 1)), k[i] === 'center' ? 1 : 0]);
    const ref = new MLR(x, y.map((v) => [v]), { intercept: true });
    expect(c.estimate).toBeCloseTo(-ref.weights[terms.length][0], 9); // ml-regression-multivariate-linear
    const mean = curvature(k, y, pe2)!;
    expect(Math.abs(c.estimate - mean.estimate)).toBeGreaterThan(0.01);
    // se from the reference fit's (X'X)^-1: its stdErrors scale by its own sigma, so rescale to pure error
    const refSigma = Math.sqrt(residualMs(ref, x, y, terms.length + 2));
    const czz = (ref.stdErrors[terms.length] / refSigma) ** 2;
    expect(c.se!).toBeCloseTo(Math.sqrt((pe2.ss / pe2.df) * czz), 9);
  });

  it('degenerate input: null without center runs; no se without pure error', () => {
    const corners = d.coded.filter((_, i) => kinds[i] === 'factorial');
    const yc = d.y.filter((_, i) => kinds[i] === 'factorial');
    expect(adjustedCurvature(cols, corners, null, runKinds(d.factors, corners), yc, pureError(corners, yc, null))).toBeNull();
    expect(adjustedCurvature(cols, d.coded, null, kinds, d.y, { ss: 0, df: 0 })!.se).toBeNull();
  });
});

function residualMs(ref: MLR, x: number[][], y: number[], p: number): number {
  const pred = ref.predict(x) as number[][];
  return y.reduce((s, v, i) => s + (v - pred[i][0]) ** 2, 0) / (y.length - p);
}

describe('cellKinds: run kinds on Yates\' path from the cells, the same as runKinds from the settings', () => {
  it('the 2^2 with five center points (Montgomery 8th ed., section 6.8), and with a categorical factor', () => {
    const d = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const cells = yatesCells(d.coded, 2)!;
    expect(cells).not.toBeNull();
    expect(cellKinds(d.factors, cells)).toEqual(runKinds(d.factors, d.coded));
    expect(cellKinds(d.factors, cells).filter((k) => k === 'center')).toHaveLength(5);
    const mixed = defineFactors([
      { kind: 'numeric', name: 'Time', low: 30, high: 40 },
      { kind: 'categorical', name: 'Powder', levels: ['matte', 'gloss'] },
    ]);
    expect(cellKinds(mixed, cells)).toEqual(runKinds(mixed, d.coded));
  });
});
