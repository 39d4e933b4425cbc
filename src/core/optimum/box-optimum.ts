/**
 * The best setting of a quadratic surface y-hat = b0 + x'b + x'Bx inside the tested box
 * [-1, 1]^k (coded units). For the highest or lowest value the answer is exact: the optimum of a
 * smooth function over a box lies at the stationary point of the function restricted to one
 * face of the box (the interior, a facet, an edge, ... or a vertex), where each coordinate is
 * either free or held at -1 or +1; every one of the 3^k faces is tried, its restricted
 * stationary point solved from 2 B_FF x_F = -(b_F + 2 B_FC x_C), kept when it lies in the box,
 * and the best kept point wins (Karush-Kuhn-Tucker conditions for bound constraints; Nocedal and
 * Wright, Numerical Optimization, 2nd ed., section 12.3, from memory). A face whose B_FF is
 * singular takes its stationary point of least length (the pseudo-inverse), so that a flat
 * direction gives the point nearest the center; when it has none, its extreme lies on one of its
 * own sub-faces, which are tried in their turn.
 * For a target T the point sought is the one with the smallest |y-hat - T|, ties broken by the
 * point nearest the center: when T lies outside the box's range of y-hat, that is the box
 * maximum (or minimum); otherwise it is the nearest point of the contour y-hat = T. Within
 * radius 1 that point is a ridge point (Draper 1963), found by scanning the ridge and bisecting
 * its first crossing; beyond radius 1 it is searched along rays from the center (on each ray
 * y-hat is a quadratic in the distance, solved exactly) from many directions, each refined by a
 * compass search, so there it is the best found.
 */
import { InputError } from '../errors.ts';
import { solveDense } from '../linalg/dense-solve.ts';
import { symmetricEigen } from '../linalg/symmetric-eigen.ts';
import {
  COMPASS_GAIN_MIN,
  INCONSISTENCY_TOLERANCE,
  NEGLIGIBLE_QUADRATIC,
  RAY_STEP_MIN,
  SETTING_TOLERANCE,
  SINGULAR_TOLERANCE,
  TIE_TOLERANCE,
  TINY_SCALE,
} from '../tolerance.ts';
import { pcg32 } from '../design/random.ts';
import { surfaceValue, type QuadraticSurface } from './quadratic-surface.ts';
import { ridgePoint } from './ridge-analysis.ts';

/** The goal of one response: highest, lowest, or nearest a target value. */
export type Goal = { readonly kind: 'max' } | { readonly kind: 'min' } | { readonly kind: 'target'; readonly target: number };

/** Most factors for the exact face search: 3^10 = 59049 small solves (under a second). A design choice. */
export const MAX_BOX_FACTORS = 10;

/** Steps of the ridge scan out to radius 1 when seeking a target (a design choice: 0.01 coded). */
export const RIDGE_SCAN = 100;
/** Random directions, their PCG32 seed, and the best rays refined, when the target lies beyond radius 1 (design choices). */
export const RAY_DIRECTIONS = 256;
export const RAY_SEED = 2024;
export const RAY_STARTS = 12;

export interface BoxOptimum {
  readonly coded: readonly number[];
  readonly fit: number;
  /** How the point was found, in plain words. */
  readonly method: string;
}

function distance2(x: readonly number[]): number {
  return x.reduce((s, v) => s + v * v, 0);
}

/**
 * For a singular symmetric system: the solution of least length, through the eigen-decomposition
 * (the pseudo-inverse), or null when the system has no solution. On a face where the surface is
 * flat along some direction, this is the stationary point nearest the center.
 */
function minimumNormSolution(a: number[][], rhs: number[]): number[] | null {
  const { values, vectors } = symmetricEigen(a);
  const most = Math.max(...values.map(Math.abs));
  const scale = Math.max(TINY_SCALE, most, ...rhs.map(Math.abs));
  const x = new Array<number>(rhs.length).fill(0);
  for (let i = 0; i < values.length; i++) {
    const proj = vectors[i].reduce((acc, v, j) => acc + v * rhs[j], 0);
    if (Math.abs(values[i]) <= SINGULAR_TOLERANCE * Math.max(most, TINY_SCALE)) {
      if (Math.abs(proj) > INCONSISTENCY_TOLERANCE * scale) return null; // inconsistent: the face has no stationary point
      continue;
    }
    for (let j = 0; j < x.length; j++) x[j] += (proj / values[i]) * vectors[i][j];
  }
  return x;
}

/** Candidates: the restricted stationary point of every face of the box that lies in the box. */
function faceCandidates(s: QuadraticSurface): number[][] {
  const k = s.b.length;
  const out: number[][] = [];
  const state = new Array<number>(k).fill(0); // 0 free, 1 at -1, 2 at +1
  for (let code = 0; code < 3 ** k; code++) {
    let c = code;
    for (let i = 0; i < k; i++) {
      state[i] = c % 3;
      c = Math.floor(c / 3);
    }
    const free = state.map((v, i) => (v === 0 ? i : -1)).filter((i) => i >= 0);
    const x: number[] = state.map((v) => (v === 1 ? -1 : v === 2 ? 1 : 0));
    if (free.length > 0) {
      const a = free.map((i) => free.map((j) => 2 * s.B[i][j]));
      const rhs = free.map((i) => {
        let r = -s.b[i];
        for (let j = 0; j < k; j++) if (state[j] !== 0) r -= 2 * s.B[i][j] * x[j];
        return r;
      });
      const sol = solveDense(a, rhs) ?? minimumNormSolution(a, rhs);
      if (!sol || sol.some((v) => Math.abs(v) > 1 + SETTING_TOLERANCE)) continue;
      free.forEach((i, j) => (x[i] = Math.max(-1, Math.min(1, sol[j])) + 0));
    }
    out.push(x);
  }
  return out;
}

function checkSurface(s: QuadraticSurface): void {
  const k = s.b.length;
  if (k === 0) throw new InputError('A best setting needs at least one factor, got none');
  if (k > MAX_BOX_FACTORS) throw new InputError(`The exact search over the box checks 3^k faces and takes up to ${MAX_BOX_FACTORS} factors, got ${k}`);
}

/**
 * The highest ('max') or lowest ('min') value of the surface in [-1, 1]^k, exact (see the file
 * comment); among equal values (within TIE_TOLERANCE relative) the point nearest the center.
 * Cost O(3^k k^3). Throws InputError for no factors or more than MAX_BOX_FACTORS.
 * Example: for y = x1 - x1^2 - x2^2 the maximum is at (0.5, 0) with 0.25; for the saddle
 * y = x1^2 - x2^2 it is at (+-1, 0) with 1.
 */
export function boxExtreme(s: QuadraticSurface, sense: 'max' | 'min'): BoxOptimum {
  checkSurface(s);
  const sign = sense === 'max' ? 1 : -1;
  let best: number[] | null = null;
  let bestValue = -Infinity;
  for (const x of faceCandidates(s)) {
    const v = sign * surfaceValue(s, x);
    const tie = Math.abs(v - bestValue) <= TIE_TOLERANCE * Math.max(1, Math.abs(v));
    if ((v > bestValue && !tie) || (tie && best !== null && distance2(x) < distance2(best))) {
      best = x;
      bestValue = v;
    }
  }
  return { coded: best!, fit: surfaceValue(s, best!), method: `exact: the restricted stationary point of each of the 3^${s.b.length} faces of the box` };
}

/** Smallest t in [0, tMax] with a + b t + c t^2 = 0, or null. */
function firstRoot(a: number, b: number, c: number, tMax: number): number | null {
  if (a === 0) return 0;
  const roots: number[] = [];
  if (Math.abs(c) <= NEGLIGIBLE_QUADRATIC * (Math.abs(a) + Math.abs(b))) {
    if (b !== 0) roots.push(-a / b);
  } else {
    const disc = b * b - 4 * a * c;
    if (disc < 0) return null;
    const q = -(b + (b >= 0 ? 1 : -1) * Math.sqrt(disc)) / 2; // stable quadratic formula
    roots.push(q / c);
    if (q !== 0) roots.push(a / q);
  }
  const ok = roots.filter((t) => t >= 0 && t <= tMax * (1 + SETTING_TOLERANCE)).sort((p, q) => p - q);
  return ok.length > 0 ? Math.min(ok[0], tMax) : null;
}

/** Distance from the center along unit direction d to the contour y-hat = T inside the box, or Infinity. */
function rayDistance(s: QuadraticSurface, target: number, d: readonly number[]): number {
  const k = d.length;
  let bd = 0;
  let dbd = 0;
  let most = 0;
  for (let i = 0; i < k; i++) {
    bd += s.b[i] * d[i];
    most = Math.max(most, Math.abs(d[i]));
    for (let j = 0; j < k; j++) dbd += d[i] * s.B[i][j] * d[j];
  }
  const t = firstRoot(s.b0 - target, bd, dbd, 1 / most);
  return t === null ? Infinity : t;
}

function unit(v: readonly number[]): number[] | null {
  const n = Math.sqrt(distance2(v));
  return n > 0 ? v.map((x) => x / n) : null;
}

/**
 * The point of the box with the smallest |y-hat - T|, ties broken by the point nearest the
 * center (see the file comment). Cost O(3^k k^3) for the box range, O(160 k^3) for the ridge
 * scan, and beyond radius 1 O((2k + 2^k + 261) k^2) for the rays plus their refinement.
 * Throws InputError for a target that is not finite, no factors, or more than MAX_BOX_FACTORS.
 * Example: for y = x1 and T = 0.5 the answer is (0.5, 0); for T = 2 it is (1, 0) with fit 1.
 */
export function boxTarget(s: QuadraticSurface, target: number): BoxOptimum {
  if (!Number.isFinite(target)) throw new InputError(`A target must be a finite number, got ${target}`);
  const hi = boxExtreme(s, 'max');
  const lo = boxExtreme(s, 'min');
  if (target >= hi.fit) return { ...hi, method: `the target ${target} is at or above the highest fitted value in the box; ${hi.method}` };
  if (target <= lo.fit) return { ...lo, method: `the target ${target} is at or below the lowest fitted value in the box; ${lo.method}` };
  const k = s.b.length;
  if (s.b0 === target) return { coded: new Array<number>(k).fill(0), fit: target, method: 'the center reaches the target' };
  // Inside the unit ball (which lies inside the box) the nearest point of the contour is a ridge
  // point: every nearer point is on the center's side of the target, so the contour point is the
  // lowest (or highest) point of its sphere. Scan the ridge for its first crossing, then bisect.
  const sense = target < s.b0 ? 'min' : 'max';
  const beyond = (r: number) => (sense === 'min' ? surfaceValue(s, ridgePoint(s, r, sense)) <= target : surfaceValue(s, ridgePoint(s, r, sense)) >= target);
  for (let i = 1; i <= RIDGE_SCAN; i++) {
    const r = i / RIDGE_SCAN;
    if (!beyond(r)) continue;
    let lo = (i - 1) / RIDGE_SCAN;
    let hi = r;
    for (let it = 0; it < 60; it++) {
      const mid = (lo + hi) / 2;
      if (beyond(mid)) hi = mid;
      else lo = mid;
    }
    const x = ridgePoint(s, hi, sense).map((v) => v + 0);
    return { coded: x, fit: surfaceValue(s, x), method: 'the nearest point to the center on the contour at the target: the first point of the ridge analysis that reaches it' };
  }
  // Beyond the unit ball the box cuts the spheres: search along rays from the center (exact on
  // each ray), from many directions, each refined by a compass search over the direction.
  const seeds: number[][] = [];
  for (let i = 0; i < k; i++) for (const sgn of [-1, 1]) seeds.push(Array.from({ length: k }, (_, j) => (j === i ? sgn : 0)));
  for (let c = 0; c < 2 ** k; c++) seeds.push(Array.from({ length: k }, (_, j) => ((c >> j) & 1 ? 1 : -1)));
  for (const v of [s.b, s.b.map((x) => -x), hi.coded, lo.coded, ridgePoint(s, 1, sense)]) {
    const u = unit(v);
    if (u) seeds.push(u);
  }
  const rng = pcg32(RAY_SEED);
  for (let i = 0; i < RAY_DIRECTIONS; i++) {
    const u = unit(Array.from({ length: k }, () => rng.next() / 2 ** 31 - 1));
    if (u) seeds.push(u);
  }
  let bestD: number[] | null = null;
  let bestT = Infinity;
  const ranked = seeds.map((d) => unit(d)!).map((d) => ({ d, t: rayDistance(s, target, d) })).filter((r) => Number.isFinite(r.t)).sort((a, b) => a.t - b.t);
  for (const start of ranked.slice(0, RAY_STARTS)) {
    let d = start.d;
    let t = start.t;
    for (let step = 0.25; step > RAY_STEP_MIN; ) {
      let moved = false;
      for (let i = 0; i < k && !moved; i++) {
        for (const sgn of [-1, 1]) {
          const trial = unit(d.map((v, j) => (j === i ? v + sgn * step : v)));
          if (!trial) continue;
          const tt = rayDistance(s, target, trial);
          if (tt < t - COMPASS_GAIN_MIN) {
            d = trial;
            t = tt;
            moved = true;
            break;
          }
        }
      }
      if (!moved) step /= 2;
    }
    if (t < bestT) {
      bestT = t;
      bestD = d;
    }
  }
  const x = bestD!.map((v) => Math.max(-1, Math.min(1, v * bestT)) + 0);
  return {
    coded: x,
    fit: surfaceValue(s, x),
    method: 'the nearest point to the center on the contour at the target found outside the unit ball: exact along each ray from the center, from many directions refined by a compass search (the best found)',
  };
}

/**
 * The best setting in the box for a goal: boxExtreme for 'max' and 'min', boxTarget for a
 * target. Same cost and throws as those. Example: boxOptimum(s, { kind: 'max' }).coded.
 */
export function boxOptimum(s: QuadraticSurface, goal: Goal): BoxOptimum {
  return goal.kind === 'target' ? boxTarget(s, goal.target) : boxExtreme(s, goal.kind);
}
