/**
 * The Box-Cox power that best suits a response for a given model (Box and Cox 1964, "An analysis
 * of transformations", JRSS B 26, 211-252, section 3): with y' = y - L all positive and g their
 * geometric mean, w(lambda) = (y'^lambda - 1) / (lambda g^(lambda - 1)) (g log y' at 0), SSE(lambda)
 * the residual sum of squares of w on the model columns, the profile log-likelihood is
 * L(lambda) = -(n/2) log(SSE(lambda) / n). lambda-hat maximises it on [-3, 3] (a grid of step
 * 0.1, then Brent's method to 1e-6 in the grid cells either side of the best point); the 95% interval is {lambda : L(lambda) >= Lmax -
 * chi-square(1, 0.95) / 2}, each end found by the Illinois method to 1e-6 (an end that reaches -3 or 3 is
 * null). The suggestion is the first of none (1), log (0), sqrt (0.5), inverse (-1) inside the
 * interval, else power=lambda-hat rounded to 0.1.
 * One factorisation serves every lambda: only y changes (residual-ss.ts: Q'w, or the contrasts
 * of a complete balanced factorial, gives SSE). On the grid y'^lambda is stepped by one
 * multiplication per run (y'^(lambda + h) = y'^lambda y'^h); the refinements use expm1.
 * Cost O(n p^2) once, then O(n p) (O(n + k 2^k) on Yates' path) per lambda, about 90 of them.
 * Null when some y' is not positive or the residual df is 0.
 * Example: see test/core/fit/box-cox.test.ts (Box and Cox 1964 poison data).
 */
import { normalQuantile } from '../dist/normal.ts';
import { householderQr } from '../linalg/householder-qr.ts';
import { BOX_COX_PRECISION, RANK_TOLERANCE } from '../tolerance.ts';
import { residualSsQr, type ResidualSs } from './residual-ss.ts';
import { transformToken } from './response-transform.ts';

export interface BoxCox {
  readonly lambda: number;
  /** 95% interval; an end that reaches the search limit (-3 or 3) is null. */
  readonly ci: readonly [number | null, number | null];
  /** A --transform token. */
  readonly suggestion: string;
}

/** The search range of lambda (Box and Cox 1964 plot roughly -1 to 1; a wider range is common practice). */
const LAMBDA_MIN = -3;
const LAMBDA_MAX = 3;
const GRID_STEP = 0.1;
/** A local: module bindings are getters under some loaders, and the refinements test it every step. */
const PRECISION = BOX_COX_PRECISION;

/** `x`: the model matrix, column-major n x p (intercept included); `yp`: the response minus its bound. */
export function boxCox(x: Float64Array, n: number, p: number, yp: readonly number[]): BoxCox | null {
  if (yp.length !== n || n === 0 || yp.some((v) => !(v > 0))) return null;
  return boxCoxOn(residualSsQr(householderQr(x, n, p, RANK_TOLERANCE)), yp);
}

/** The same search over a model already factorised (residual-ss.ts); null as boxCox. */
export function boxCoxOn(model: ResidualSs, yp: readonly number[]): BoxCox | null {
  const n = model.n;
  if (yp.length !== n || n === 0 || model.df <= 0) return null;
  for (let i = 0; i < n; i++) if (!(yp[i] > 0)) return null;
  const logY = new Float64Array(n);
  let logSum = 0;
  for (let i = 0; i < n; i++) logSum += logY[i] = Math.log(yp[i]);
  const logG = logSum / n;
  const w = new Float64Array(n);
  const toLoglik = (sse: number): number => -(n / 2) * Math.log(sse / n);
  const loglik = (lambda: number): number => {
    if (lambda === 0) for (let i = 0; i < n; i++) w[i] = Math.exp(logG) * logY[i];
    else {
      const scale = lambda * Math.exp((lambda - 1) * logG);
      for (let i = 0; i < n; i++) w[i] = Math.expm1(lambda * logY[i]) / scale;
    }
    return toLoglik(model.ss(w));
  };
  const steps = Math.round((LAMBDA_MAX - LAMBDA_MIN) / GRID_STEP);
  const grid = new Float64Array(steps + 1);
  // The grid: y'^lambda by repeated multiplication (its rounding, some tens of ulps, only picks the cell).
  const power = new Float64Array(n);
  const stepBy = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    power[i] = Math.exp(LAMBDA_MIN * logY[i]);
    stepBy[i] = Math.exp(GRID_STEP * logY[i]);
  }
  let best = 0;
  for (let s = 0; s <= steps; s++) {
    const lambda = LAMBDA_MIN + s * GRID_STEP;
    // The step to the next power rides in the same pass over the runs as the transform.
    if (Math.abs(lambda) < GRID_STEP / 2) {
      grid[s] = loglik(0);
      for (let i = 0; i < n; i++) power[i] *= stepBy[i];
    } else {
      const scale = lambda * Math.exp((lambda - 1) * logG);
      for (let i = 0; i < n; i++) {
        w[i] = (power[i] - 1) / scale;
        power[i] *= stepBy[i];
      }
      grid[s] = toLoglik(model.ss(w));
    }
    if (grid[s] > grid[best]) best = s;
  }
  // Brent's method (parabolic steps, golden-section when they misbehave) in the grid cells either
  // side of the best grid point: Brent, Algorithms for Minimization without Derivatives (1973),
  // chapter 5, as in Press et al., Numerical Recipes, 3rd ed., section 10.3.
  // Brent returns L at its answer too (the same number loglik(lambda) would give again).
  const { x: lambda, fx: atLambda } = brentMax(loglik, LAMBDA_MIN + Math.max(0, best - 1) * GRID_STEP, LAMBDA_MIN + Math.min(steps, best + 1) * GRID_STEP, LAMBDA_MIN + best * GRID_STEP);
  const lmax = Math.max(atLambda, grid[best]);
  // chi-square(1, 0.95) is the square of the normal 0.975 quantile (3.8415).
  const cut = lmax - normalQuantile(0.975) ** 2 / 2;
  const end = (dir: -1 | 1): number | null => {
    let s = best;
    while (s + dir >= 0 && s + dir <= steps && grid[s + dir] >= cut) s += dir;
    if (s + dir < 0 || s + dir > steps) return null;
    const inside = s === best ? lambda : LAMBDA_MIN + s * GRID_STEP;
    return illinoisRoot((l) => loglik(l) - cut, inside, LAMBDA_MIN + (s + dir) * GRID_STEP, s === best ? atLambda - cut : undefined);
  };
  const lo = end(-1);
  const hi = end(1);
  const inCi = (l: number): boolean => (lo === null || l >= lo) && (hi === null || l <= hi);
  const named = [1, 0, 0.5, -1].find(inCi);
  const suggestion = named !== undefined ? transformToken(named) : transformToken(Math.round(lambda * 10) / 10);
  return { lambda, ci: [lo, hi], suggestion };
}

/** The maximiser x of f on [a, b] to BOX_COX_PRECISION by Brent's method, starting from x in (a, b), with fx = f(x). */
function brentMax(f: (x: number) => number, a: number, b: number, x: number): { x: number; fx: number } {
  const golden = (3 - Math.sqrt(5)) / 2;
  const tol = PRECISION / 2;
  let fx = -f(x);
  let w = x;
  let v = x;
  let fw = fx;
  let fv = fx;
  let d = 0;
  let e = 0;
  for (let iter = 0; iter < 200; iter++) {
    const xm = (a + b) / 2;
    if (Math.abs(x - xm) <= 2 * tol - (b - a) / 2) break;
    let parabolic = false;
    if (Math.abs(e) > tol) {
      const r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      const before = e;
      e = d;
      if (Math.abs(p) < Math.abs(0.5 * q * before) && p > q * (a - x) && p < q * (b - x)) {
        d = p / q;
        const u = x + d;
        if (u - a < 2 * tol || b - u < 2 * tol) d = xm >= x ? tol : -tol;
        parabolic = true;
      }
    }
    if (!parabolic) {
      e = x >= xm ? a - x : b - x;
      d = golden * e;
    }
    const u = Math.abs(d) >= tol ? x + d : x + (d >= 0 ? tol : -tol);
    const fu = -f(u);
    if (fu <= fx) {
      if (u >= x) a = x;
      else b = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
  return { x, fx: -fx };
}

/**
 * The root of g between `inside` (g >= 0) and `outside` (g < 0) to BOX_COX_PRECISION by the
 * Illinois variant of false position (Dowell and Jarratt 1971, BIT 11, 168-174): the end kept
 * twice running has its value halved, so both ends close in; a step that leaves the bracket
 * (rounding) bisects instead. `gInside`: g(inside) when the caller has it already.
 */
function illinoisRoot(g: (x: number) => number, inside: number, outside: number, gInside?: number): number {
  let a = inside;
  let b = outside;
  let ga = gInside ?? g(a);
  let gb = g(b);
  let side = 0;
  for (let iter = 0; iter < 200 && Math.abs(b - a) > PRECISION; iter++) {
    let c = ga - gb !== 0 ? (a * gb - b * ga) / (gb - ga) : (a + b) / 2;
    if (!(Math.min(a, b) < c && c < Math.max(a, b))) c = (a + b) / 2;
    const gc = g(c);
    if (gc >= 0) {
      a = c;
      ga = gc;
      if (side === -1) gb /= 2;
      side = -1;
    } else {
      b = c;
      gb = gc;
      if (side === 1) ga /= 2;
      side = 1;
    }
  }
  return (a + b) / 2;
}
