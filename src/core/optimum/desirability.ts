/**
 * Desirability functions (Derringer and Suich 1980, "Simultaneous optimization of several
 * response variables", Journal of Quality Technology 12, 214-219): each response's prediction y
 * is turned into d in [0, 1] by its goal and acceptable limits, and the overall desirability is
 * the weighted geometric mean D = (prod d_i^w_i)^(1 / sum w_i).
 * - maximise: d = 0 for y <= LOW, ((y - LOW) / (HIGH - LOW))^r between, 1 for y >= HIGH;
 * - minimise: d = 1 for y <= LOW, ((HIGH - y) / (HIGH - LOW))^r between, 0 for y >= HIGH;
 * - target T (LOW < T < HIGH): ((y - LOW) / (T - LOW))^s from LOW to T, ((HIGH - y) / (HIGH - T))^t
 *   from T to HIGH, 0 outside [LOW, HIGH].
 * The shape exponents r, s, t and the weights w default to 1.
 */
import { InputError } from '../errors.ts';

export interface DesirabilitySpec {
  readonly name: string;
  readonly goal: 'max' | 'min' | 'target';
  readonly low: number;
  readonly high: number;
  /** The target, for goal 'target' only. */
  readonly target?: number;
  /** Importance weight w, above 0; default 1. */
  readonly weight?: number;
  /** Shape r (max, min); default 1. */
  readonly r?: number;
  /** Shapes s (below the target) and t (above); default 1. */
  readonly s?: number;
  readonly t?: number;
}

function positive(v: number | undefined, what: string, name: string): void {
  if (v !== undefined && !(Number.isFinite(v) && v > 0)) throw new InputError(`${name}: ${what} must be a number above 0, got ${v}`);
}

/**
 * Checks one response's desirability settings. Throws InputError, naming the response, for
 * limits that are not finite or not in order (LOW < HIGH; LOW < T < HIGH for a target), a target
 * without goal 'target' or missing with it, a shape or weight that is not above 0, or shapes s
 * and t given for a goal that has r (or r for a target).
 * Example: checkDesirability({ name: 'Y', goal: 'max', low: 60, high: 50 }) throws
 * 'Y: needs LOW below HIGH, got 60 and 50'.
 */
export function checkDesirability(d: DesirabilitySpec): void {
  const n = d.name;
  if (!['max', 'min', 'target'].includes(d.goal)) throw new InputError(`${n}: the goal is max, min or target, got "${String(d.goal)}"`);
  if (!Number.isFinite(d.low) || !Number.isFinite(d.high)) throw new InputError(`${n}: LOW and HIGH must be finite numbers, got ${d.low} and ${d.high}`);
  if (!(d.low < d.high)) throw new InputError(`${n}: needs LOW below HIGH, got ${d.low} and ${d.high}`);
  if (d.goal === 'target') {
    if (d.target === undefined || !Number.isFinite(d.target)) throw new InputError(`${n}: a target goal needs a finite target T, got ${d.target}`);
    if (!(d.low < d.target && d.target < d.high)) throw new InputError(`${n}: needs LOW < T < HIGH, got ${d.low}, ${d.target} and ${d.high}`);
    if (d.r !== undefined) throw new InputError(`${n}: a target takes the shapes s (below T) and t (above T), not r`);
  } else {
    if (d.target !== undefined) throw new InputError(`${n}: a target value needs the goal "target", got goal ${d.goal}`);
    if (d.s !== undefined || d.t !== undefined) throw new InputError(`${n}: ${d.goal === 'max' ? 'maximise' : 'minimise'} takes the shape r, not s or t`);
  }
  positive(d.weight, 'the weight', n);
  positive(d.r, 'the shape r', n);
  positive(d.s, 'the shape s', n);
  positive(d.t, 'the shape t', n);
}

/**
 * The individual desirability d of a prediction y (Derringer and Suich 1980; see the file
 * comment). Assumes checked settings (checkDesirability). Cost O(1).
 * Throws InputError for a y that is not finite.
 * Example: desirability({ name: 'Y', goal: 'max', low: 60, high: 75 }, 67.5) -> 0.5.
 */
export function desirability(d: DesirabilitySpec, y: number): number {
  if (!Number.isFinite(y)) throw new InputError(`${d.name}: a desirability needs a finite prediction, got ${y}`);
  if (d.goal === 'max') {
    if (y <= d.low) return 0;
    if (y >= d.high) return 1;
    return ((y - d.low) / (d.high - d.low)) ** (d.r ?? 1);
  }
  if (d.goal === 'min') {
    if (y <= d.low) return 1;
    if (y >= d.high) return 0;
    return ((d.high - y) / (d.high - d.low)) ** (d.r ?? 1);
  }
  const T = d.target!;
  if (y < d.low || y > d.high) return 0;
  if (y <= T) return ((y - d.low) / (T - d.low)) ** (d.s ?? 1);
  return ((d.high - y) / (d.high - T)) ** (d.t ?? 1);
}

/**
 * The overall desirability D = (prod d_i^w_i)^(1 / sum w_i), the weighted geometric mean
 * (Derringer and Suich 1980, Eq. 1 with weights; the weighted form as commonly used, from
 * memory). D = 0 when any d_i is 0. Cost O(m).
 * Throws InputError for no responses, a count mismatch, a d outside [0, 1] or a weight not above 0.
 * Example: overallDesirability([0.25, 1], [1, 1]) -> 0.5.
 */
export function overallDesirability(ds: readonly number[], weights: readonly number[]): number {
  if (ds.length === 0) throw new InputError('An overall desirability needs at least one response, got none');
  if (weights.length !== ds.length) throw new InputError(`An overall desirability needs one weight per response (${ds.length}), got ${weights.length}`);
  let sumW = 0;
  let logSum = 0;
  for (let i = 0; i < ds.length; i++) {
    const d = ds[i];
    const w = weights[i];
    if (!(d >= 0 && d <= 1)) throw new InputError(`A desirability lies between 0 and 1, got ${d} for response ${i + 1}`);
    if (!(Number.isFinite(w) && w > 0)) throw new InputError(`A weight must be a number above 0, got ${w} for response ${i + 1}`);
    if (d === 0) return 0;
    sumW += w;
    logSum += w * Math.log(d);
  }
  return Math.exp(logSum / sumW);
}
