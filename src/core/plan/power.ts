/**
 * Power of a planned two-level design: will the plan see a main effect of the size that matters?
 *
 * For the planned model (intercept, blocks as in the analysis, the model terms) fitted by least
 * squares in coded units, a coefficient's standard error is sigma sqrt([(X'X)^-1]_jj), and its
 * effect (twice the coefficient) is tested by a two-sided t test with the model's residual
 * degrees of freedom. When the true effect is delta, the statistic is noncentral t with
 * noncentrality (delta / 2) / (sigma sqrt([(X'X)^-1]_jj)), so the power is
 * P(|T| > t(1 - level/2, df)) for that noncentral T (Montgomery, Design and Analysis of
 * Experiments, 8th ed., sections 2.4 and 6.5, from memory; the noncentral t in
 * src/core/dist/noncentral-t.ts). For a balanced +-1 column with Nf factorial runs and numeric
 * center runs the standard error is sigma / sqrt(Nf).
 *
 * Replicates: the plan is made of copies of one replicate (each with its own center runs and,
 * when blocked, its own blocks). The terms' information adjusted for the intercept or the blocks
 * is then r times that of one replicate (every copy has the same mean, and blocks are nested in
 * copies), so with r copies the standard error is the one-copy value over sqrt(r) and the
 * residual degrees of freedom are r n1 - 1 - p unblocked, r n1 - r B - p with B blocks per copy
 * (n1 runs and p model terms per copy). One QR factorisation of one copy serves every r.
 */
import { InputError } from '../errors.ts';
import type { Design } from '../design/design.ts';
import { MAX_RUNS } from '../design/run-limit.ts';
import { noncentralTTwoSided } from '../dist/noncentral-t.ts';
import { tQuantile } from '../dist/student-t.ts';
import { blockLevels, modelColumns, modelMatrix } from '../fit/columns.ts';
import { householderQr } from '../linalg/householder-qr.ts';
import { invertUpper } from '../linalg/triangular.ts';
import { compareTerms, termLetters, termOrder, type Term } from '../model/term.ts';

/** Default significance level of the test (common practice). */
export const DEFAULT_SIGNIFICANCE = 0.05;
/** Default target power (common practice: Cohen 1988, section 2.4, "a power of .80"). */
export const DEFAULT_POWER = 0.8;
/** The smallest effect is found to this relative precision (far finer than any gauge). */
const EFFECT_PRECISION = 1e-10;

export interface PowerRequest {
  /** The effect that matters, delta, in the response's units (the change from low to high). */
  readonly effect: number;
  /** Run-to-run standard deviation sigma, in the response's units. */
  readonly sigma: number;
  /** Significance level of the two-sided t test; default 0.05. */
  readonly significance?: number;
  /** Target power for the smallest effect and the replicates needed; default 0.8. */
  readonly power?: number;
  /** Model terms; default main effects and the two-factor interactions the plan can estimate. */
  readonly terms?: readonly Term[];
}

export interface PlanPower {
  readonly effect: number;
  readonly sigma: number;
  readonly significance: number;
  /** Residual degrees of freedom of the model over the planned runs. */
  readonly residualDf: number;
  /** Power for the least precisely estimated main effect; null when residualDf is 0. */
  readonly power: number | null;
  /** The target power. */
  readonly target: number;
  /** Smallest effect found with the target power by this plan; null when residualDf is 0. */
  readonly smallestEffect: number | null;
  /** Replicates of the plan (copies of one replicate) that reach the target for `effect`; null when over the run limit. */
  readonly replicatesNeeded: number | null;
  /** Standard error of that main effect (twice the coefficient's), in the response's units. */
  readonly standardError: number;
  /** The main effect with the largest standard error (the first when they are equal). */
  readonly mainEffect: Term;
  /** True when every main effect in the model has the same standard error (an orthogonal plan). */
  readonly mainEffectsAlike: boolean;
  /** The model terms used, in model order. */
  readonly terms: readonly Term[];
  /** Runs in the plan and replicates planned. */
  readonly runs: number;
  readonly replicates: number;
}

function positive(v: number, what: string): void {
  if (!(v > 0) || !Number.isFinite(v)) throw new InputError(`${what} must be a number greater than 0, got ${v}`);
}

function probability(v: number, what: string): void {
  if (!(v > 0 && v < 1)) throw new InputError(`${what} must be a probability between 0 and 1 (not 0 or 1), got ${v}`);
}

/** One copy of the plan: the runs of replicate 1 with their blocks. */
function firstCopy(design: Pick<Design, 'runs'>): { coded: (readonly number[])[]; blocks: number[]; copies: number } {
  if (design.runs.length === 0) throw new InputError('A plan needs at least one run to have a power, got none');
  const copies = new Set(design.runs.map((r) => r.replicate)).size;
  const first = design.runs.filter((r) => r.replicate === 1);
  if (first.length * copies !== design.runs.length) {
    throw new InputError(`Every replicate of a plan must have the same runs; replicate 1 has ${first.length} of ${design.runs.length} runs in ${copies} replicates`);
  }
  return { coded: first.map((r) => r.coded), blocks: first.map((r) => r.block), copies };
}

interface CopyModel {
  readonly n1: number;
  readonly blocksPerCopy: number;
  readonly terms: Term[];
  /** [(X'X)^-1]_jj of each term over one copy, in `terms` order. */
  readonly inverseDiagonal: Float64Array;
  /** Terms whose columns are combinations of earlier columns (blocks or terms). */
  readonly aliased: Term[];
}

/** QR of one copy's model matrix; diagonal of (X'X)^-1 from the row norms of R^-1. */
function copyModel(coded: readonly (readonly number[])[], blocks: readonly number[], terms: readonly Term[]): CopyModel {
  const levels = blockLevels(blocks);
  const cols = modelColumns(levels, terms);
  const n = coded.length;
  const p = cols.length;
  const qr = householderQr(modelMatrix(cols, coded, levels.length > 1 ? blocks : null), n, p);
  const fixed = levels.length; // intercept + (levels - 1) block columns come first
  const aliased: Term[] = [];
  for (const j of qr.aliased) {
    if (j < fixed) throw new InputError('The block columns of the plan are not independent of the intercept; the plan is malformed');
    aliased.push(terms[j - fixed]);
  }
  const m = qr.rank;
  const rinv = invertUpper(qr.r, m);
  const kept = Array.from(qr.kept);
  const diag = new Float64Array(terms.length).fill(NaN);
  for (let a = 0; a < m; a++) {
    const j = kept[a];
    if (j < fixed) continue;
    // (R^-1 R^-T)_aa = sum over k >= a of Rinv[a, k]^2 (row a of the upper triangular inverse).
    let s = 0;
    for (let k = a; k < m; k++) s += rinv[k * m + a] ** 2;
    diag[j - fixed] = s;
  }
  return { n1: n, blocksPerCopy: levels.length, terms: [...terms], inverseDiagonal: diag, aliased };
}

/**
 * The default model for a plan's power: every main effect plus each two-factor interaction whose
 * column is not a combination of the columns before it (intercept, blocks, main effects, earlier
 * interactions), i.e. the two-factor interactions the plan can estimate, in model order. A
 * Plackett-Burman plan gets main effects only, the model its analysis fits (its interactions are
 * only partly aliased, and a few of them would make the main effects less precise, not clearer).
 * Cost: one QR of one copy of the plan.
 * Example: a 2^(4-1) with I = ABCD -> A, B, C, D, AB, AC, AD (CD, BD, BC repeat those columns).
 */
export function defaultPowerTerms(design: Pick<Design, 'factors' | 'runs' | 'screening'>): Term[] {
  const k = design.factors.length;
  // Built directly: termsUpToOrder walks all 2^k masks, a third of a second for 23 factors.
  const mains = Array.from({ length: k }, (_, i) => 1 << i);
  if (design.screening !== undefined) return mains;
  const all = [...mains];
  for (let i = 0; i < k; i++) for (let j = i + 1; j < k; j++) all.push((1 << i) | (1 << j));
  all.sort(compareTerms);
  const { coded, blocks } = firstCopy(design);
  const model = copyModel(coded, blocks, all);
  const dropped = new Set(model.aliased);
  return all.filter((t) => termOrder(t) === 1 || !dropped.has(t));
}

/** Residual df and standard-error factor with r copies. */
function atCopies(model: CopyModel, r: number, cjj: number): { df: number; se: number } {
  const p = model.terms.length;
  const df = model.blocksPerCopy > 1 ? r * model.n1 - r * model.blocksPerCopy - p : r * model.n1 - 1 - p;
  return { df, se: Math.sqrt(cjj / r) };
}

function powerAt(effect: number, sigma: number, seFactor: number, df: number, significance: number): number {
  const crit = tQuantile(1 - significance / 2, df);
  return noncentralTTwoSided(crit, df, effect / 2 / (sigma * seFactor));
}

/**
 * Power of a planned design for one main effect of size `effect` (delta, in the response's
 * units), with run-to-run standard deviation `sigma`, by the two-sided t test of the fitted
 * model; at the target power (default 0.8) also the smallest effect the plan finds and the
 * number of replicates of the plan needed for `effect`.
 *
 * Method: one Householder QR of one replicate's model matrix (intercept, blocks, terms) gives
 * c_jj = [(X'X)^-1]_jj; with r replicates the coefficient's standard error is sigma
 * sqrt(c_jj / r) and the residual df are as in the file header; power =
 * P(|T| > t(1 - level/2, df)) for T noncentral t with noncentrality (delta/2) / standard error
 * (noncentralTTwoSided). The main effect with the largest c_jj is reported (for an orthogonal
 * plan every main effect has c_jj = 1/Nf). The smallest effect solves power = target by
 * bisection on the noncentrality (the power rises with it); the replicates needed is the
 * smallest r within the 1024-run limit that reaches the target.
 * Source: Montgomery, Design and Analysis of Experiments, 8th ed., sections 2.4 and 6.5 (from
 * memory); the standard error of a coefficient in least squares is common practice.
 * Cost: one QR of n1 x p (n1 runs per replicate, p columns), then a few dozen noncentral t
 * evaluations for the smallest effect and one per replicate count tried.
 * Throws InputError for an effect or sigma that is not a number > 0, a significance or target
 * power not strictly between 0 and 1, a target not above the significance, a model without main
 * effects, a term on an unknown factor, or a term the plan cannot separate from the others
 * (named with its letters).
 * Example: a 2^3 full factorial with 4 center runs (12 runs), main effects only, effect 2,
 * sigma 1 -> standard error 2/sqrt(8) = 0.707, residual df 8, power 0.698.
 */
export function planPower(design: Pick<Design, 'factors' | 'runs' | 'screening'>, request: PowerRequest): PlanPower {
  const { effect, sigma } = request;
  positive(effect, 'The effect to detect');
  positive(sigma, 'The run-to-run standard deviation (sigma)');
  const significance = request.significance ?? DEFAULT_SIGNIFICANCE;
  const target = request.power ?? DEFAULT_POWER;
  probability(significance, 'The significance level');
  probability(target, 'The target power');
  if (!(target > significance)) {
    throw new InputError(`The target power must be above the significance level (with no effect at all the test already rejects that often); got power ${target} and significance ${significance}`);
  }
  const k = design.factors.length;
  const terms = request.terms ? [...request.terms] : defaultPowerTerms(design);
  for (const t of terms) {
    if (!Number.isInteger(t) || t <= 0 || t >= 2 ** k) throw new InputError(`A model term must be made of the plan's ${k} factors, got term ${t}`);
  }
  const mains = terms.filter((t) => termOrder(t) === 1);
  if (mains.length === 0) throw new InputError('The power is for a main effect, so the model needs at least one main effect; got none');
  const { coded, blocks, copies } = firstCopy(design);
  const model = copyModel(coded, blocks, terms);
  if (model.aliased.length > 0) {
    const names = model.aliased.map((t) => termLetters(t, design.factors));
    throw new InputError(
      `This plan cannot separate ${names.join(', ')} from the blocks or the other terms of the model (${names.length === 1 ? 'its column is a combination' : 'their columns are combinations'} of earlier columns); leave ${names.length === 1 ? 'it' : 'them'} out of the model`,
    );
  }
  let mainEffect = mains[0];
  let cjj = -1;
  for (const t of mains) {
    const c = model.inverseDiagonal[terms.indexOf(t)];
    if (c > cjj * (1 + 1e-12)) {
      cjj = c;
      mainEffect = t;
    }
  }
  const mainEffectsAlike = mains.every((t) => model.inverseDiagonal[terms.indexOf(t)] >= cjj * (1 - 1e-9));
  const planned = atCopies(model, copies, cjj);
  let power: number | null = null;
  let smallestEffect: number | null = null;
  if (planned.df >= 1) {
    power = powerAt(effect, sigma, planned.se, planned.df, significance);
    const crit = tQuantile(1 - significance / 2, planned.df);
    let lo = 0;
    let hi = 1;
    while (noncentralTTwoSided(crit, planned.df, hi) < target) {
      lo = hi;
      hi *= 2;
    }
    while (hi - lo > EFFECT_PRECISION * hi) {
      const mid = 0.5 * (lo + hi);
      if (noncentralTTwoSided(crit, planned.df, mid) < target) lo = mid;
      else hi = mid;
    }
    smallestEffect = 2 * sigma * planned.se * hi;
  }
  let replicatesNeeded: number | null = null;
  for (let r = 1; r * model.n1 <= MAX_RUNS; r++) {
    const at = atCopies(model, r, cjj);
    if (at.df >= 1 && powerAt(effect, sigma, at.se, at.df, significance) >= target) {
      replicatesNeeded = r;
      break;
    }
  }
  return {
    effect,
    sigma,
    significance,
    residualDf: Math.max(planned.df, 0),
    power,
    target,
    smallestEffect,
    replicatesNeeded,
    standardError: 2 * sigma * planned.se,
    mainEffect,
    mainEffectsAlike,
    terms,
    runs: design.runs.length,
    replicates: copies,
  };
}
