/**
 * Scaled prediction variance of a design for the full second-order model:
 * SPV(x) = N Var(y-hat(x)) / sigma^2 = N f(x)' (X'X)^-1 f(x), with f(x) the model columns
 * (intercept, main effects, two-factor interactions, squares) at coded x and X the N-run model
 * matrix. It compares designs per run before any response is measured; for a rotatable design
 * it depends on the distance from the center only (Box and Hunter 1957, Annals of Mathematical
 * Statistics 28, 195-241; Myers, Montgomery and Anderson-Cook, Response Surface Methodology,
 * 3rd ed., section 8.2, from memory). Blocks are left out of the model: with orthogonal blocks
 * they do not change it.
 */
import { InputError } from '../errors.ts';
import { householderQr } from '../linalg/householder-qr.ts';
import { crossInverse, invertUpper } from '../linalg/triangular.ts';
import { termValue } from '../model/term.ts';
import { fullQuadraticTerms } from './second-order-terms.ts';

export interface PredictionVariance {
  /** N f(x)'(X'X)^-1 f(x) at coded x. */
  at(x: readonly number[]): number;
}

/**
 * Prepares SPV for a set of coded design points (one row per run), or returns null when the runs
 * cannot estimate the full quadratic model (X has lower rank than its columns). Cost O(N p^2)
 * with p = 1 + 2k + k(k-1)/2, then O(p^2) per point.
 * Throws InputError for no runs, rows of different lengths or non-finite settings.
 * Example: for the rotatable two-factor central composite design with 5 center runs,
 * predictionVariance(points)!.at([0, 0]) -> 13 x 0.2 = 2.6.
 */
export function predictionVariance(points: readonly (readonly number[])[]): PredictionVariance | null {
  const n = points.length;
  if (n === 0) throw new InputError('A prediction variance needs at least one run, got none');
  const k = points[0].length;
  points.forEach((p, i) => {
    if (p.length !== k) throw new InputError(`Run ${i + 1} has ${p.length} settings, expected ${k}`);
    p.forEach((v, j) => {
      if (!Number.isFinite(v)) throw new InputError(`Run ${i + 1}, factor ${j + 1}: needs a finite coded setting, got ${v}`);
    });
  });
  const terms = fullQuadraticTerms(k);
  const p = 1 + terms.length;
  if (n < p) return null;
  const x = new Float64Array(n * p);
  for (let i = 0; i < n; i++) {
    x[i] = 1;
    terms.forEach((t, j) => (x[(j + 1) * n + i] = termValue(t, points[i])));
  }
  const qr = householderQr(x, n, p);
  if (qr.rank < p) return null;
  const c = crossInverse(invertUpper(qr.r, p), p);
  const f = new Float64Array(p);
  return {
    at(pt: readonly number[]): number {
      if (pt.length !== k) throw new InputError(`A prediction variance needs ${k} coded settings, got ${pt.length}`);
      f[0] = 1;
      terms.forEach((t, j) => (f[j + 1] = termValue(t, pt)));
      let q = 0;
      for (let a = 0; a < p; a++) {
        let s = 0;
        for (let b = 0; b < p; b++) s += c[b * p + a] * f[b];
        q += f[a] * s;
      }
      return n * q;
    },
  };
}
