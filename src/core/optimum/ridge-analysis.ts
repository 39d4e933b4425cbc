/**
 * Ridge analysis of a second-order surface y-hat = b0 + x'b + x'Bx (coded units): on the sphere
 * |x| = R the highest (or lowest) fitted response is where (B - mu I) x = -b / 2 with the
 * Lagrange multiplier mu above the largest eigenvalue of B (below the smallest, for the lowest).
 * In the eigenbasis B = V diag(lambda) V', x(mu) = -sum_i g_i / (lambda_i - mu) v_i with
 * g_i = v_i'b / 2, and |x(mu)| falls steadily from infinity to 0 as mu rises past lambda_max, so
 * R fixes mu by bisection. When g is zero along the top eigenvector (the "hard case"),
 * |x(mu)| stays bounded as mu falls to lambda_max, and beyond that radius the point is
 * x(lambda_max) plus the top eigenvector scaled to reach the sphere.
 * Sources: Hoerl (1959), Chemical Engineering Progress 55, 69-78; Draper (1963), "Ridge
 * analysis" of response surfaces, Technometrics 5, 469-479 (from memory).
 */
import { InputError } from '../errors.ts';
import { toReal } from '../factor/coding.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { symmetricEigen } from '../linalg/symmetric-eigen.ts';
import { cachedPredictor } from '../predict/compiled-predictor.ts';
import { FLOOR_ROUNDING, SINGULAR_TOLERANCE, TINY_SCALE } from '../tolerance.ts';
import { quadraticSurface, type QuadraticSurface } from './quadratic-surface.ts';

/** Highest or lowest fitted response. */
export type Sense = 'max' | 'min';

/** Radius step of the ridge table, in coded units (the 0.1, common practice). */
export const RIDGE_STEP = 0.1;

export interface RidgePoint {
  readonly radius: number;
  readonly coded: readonly number[];
  readonly real: readonly number[];
  readonly fit: number;
  /** 95% prediction interval for one new run there; null when the residual df is 0. */
  readonly pi: readonly [number, number] | null;
}

/** Bisection steps: enough to take the multiplier's bracket down to rounding (2^-200 of it). */
const BISECTIONS = 200;

/**
 * The point of highest (sense 'max') or lowest ('min') value of the surface on the sphere of
 * the given radius around the center, in coded units (see the file comment).
 * Cost O(k^3) for the eigen-decomposition plus O(k^2) per bisection step.
 * Throws InputError for a radius that is not a finite number of 0 or more.
 * Example: for y = x1 + x2 (B = 0) and radius 1, the maximum is at (0.7071, 0.7071).
 */
export function ridgePoint(surface: QuadraticSurface, radius: number, sense: Sense): number[] {
  if (!Number.isFinite(radius) || radius < 0) throw new InputError(`A ridge radius must be a finite number of 0 or more, got ${radius}`);
  const k = surface.b.length;
  if (radius === 0) return new Array<number>(k).fill(0);
  // The lowest value of f is the highest of -f.
  const s = sense === 'max' ? 1 : -1;
  const { values, vectors } = symmetricEigen(surface.B.map((row) => row.map((v) => s * v)));
  const g = vectors.map((v) => (s * v.reduce((acc, vj, j) => acc + vj * surface.b[j], 0)) / 2);
  const top = values[0];
  const scale = Math.max(TINY_SCALE, ...values.map(Math.abs), ...g.map(Math.abs));
  const atTop = values.map((l) => Math.abs(l - top) <= SINGULAR_TOLERANCE * scale);
  const gTop = g.reduce((acc, gi, i) => acc + (atTop[i] ? gi * gi : 0), 0);
  const point = (mu: number) => {
    const x = new Array<number>(k).fill(0);
    values.forEach((l, i) => {
      if (atTop[i] && mu === top) return;
      const c = -g[i] / (l - mu);
      for (let j = 0; j < k; j++) x[j] += c * vectors[i][j];
    });
    return x;
  };
  const norm = (x: readonly number[]) => Math.sqrt(x.reduce((acc, v) => acc + v * v, 0));
  if (gTop <= (SINGULAR_TOLERANCE * scale) ** 2) {
    // Hard case: the radius reached as mu falls to the top eigenvalue is finite.
    const base = point(top);
    const r0 = norm(base);
    if (r0 <= radius) {
      const t = Math.sqrt(radius * radius - r0 * r0);
      const v = vectors[atTop.indexOf(true)];
      return base.map((x, j) => x + t * v[j]);
    }
  }
  const gNorm = Math.sqrt(g.reduce((acc, gi) => acc + gi * gi, 0));
  let lo = top;
  let hi = top + gNorm / radius; // |x(hi)| <= |g| / (hi - top) = radius
  for (let it = 0; it < BISECTIONS && hi - lo > 0; it++) {
    const mid = lo + (hi - lo) / 2;
    if (mid === lo || mid === hi) break;
    if (norm(point(mid)) > radius) lo = mid;
    else hi = mid;
  }
  const x = point(hi);
  const r = norm(x);
  return r > 0 ? x.map((v) => (v * radius) / r) : x;
}

/**
 * The ridge table: for radii RIDGE_STEP, 2 RIDGE_STEP, ... up to maxRadius (the largest distance
 * of a design point from the center), the point of highest or lowest fitted response on that
 * sphere, in coded and real units, with its fit and 95% prediction interval from the model's
 * compiled predictor (an average block). Cost O(k^3 + radii x k^2 x 200).
 * Throws InputError as quadraticSurface does, and for a maxRadius that is not a positive finite
 * number or would give more than 1000 radii.
 * Example: ridgeAnalysis(model, 'max', 1.414).map((p) => p.radius) -> [0.1, 0.2, ..., 1.4].
 */
export function ridgeAnalysis(model: FittedModel, sense: Sense, maxRadius: number): RidgePoint[] {
  if (!Number.isFinite(maxRadius) || maxRadius <= 0) throw new InputError(`A ridge analysis needs a largest radius above 0, got ${maxRadius}`);
  const count = Math.floor(maxRadius / RIDGE_STEP + FLOOR_ROUNDING);
  if (count > 1000) throw new InputError(`A ridge analysis takes up to 1000 radii of ${RIDGE_STEP}, got a largest radius of ${maxRadius}`);
  const surface = quadraticSurface(model);
  const predictor = cachedPredictor(model);
  const out: RidgePoint[] = [];
  for (let i = 1; i <= count; i++) {
    const radius = Number((i * RIDGE_STEP).toFixed(10));
    const coded = ridgePoint(surface, radius, sense);
    const iv = predictor.interval(coded);
    out.push({
      radius,
      coded,
      real: coded.map((c, j) => toReal(surface.factors[j], c) as number),
      fit: iv.fit,
      pi: iv.piLo !== null && iv.piHi !== null ? [iv.piLo, iv.piHi] : null,
    });
  }
  return out;
}
