/**
 * The setting inside the tested box [-1, 1]^k that maximises the overall desirability D of
 * several fitted responses (Derringer and Suich 1980, Journal of Quality Technology 12,
 * 214-219), found by a bounded local search from a seeded set of starting points: every design
 * point (clipped to the box), every corner of the box, and a grid (5 levels a factor up to 3
 * factors, 3 levels up to 8). The best starts are each improved by a compass search (try a step
 * up and down each numeric factor, keep any gain, halve the step when none; Kolda, Lewis and
 * Torczon 2003, SIAM Review 45, 385-482, section 3, from memory), projected onto the box.
 * Where D is 0 (some response outside its acceptable limits) the search climbs a shortfall score
 * instead, minus the total distance of the predictions from their acceptable ranges (in units of
 * each range), so that it moves toward settings where D can be above 0. A categorical factor
 * keeps the level of its start (corners and the grid carry both levels).
 * D is not concave in general, so the answer is the best found, not a proven optimum; the result
 * says how it was found.
 */
import { InputError } from '../errors.ts';
import { toReal } from '../factor/coding.ts';
import type { Factor } from '../factor/factor.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { cachedPredictor } from '../predict/compiled-predictor.ts';
import { CAUTION } from '../predict/caution.ts';
import { COMPASS_GAIN_MIN, SEARCH_STEP_MIN, SHORTFALL_FLOOR, TIE_TOLERANCE } from '../tolerance.ts';
import { checkDesirability, desirability, overallDesirability, type DesirabilitySpec } from './desirability.ts';

/** Starts improved by the compass search (the best of the seeds). A design choice: cheap, and more never changed the answer in the tests. */
export const SEARCH_STARTS = 12;

/** Most factors for the corner seeds (2^10 corners). A design choice. */
export const MAX_SEARCH_FACTORS = 10;

export interface ResponseDesirability {
  readonly name: string;
  readonly fit: number;
  /** 95% prediction interval for one new run; null when the residual df is 0. */
  readonly pi: readonly [number, number] | null;
  readonly d: number;
}

export interface DesirabilityPoint {
  readonly coded: readonly number[];
  /** Real settings, declared order (a level label for a categorical factor). */
  readonly real: readonly (number | string)[];
  readonly D: number;
  readonly responses: readonly ResponseDesirability[];
}

export interface DesirabilityOptimum extends DesirabilityPoint {
  /** How it was found: seeds tried, starts searched, the kind of start that won, model evaluations. */
  readonly search: {
    readonly seeds: number;
    readonly starts: number;
    readonly bestStart: string;
    readonly evaluations: number;
    readonly method: string;
  };
  readonly notes: readonly string[];
  readonly caution: readonly string[];
}

function check(models: readonly FittedModel[], specs: readonly DesirabilitySpec[]): void {
  if (models.length === 0) throw new InputError('A desirability needs at least one fitted response, got none');
  if (models.length !== specs.length) throw new InputError(`A desirability needs one goal per fitted response (${models.length}), got ${specs.length}`);
  const key = JSON.stringify(models[0].factors);
  for (const m of models) {
    if (JSON.stringify(m.factors) !== key) throw new InputError(`Every response must be fitted with the same factors and coding; ${m.response} differs from ${models[0].response}`);
  }
  specs.forEach(checkDesirability);
}

function realOf(factors: readonly Factor[], coded: readonly number[]): (number | string)[] {
  return coded.map((c, i) => (factors[i].kind === 'numeric' ? Number((toReal(factors[i], c) as number).toPrecision(12)) : toReal(factors[i], c)));
}

/**
 * Each response's fit, interval and d, and the overall D, at coded settings. Cost O(m p^2).
 * Throws InputError for no models, a goal count that differs, models with different factors,
 * bad desirability settings (checkDesirability), or a categorical factor not at -1 or +1.
 * Example: desirabilityAt([yield], [{ name: 'Yield', goal: 'max', low: 78, high: 80 }], [0, 0]).D
 * -> (79.94 - 78) / 2 = 0.97 for Montgomery 8th ed., Example 11.2.
 */
export function desirabilityAt(models: readonly FittedModel[], specs: readonly DesirabilitySpec[], coded: readonly number[]): DesirabilityPoint {
  check(models, specs);
  const factors = models[0].factors;
  if (coded.length !== factors.length) throw new InputError(`A desirability needs one coded setting per factor (${factors.length}), got ${coded.length}`);
  const responses = models.map((m, i) => {
    const iv = cachedPredictor(m).interval(coded);
    return { name: specs[i].name, fit: iv.fit, pi: iv.piLo !== null && iv.piHi !== null ? ([iv.piLo, iv.piHi] as const) : null, d: desirability(specs[i], iv.fit) };
  });
  const D = overallDesirability(responses.map((r) => r.d), specs.map((s) => s.weight ?? 1));
  return { coded: [...coded], real: realOf(factors, coded), D, responses };
}

/** How far a prediction is from where its d is above 0, in units of its acceptable range. */
function shortfall(s: DesirabilitySpec, y: number): number {
  const span = s.high - s.low;
  if (s.goal === 'max') return y > s.low ? 0 : (s.low - y) / span;
  if (s.goal === 'min') return y < s.high ? 0 : (y - s.high) / span;
  return y < s.low ? (s.low - y) / span : y > s.high ? (y - s.high) / span : 0;
}

/**
 * The setting in the tested box with the highest overall desirability found by the seeded
 * bounded local search of the file comment, with each response's prediction, 95% prediction
 * interval and d there, how it was found, and the standing caution. `designPoints` are the
 * coded settings of the runs (seeds). Cost O((seeds + starts x iterations x 2k) x m p).
 * Throws InputError as desirabilityAt does, and for more than MAX_SEARCH_FACTORS factors.
 * Example: with one response to maximise, the result is that response's best point in the box.
 */
export function maximizeDesirability(
  models: readonly FittedModel[],
  specs: readonly DesirabilitySpec[],
  designPoints: readonly (readonly number[])[] = [],
): DesirabilityOptimum {
  check(models, specs);
  const factors = models[0].factors;
  const k = factors.length;
  if (k > MAX_SEARCH_FACTORS) throw new InputError(`The desirability search takes up to ${MAX_SEARCH_FACTORS} factors, got ${k}`);
  const numeric = factors.map((f, i) => (f.kind === 'numeric' ? i : -1)).filter((i) => i >= 0);
  const predictors = models.map((m) => cachedPredictor(m));
  const weights = specs.map((s) => s.weight ?? 1);
  let evaluations = 0;
  const score = (x: readonly number[]): number => {
    evaluations++;
    let sumW = 0;
    let logSum = 0;
    let short = 0;
    for (let i = 0; i < predictors.length; i++) {
      const y = predictors[i].fit(x);
      const d = desirability(specs[i], y);
      if (d === 0) short += shortfall(specs[i], y) + SHORTFALL_FLOOR;
      else logSum += weights[i] * Math.log(d);
      sumW += weights[i];
    }
    return short > 0 ? -short : Math.exp(logSum / sumW);
  };

  // Seeds.
  const seeds: { x: number[]; from: string }[] = [];
  designPoints.forEach((p, i) => {
    if (p.length !== k) throw new InputError(`Design point ${i + 1} needs ${k} coded settings, got ${p.length}`);
    seeds.push({ x: p.map((v, j) => (factors[j].kind === 'numeric' ? Math.max(-1, Math.min(1, v)) : v < 0 ? -1 : 1)), from: `design point ${i + 1}` });
  });
  for (let c = 0; c < 2 ** k; c++) seeds.push({ x: Array.from({ length: k }, (_, j) => ((c >> j) & 1 ? 1 : -1)), from: 'a corner of the box' });
  const levels = numeric.length <= 3 ? 5 : numeric.length <= 8 ? 3 : 0;
  if (levels > 0) {
    const cats = k - numeric.length;
    for (let g = 0; g < levels ** numeric.length; g++) {
      for (let c = 0; c < 2 ** cats; c++) {
        const x = new Array<number>(k).fill(0);
        let rest = g;
        let ci = 0;
        for (let j = 0; j < k; j++) {
          if (factors[j].kind === 'numeric') {
            x[j] = -1 + (2 * (rest % levels)) / (levels - 1);
            rest = Math.floor(rest / levels);
          } else x[j] = (c >> ci++) & 1 ? 1 : -1;
        }
        seeds.push({ x, from: `the ${levels}-level grid` });
      }
    }
  }
  const scored = seeds.map((s) => ({ ...s, v: score(s.x) })).sort((a, b) => b.v - a.v);
  const starts = scored.slice(0, SEARCH_STARTS);

  let best = starts[0];
  for (const start of starts) {
    const x = [...start.x];
    let v = start.v;
    for (let step = 0.25; step >= SEARCH_STEP_MIN; ) {
      let moved = false;
      for (const j of numeric) {
        for (const sgn of [1, -1]) {
          const old = x[j];
          const nx = Math.max(-1, Math.min(1, old + sgn * step));
          if (nx === old) continue;
          x[j] = nx;
          const nv = score(x);
          if (nv > v + COMPASS_GAIN_MIN) {
            v = nv;
            moved = true;
            break;
          }
          x[j] = old;
        }
      }
      if (!moved) step /= 2;
    }
    const dist = (p: readonly number[]) => p.reduce((a, e) => a + e * e, 0);
    if (v > best.v + TIE_TOLERANCE || (Math.abs(v - best.v) <= TIE_TOLERANCE && dist(x) < dist(best.x))) best = { x, from: start.from, v };
  }
  const point = desirabilityAt(models, specs, best.x.map((e) => e + 0));
  const notes: string[] = [];
  if (point.D === 0) notes.push('No setting found inside the tested box gives every response a value inside its acceptable limits (D = 0): the point shown comes nearest; widen a limit or change a goal.');
  notes.push('The search is local from many starts: the best D found, not a proven optimum.');
  return {
    ...point,
    search: {
      seeds: seeds.length,
      starts: starts.length,
      bestStart: best.from,
      evaluations,
      method: `compass search inside the box from the best ${starts.length} of ${seeds.length} seeds (design points, corners${levels > 0 ? `, a ${levels}-level grid` : ''})`,
    },
    notes,
    caution: CAUTION,
  };
}
