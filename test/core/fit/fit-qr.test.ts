import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import MLR from 'ml-regression-multivariate-linear';
import { modelColumns, modelMatrix } from '../../../src/core/fit/columns.ts';
import { fitQr } from '../../../src/core/fit/fit-qr.ts';

/** Two factors, terms A, B, AB, at scattered coded settings (not orthogonal). */
const columns = modelColumns([], [1, 2, 3]);

describe('fitQr', () => {
  it('agrees with a general-purpose regression library (ml-regression-multivariate-linear 2.0.4) on random non-orthogonal runs (fast-check)', () => {
    fc.assert(
      fc.property(
        // Settings on a 0.1 grid (as a gauge reads them), responses to 0.01.
        fc.array(fc.tuple(fc.integer({ min: -10, max: 10 }), fc.integer({ min: -10, max: 10 }), fc.integer({ min: -5000, max: 5000 })), { minLength: 7, maxLength: 14 }),
        (rows) => {
          const coded = rows.map(([a, b]) => [a / 10, b / 10]);
          const y = rows.map((r) => r[2] / 100);
          const fit = fitQr(columns, modelMatrix(columns, coded, null), y);
          fc.pre(fit.kept.length === 4);
          const ref = new MLR(coded.map(([a, b]) => [a, b, a * b]), y.map((v) => [v]), { intercept: true, statistics: true });
          // The library puts the intercept last.
          const w = ref.weights.map((r) => r[0]);
          const scale = 1 + Math.max(...w.map(Math.abs));
          expect(Math.abs(fit.coef[0] - w[3]) / scale).toBeLessThan(1e-6);
          for (let j = 0; j < 3; j++) expect(Math.abs(fit.coef[j + 1] - w[j]) / scale).toBeLessThan(1e-6);
          const s2 = fit.rss / fit.dfResidual;
          const cov = ref.stdErrorMatrix.to2DArray();
          expect(Math.abs(s2 * fit.covUnscaled[0] - cov[3][3]) / (1e-12 + cov[3][3])).toBeLessThan(1e-5);
          expect(Math.abs(s2 * fit.covUnscaled[1 * 4 + 1] - cov[0][0]) / (1e-12 + cov[0][0])).toBeLessThan(1e-5);
          expect(fit.orthogonal).toBe(false);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('sequential sums of squares add up to the fitted sum of squares, and leverages to the rank', () => {
    const coded = [[-1, -1], [1, -1], [-1, 1], [1, 1], [0.5, 0], [0, -0.5], [0.2, 0.9]];
    const y = [3, 5, 4, 9, 5, 4, 6];
    const fit = fitQr(columns, modelMatrix(columns, coded, null), y);
    const total = y.reduce((s, v) => s + v * v, 0);
    expect([...fit.seqSS].reduce((s, v) => s + v, 0) + fit.rss).toBeCloseTo(total, 10);
    expect([...fit.leverage].reduce((s, v) => s + v, 0)).toBeCloseTo(4, 12); // trace of the hat matrix = p (Montgomery, Peck and Vining, 5th ed., section 4.2)
  });

  it('reports a column the runs cannot separate with its combination (C = AB in a 2^(3-1), I = ABC)', () => {
    const cols = modelColumns([], [1, 2, 4, 3]);
    const coded = [[-1, -1, 1], [1, -1, -1], [-1, 1, -1], [1, 1, 1], [0, 0, 0]];
    const fit = fitQr(cols, modelMatrix(cols, coded, null), [10, 14, 11, 19, 13]);
    expect(fit.aliased).toHaveLength(1);
    expect(fit.aliased[0].column).toBe(4); // AB
    expect(fit.aliased[0].combination).toEqual([{ column: 3, weight: expect.closeTo(1, 10) }]); // = C
  });

  it('degenerate input: the lean fit leaves leverage and (X\'X)^-1 empty and the orthogonality unknown (false)', () => {
    const coded = [[-1, -1], [1, -1], [-1, 1], [1, 1]];
    const lean = fitQr(columns, modelMatrix(columns, coded, null), [1, 2, 3, 5], true);
    expect(lean.covUnscaled.length).toBe(0);
    expect([...lean.leverage]).toEqual([0, 0, 0, 0]);
    expect(lean.orthogonal).toBe(false);
    expect(lean.dfResidual).toBe(0);
  });
});
