import MLR from 'ml-regression-multivariate-linear';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/core/errors.ts';
import { predictionVariance } from '../../../src/core/design/prediction-variance.ts';

/** A central composite design in coded units: 2^k corners, 2k axial runs at +-alpha, n0 centers. */
function ccd(k: number, alpha: number, n0: number): number[][] {
  const pts: number[][] = [];
  for (let c = 0; c < 2 ** k; c++) pts.push(Array.from({ length: k }, (_, j) => ((c >> j) & 1 ? 1 : -1)));
  for (let i = 0; i < k; i++) for (const s of [-alpha, alpha]) pts.push(Array.from({ length: k }, (_, j) => (j === i ? s : 0)));
  for (let i = 0; i < n0; i++) pts.push(new Array<number>(k).fill(0));
  return pts;
}

/** Full quadratic columns in two factors, written out by hand: 1, x1, x2, x1x2, x1^2, x2^2. */
const row2 = ([a, b]: readonly number[]) => [1, a, b, a * b, a * a, b * b];

describe('predictionVariance: N f(x)\'(X\'X)^-1 f(x) for the full quadratic model', () => {
  const points = ccd(2, Math.SQRT2, 5);
  const spv = predictionVariance(points)!;

  it("the module's example: the rotatable two-factor CCD with 5 centers has SPV 2.6 at the center", () => {
    // Var(b0) = 0.2 sigma^2 for this design (Myers, Montgomery and Anderson-Cook, Response Surface
    // Methodology, 3rd ed., section 8.2, from memory), so SPV(0) = 13 x 0.2 = 2.6.
    expect(spv.at([0, 0])).toBeCloseTo(2.6, 10);
  });

  it('agrees with the covariance of a general-purpose regression library', () => {
    // Reference: ml-regression-multivariate-linear 2.0.4; its stdErrorMatrix is s^2 (X'X)^-1, so
    // dividing by stdError^2 leaves (X'X)^-1. Any response with a nonzero residual will do (invented).
    const y = points.map((_, i) => [Math.sin(i + 1) * 3 + i]);
    const ref = new MLR(points.map(row2), y, { intercept: false, statistics: true });
    const s2 = ref.stdError ** 2;
    const c = ref.stdErrorMatrix.to2DArray().map((r) => r.map((v) => v / s2));
    for (const x of [[0, 0], [1, 0], [0.5, -0.7], [1, 1], [-1.2, 0.3]]) {
      const f = row2(x);
      const q = f.reduce((acc, fa, a) => acc + fa * f.reduce((s, fb, b) => s + c[a][b] * fb, 0), 0);
      expect(spv.at(x)).toBeCloseTo(points.length * q, 8);
    }
  });

  it('depends on the distance from the center only, for a rotatable design (Box and Hunter 1957)', () => {
    for (const r of [0.3, 1, 1.4]) {
      const along = spv.at([r, 0]);
      expect(spv.at([0, r])).toBeCloseTo(along, 10);
      expect(spv.at([r / Math.SQRT2, -r / Math.SQRT2])).toBeCloseTo(along, 10);
    }
  });

  it('degenerate input: too few runs, or runs that cannot separate the squares, give null', () => {
    // A 2^2 factorial has 4 runs for 6 columns; repeated, its squares equal the intercept (by hand).
    const square = ccd(2, 0, 0).slice(0, 4);
    expect(predictionVariance(square)).toBeNull();
    expect(predictionVariance([...square, ...square, ...square])).toBeNull();
  });

  it('refuses no runs, ragged rows, non-finite settings and a point of the wrong length', () => {
    expect(() => predictionVariance([])).toThrow(InputError);
    expect(() => predictionVariance([[0, 0], [1]])).toThrow('Run 2 has 1 settings, expected 2');
    expect(() => predictionVariance([[0, Number.NaN]])).toThrow('needs a finite coded setting, got NaN');
    expect(() => spv.at([0])).toThrow('needs 2 coded settings, got 1');
  });
});
