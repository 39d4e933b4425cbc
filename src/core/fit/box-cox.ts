/**
 * The Box-Cox power that best suits a response for a given model (Box and Cox 1964, "An analysis
 * of transformations", JRSS B 26, 211-252, section 3): with y' = y - L all positive and g their
 * geometric mean, w(lambda) = (y'^lambda - 1) / (lambda g^(lambda - 1)) (g log y' at 0), SSE(lambda)
 * the residual sum of squares of w on the model columns, the profile log-likelihood is
 * L(lambda) = -(n/2) log(SSE(lambda) / n). The 95% interval is {lambda : L(lambda) >= Lmax -
 * chi-square(1, 0.95) / 2} (an end that reaches -3 or 3 is null). The suggestion is the first of
 * none (1), log (0), sqrt (0.5), inverse (-1) inside the interval, else power=lambda-hat rounded to 0.1.
 * The search uses the slope of L as well as L. With u = (y'^lambda - 1) / lambda (log y' at 0) and
 * u' = du/dlambda = (y'^lambda log y' - u) / lambda, SSE = g^(2(1 - lambda)) u'Mu (M the residual
 * projector), so L = -(n/2) (2 (1 - lambda) log g + log(u'Mu / n)) and
 * dL/dlambda = n (log g - u'Mu' / u'Mu) (differentiating the quadratic form; M is symmetric).
 * One pass over the runs gives both (residual-ss.ts cross). lambda-hat: a grid of step 0.5 on
 * [-3, 3] with L and its slope at each point; every cell where the slope turns from rising to
 * falling, and an end where L still rises, is a candidate; each interior one is refined by the
 * bracketed secant method on the slope, and the highest L wins. Each interval end: the grid
 * cell where L crosses the cut, then Newton's method on L - cut with its slope, bracketed.
 * Both stop at steps below 1e-6 / 8.
 * One factorisation serves every lambda: only y changes (residual-ss.ts: Q'w, or the contrasts
 * of a complete balanced factorial). On the grid y'^lambda is stepped by one multiplication per
 * run (y'^(lambda + h) = y'^lambda y'^h); the refinements use expm1, and a Taylor series where
 * |lambda log y'| < 1e-3 (the closed forms cancel there).
 * Cost O(n p^2) once, then O(n p) (O(n + k 2^k) on Yates' path) per lambda: 13 grid points
 * (multiplications only) and about five refinements.
 * Null when some y' is not positive, the residual df is 0, y'^3 or y'^-3 is beyond binary64 (a
 * range of more than about 1e100 in y'), or the model fits some power of y' exactly (L unbounded).
 * Example: see test/core/fit/box-cox.test.ts (Box and Cox 1964 poison data).
 */
import { normalQuantile } from '../dist/normal.ts';
import { householderQr } from '../linalg/householder-qr.ts';
import { BOX_COX_PRECISION, RANK_TOLERANCE } from '../tolerance.ts';
import { residualSsQr, type ResidualSs } from './residual-ss.ts';
import { transformToken } from './response-transform.ts';
import { newtonInBracket, secantInBracket } from './bracketed-root.ts';
import { hermiteLevel, hermiteSlopes, hermiteStationary } from './hermite-cell.ts';

export interface BoxCox {
  readonly lambda: number;
  /** 95% interval; an end that reaches the search limit (-3 or 3) is null. */
  readonly ci: readonly [number | null, number | null];
  /** A --transform token. */
  readonly suggestion: string;
}

/** The search range of lambda (Box and Cox 1964 plot roughly -1 to 1; a wider range is common practice). */
const LAMBDA_MIN = -3; // the grid's start y'^-3 is taken as (1 / y')^3 below
const LAMBDA_MAX = 3;
const GRID_STEP = 0.5; // its step y'^0.5 as sqrt(y')
/** Below this |lambda z| the transform and its slope come from their series (box-cox.ts atLambda). */
const SERIES_T = 1e-3;
/** A local: module bindings are getters under some loaders, and the refinements test it every step. */
const PRECISION = BOX_COX_PRECISION;

/** `x`: the model matrix, column-major n x p (intercept included); `yp`: the response minus its bound. */
export function boxCox(x: Float64Array, n: number, p: number, yp: readonly number[]): BoxCox | null {
  if (yp.length !== n || n === 0 || yp.some((v) => !(v > 0))) return null;
  return boxCoxOn(residualSsQr(householderQr(x, n, p, RANK_TOLERANCE)), yp);
}

/** The same search over a model already factorised (residual-ss.ts); null as boxCox. */
export function boxCoxOn(model: ResidualSs, yp: ArrayLike<number>): BoxCox | null {
  const n = model.n;
  if (yp.length !== n || n === 0 || model.df <= 0) return null;
  for (let i = 0; i < n; i++) if (!(yp[i] > 0)) return null;
  const z = new Float64Array(n);
  let logSum = 0;
  let zMax = 0;
  for (let i = 0; i < n; i++) {
    logSum += z[i] = Math.log(yp[i]);
    zMax = Math.max(zMax, Math.abs(z[i]));
  }
  const logG = logSum / n;
  const u = new Float64Array(n);
  const du = new Float64Array(n);
  const q = new Float64Array(2);
  const logN = Math.log(n);
  // L and its slope D at lambda from u and du filled in (see the header); L is +Infinity for a perfect fit.
  let slope = 0;
  const finish = (lambda: number): number => {
    model.cross(u, du, q);
    slope = n * (logG - q[1] / q[0]);
    return -(n / 2) * (2 * (1 - lambda) * logG + Math.log(q[0]) - logN);
  };
  // Near 0 the closed forms cancel: the Taylor series there (seriesAt).
  const atLambda = (lambda: number): number => {
    if (Math.abs(lambda) * zMax < SERIES_T) seriesAt(z, u, du, lambda);
    else closedAt(z, u, du, lambda);
    return finish(lambda);
  };
  // The grid: y'^lambda stepped by one multiplication per run (its rounding, some tens of ulps,
  // only picks the cells; every answer comes from atLambda).
  const steps = Math.round((LAMBDA_MAX - LAMBDA_MIN) / GRID_STEP);
  const gridL = new Float64Array(steps + 1);
  const gridD = new Float64Array(steps + 1);
  const power = new Float64Array(n);
  const stepBy = new Float64Array(n);
  // y'^-3 and y'^0.5 without exp (the grid's end and step are these two constants).
  for (let i = 0; i < n; i++) {
    const r = 1 / yp[i];
    power[i] = r * r * r;
    stepBy[i] = Math.sqrt(yp[i]);
  }
  for (let s = 0; s <= steps; s++) {
    const lambda = LAMBDA_MIN + s * GRID_STEP;
    if (Math.abs(lambda) * zMax < SERIES_T) {
      seriesAt(z, u, du, lambda);
      for (let i = 0; i < n; i++) power[i] *= stepBy[i];
    } else gridAt(z, u, du, power, stepBy, lambda);
    gridL[s] = finish(lambda);
    gridD[s] = slope;
    if (!Number.isFinite(gridL[s]) || !Number.isFinite(slope)) return null; // a perfect fit, or beyond binary64
  }
  // The candidates for the maximum: each cell where the slope turns from rising to falling, and an
  // end of the range where L still rises towards it. Each is refined; the highest wins.
  let lambda = Number.NaN;
  let lmax = -Infinity;
  let cell = -1; // the grid index at or just below lambda-hat
  const consider = (l: number, at: number, s: number): void => {
    if (at > lmax) {
      lambda = l;
      lmax = at;
      cell = s;
    }
  };
  if (gridD[0] <= 0) consider(LAMBDA_MIN, gridL[0], 0);
  if (gridD[steps] >= 0) consider(LAMBDA_MAX, gridL[steps], steps);
  let lastX = 0;
  let lastL = 0;
  const slopeAt = (l: number): number => {
    lastX = l;
    lastL = atLambda(l);
    return slope;
  };
  for (let s = 0; s < steps; s++) {
    if (!(gridD[s] > 0 && gridD[s + 1] <= 0)) continue;
    const a = LAMBDA_MIN + s * GRID_STEP;
    const b = a + GRID_STEP;
    if (gridD[s + 1] === 0) {
      consider(b, atLambda(b), s + 1);
      continue;
    }
    const guess = hermiteStationary(a, b, gridL[s], gridL[s + 1], gridD[s], gridD[s + 1]) ?? a - (gridD[s] * GRID_STEP) / (gridD[s + 1] - gridD[s]);
    const root = secantInBracket(slopeAt, a, gridD[s], b, gridD[s + 1], guess, PRECISION / 8);
    // L at the root from the last point evaluated, by the quadratic through it (the step is below
    // 1e-7, so the cubic term is below 1e-20).
    consider(root, lastL + (slope * (root - lastX)) / 2, s);
  }
  // No candidate, or a lambda at which the model fits exactly (L unbounded): no power to suggest.
  if (cell < 0 || !Number.isFinite(lmax)) return null;
  // chi-square(1, 0.95) is the square of the normal 0.975 quantile (3.8415).
  const cut = lmax - normalQuantile(0.975) ** 2 / 2;
  // Each end: walk the grid outwards while L stays above the cut, then Newton's method on L - cut
  // (its slope is D) inside that cell, from where the cell's Hermite cubic crosses the cut.
  const crossing = (l: number): readonly [number, number] => [atLambda(l) - cut, slope];
  const end = (dir: -1 | 1): number | null => {
    let s = dir < 0 ? (LAMBDA_MIN + cell * GRID_STEP === lambda ? cell - 1 : cell) : cell + 1;
    let inside = lambda;
    let lIn = lmax;
    let dIn = LAMBDA_MIN + cell * GRID_STEP === lambda ? gridD[cell] : 0; // lambda-hat inside a cell is where the slope is 0
    while (s >= 0 && s <= steps && gridL[s] >= cut) {
      inside = LAMBDA_MIN + s * GRID_STEP;
      lIn = gridL[s];
      dIn = gridD[s];
      s += dir;
    }
    if (s < 0 || s > steps) return null;
    const outside = LAMBDA_MIN + s * GRID_STEP;
    const guess = hermiteLevel(inside, outside, lIn, gridL[s], dIn, gridD[s], cut);
    const [d1, d2] = hermiteSlopes(inside, outside, lIn, gridL[s], dIn, gridD[s], guess);
    // The cubic's curvature near the crossing, with a margin of 4 for its own error.
    return newtonInBracket(crossing, inside, outside, guess, PRECISION / 8, (4 * Math.abs(d2)) / (2 * Math.abs(d1)));
  };
  const lo = end(-1);
  const hi = end(1);
  const inCi = (l: number): boolean => (lo === null || l >= lo) && (hi === null || l <= hi);
  const named = [1, 0, 0.5, -1].find(inCi);
  const suggestion = named !== undefined ? transformToken(named) : transformToken(Math.round(lambda * 10) / 10);
  return { lambda, ci: [lo, hi], suggestion };
}

// The three fillers of u and du take their arrays as arguments: arrays that closures capture live in
// a context, whose loads V8 does not hoist out of a loop nested in another (measured about 4x slower).

/** u and du at lambda from their Taylor series in t = lambda z, five terms each (|t| < SERIES_T: the first term left out is below SERIES_T^5 of the sum). */
function seriesAt(z: Float64Array, u: Float64Array, du: Float64Array, lambda: number): void {
  for (let i = 0; i < z.length; i++) {
    const zi = z[i];
    const t = lambda * zi;
    u[i] = zi * (1 + t * (1 / 2 + t * (1 / 6 + t * (1 / 24 + t / 120))));
    du[i] = zi * zi * (1 / 2 + t * (1 / 3 + t * (1 / 8 + t * (1 / 30 + t / 144))));
  }
}

/** u and du at lambda from expm1 (away from 0, where the closed forms do not cancel). */
function closedAt(z: Float64Array, u: Float64Array, du: Float64Array, lambda: number): void {
  const inv = 1 / lambda;
  for (let i = 0; i < z.length; i++) {
    const e = Math.expm1(lambda * z[i]);
    const ui = e * inv;
    u[i] = ui;
    du[i] = (z[i] * (e + 1) - ui) * inv;
  }
}

/** u and du at a grid point from power = y'^lambda, which is then stepped on by one multiplication per run. */
function gridAt(z: Float64Array, u: Float64Array, du: Float64Array, power: Float64Array, stepBy: Float64Array, lambda: number): void {
  const inv = 1 / lambda;
  for (let i = 0; i < z.length; i++) {
    const v = power[i];
    const ui = (v - 1) * inv;
    u[i] = ui;
    du[i] = (z[i] * v - ui) * inv;
    power[i] = v * stepBy[i];
  }
}
