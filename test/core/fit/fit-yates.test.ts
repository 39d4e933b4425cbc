import { describe, expect, it } from 'vitest';
import { modelColumns, modelMatrix } from '../../../src/core/fit/columns.ts';
import { fitQr } from '../../../src/core/fit/fit-qr.ts';
import { fitYates, yatesCells } from '../../../src/core/fit/fit-yates.ts';
import { termsUpToOrder } from '../../../src/core/model/formula.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

const etch = fixtureData('montgomery-8e-ex6-1-plasma-etch-2x3.csv', { factors: ['Gap', 'Flow', 'Power'], response: 'Etch rate' });

describe('yatesCells', () => {
  it('gives each run its cell (bit i set when factor i is low) and -1 for a center run', () => {
    expect([...yatesCells([[-1, -1], [1, -1], [-1, 1], [1, 1], [0, 0]], 2)!]).toEqual([3, 2, 1, 0, -1]);
  });
  it('the 2^3 plasma etch runs (Montgomery 8th ed., Example 6.1) qualify: every cell twice', () => {
    const cells = yatesCells(etch.coded, 3)!;
    const counts = new Array(8).fill(0);
    for (const c of cells) counts[c]++;
    expect(counts).toEqual([2, 2, 2, 2, 2, 2, 2, 2]);
  });
  it('degenerate input: no qualification for unequal cells, an empty cell, an off-level run, a part-center run, no factorial runs or k = 0', () => {
    expect(yatesCells([[-1, -1], [1, -1], [-1, 1], [1, 1], [1, 1]], 2)).toBeNull();
    expect(yatesCells([[-1, -1], [1, -1], [-1, 1]], 2)).toBeNull();
    expect(yatesCells([[-1, -1], [1, -1], [-1, 1], [1, 0.98]], 2)).toBeNull();
    expect(yatesCells([[-1, -1], [1, -1], [-1, 1], [1, 1], [0, 1]], 2)).toBeNull();
    expect(yatesCells([[0, 0], [0, 0]], 2)).toBeNull();
    expect(yatesCells([[]], 0)).toBeNull();
  });
});

describe('fitYates', () => {
  const terms = termsUpToOrder(3, 3);
  const columns = modelColumns([], terms);
  const fit = fitYates(columns, terms, yatesCells(etch.coded, 3)!, 3, etch.y);

  it('gives the printed effects and sums of squares of Example 6.1 (Montgomery 8th ed., Tables 6.5 and 6.6)', () => {
    // Effects A -101.625, C 306.125, AC -153.625 (printed); coefficient = effect / 2.
    expect(2 * fit.coef[1]).toBeCloseTo(-101.625, 10);
    expect(2 * fit.coef[3]).toBeCloseTo(306.125, 10);
    expect(2 * fit.coef[5]).toBeCloseTo(-153.625, 10);
    // SS_A 41,310.5625, SS_E 18,020.50 (printed)
    expect(fit.seqSS[1]).toBeCloseTo(41310.5625, 6);
    expect(fit.rss).toBeCloseTo(18020.5, 6);
    expect(fit.dfResidual).toBe(8);
    expect(fit.method).toBe('yates');
  });

  it('equals the QR path on the same columns (coefficients, residuals, leverage, (X\'X)^-1)', () => {
    const qr = fitQr(columns, modelMatrix(columns, etch.coded, null), etch.y);
    for (let j = 0; j < columns.length; j++) {
      expect(fit.coef[j]).toBeCloseTo(qr.coef[j], 9);
      expect(fit.seqSS[j]).toBeCloseTo(qr.seqSS[j], 6);
      expect(fit.covUnscaled[j * columns.length + j]).toBeCloseTo(qr.covUnscaled[j * columns.length + j], 12);
    }
    for (let i = 0; i < etch.y.length; i++) {
      expect(fit.residuals[i]).toBeCloseTo(qr.residuals[i], 9);
      expect(fit.leverage[i]).toBeCloseTo(qr.leverage[i], 12);
    }
  });

  it('center runs: the intercept is the mean of all runs and a center run has leverage 1/N (Montgomery 8th ed., section 6.8)', () => {
    const c = fixtureData('montgomery-8e-ex6-6-center-points.csv', { factors: ['Time', 'Temperature'], response: 'Yield' });
    const t = termsUpToOrder(2, 2);
    const f = fitYates(modelColumns([], t), t, yatesCells(c.coded, 2)!, 2, c.y);
    expect(f.coef[0]).toBeCloseTo(c.y.reduce((s, v) => s + v, 0) / 9, 12);
    expect(f.leverage[8]).toBeCloseTo(1 / 9, 14);
    expect(f.leverage[0]).toBeCloseTo(1 / 9 + 3 / 4, 14);
  });

  it('degenerate input: an intercept-only model leaves the deviations from the mean as residuals', () => {
    const f = fitYates(modelColumns([], []), [], yatesCells([[-1], [1]], 1)!, 1, [1, 3]);
    expect(f.coef[0]).toBe(2);
    expect([...f.residuals]).toEqual([-1, 1]);
    expect(f.dfResidual).toBe(1);
  });
});

describe('fitYates: (X\'X)^-1 = diag(1/N, 1/N_f, ...) kept per design shape', () => {
  it('equals the QR path\'s covariance on the 2^3 plasma etch runs (Montgomery 8th ed., Example 6.1), with and without center runs, and a second shape leaves the first as it was', () => {
    const terms = termsUpToOrder(3, 3);
    const cols = modelColumns([], terms);
    const p = cols.length;
    const check = (coded: readonly (readonly number[])[], y: readonly number[]) => {
      const yates = fitYates(cols, terms, yatesCells(coded, 3)!, 3, y);
      const qr = fitQr(cols, modelMatrix(cols, coded, null), y);
      for (let i = 0; i < p * p; i++) expect(Math.abs(yates.covUnscaled[i] - qr.covUnscaled[i])).toBeLessThan(1e-14);
      return yates.covUnscaled;
    };
    const plain = check(etch.coded, etch.y);
    const kept = Array.from(plain);
    const centered = check([...etch.coded, [0, 0, 0], [0, 0, 0]], [...etch.y, 600, 640]);
    expect(centered[0]).toBeCloseTo(1 / 18, 15);
    expect(centered[p + 1]).toBeCloseTo(1 / 16, 15);
    expect(Array.from(plain)).toEqual(kept);
    expect(plain[0]).toBeCloseTo(1 / 16, 15);
  });
});
