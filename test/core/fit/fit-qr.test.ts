import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import MLR from 'ml-regression-multivariate-linear';
import { modelColumns, modelMatrix } from '../../../src/core/fit/columns.ts';
import { fitQr, fitQrOnSettings } from '../../../src/core/fit/fit-qr.ts';
import { fixtureData } from '../../helpers/fixtures.ts';

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

// The part of a fit that depends only on the model matrix is kept for the last few matrices
// (matrix-memo.ts). A fit that recalls it must give, to the last bit, what a cold fit gives.
// Data: the unreplicated 2^4 filtration-rate runs (Montgomery 8th ed., Example 6.2), as printed
// and as floor data (a lost run, settings off target by up to 0.04 coded, one run left out).
describe('fitQr with a recalled factorisation', () => {
  const filtration = fixtureData('montgomery-8e-ex6-2-filtration-2x4.csv', { factors: ['Temperature', 'Pressure', 'Concentration', 'Stirring'], response: 'Filtration rate' });
  const cols = modelColumns([], [1, 2, 4, 8, 3, 5, 9, 6, 10, 12]);
  const floor = (() => {
    const keep = filtration.coded.map((_, i) => i).filter((i) => i !== 5 && i !== 11); // run 6 lost, run 12 left out
    return { coded: keep.map((i, r) => filtration.coded[i].map((v, f) => v + (((r * 7 + f * 3) % 9) - 4) / 100)), y: keep.map((i) => filtration.y[i]) };
  })();
  /** Four fits on other matrices of the same shape push every earlier matrix out of the store. */
  const evict = (n: number, lean: boolean) => {
    for (let e = 0; e < 4; e++) {
      const coded = Array.from({ length: n }, (_, i) => [Math.sin(i + e), Math.cos(3 * i + e), Math.sin(5 * i - e), Math.cos(i * e + 1)]);
      fitQr(cols, modelMatrix(cols, coded, null), coded.map((r) => r[0]), lean);
    }
  };
  const same = (a: ReturnType<typeof fitQr>, b: ReturnType<typeof fitQr>) => {
    for (const key of ['kept', 'coef', 'covUnscaled', 'seqSS', 'fitted', 'residuals', 'leverage'] as const) {
      expect(b[key].length).toBe(a[key].length);
      for (let i = 0; i < a[key].length; i++) expect(Object.is(b[key][i], a[key][i])).toBe(true);
    }
    expect(Array.from(b.basis ?? [])).toEqual(Array.from(a.basis ?? []));
    expect(b.aliased).toEqual(a.aliased);
    expect([b.rss, b.dfResidual, b.orthogonal]).toEqual([a.rss, a.dfResidual, a.orthogonal]);
  };
  for (const [name, data] of [['as printed', filtration], ['floor data', floor]] as const) {
    it(`a second response on the same runs (${name}) gives the cold fit's numbers, and the first response again too`, () => {
      const y2 = data.y.map((v, i) => v * (1 + i / 50));
      for (const lean of [false, true]) {
        evict(data.y.length, lean);
        const first = fitQr(cols, modelMatrix(cols, data.coded, null), data.y, lean);
        const recalled = fitQr(cols, modelMatrix(cols, data.coded, null), y2, lean);
        evict(data.y.length, lean);
        const cold = fitQr(cols, modelMatrix(cols, data.coded, null), y2, lean);
        same(cold, recalled);
        same(first, fitQr(cols, modelMatrix(cols, data.coded, null), data.y, lean));
        // The recalled arrays are the caller's own: changing one leaves the next fit as it was.
        recalled.leverage.fill(7);
        recalled.coef.fill(7);
        same(cold, fitQr(cols, modelMatrix(cols, data.coded, null), y2, lean));
        // Found by the settings instead of the matrix (fitQrOnSettings): the same numbers, new or found again.
        same(cold, fitQrOnSettings(cols, data.coded, null, y2, lean));
        same(first, fitQrOnSettings(cols, data.coded, null, data.y, lean));
        same(cold, fitQrOnSettings(cols, data.coded, null, y2, lean));
      }
    });
  }
});
