/**
 * A fitted model prepared once for many predictions: the terms (factor masks, and which are
 * squares), their coefficients, the
 * unscaled covariance over the intercept and the terms (block columns are 0 for an average
 * block, so they drop out), sigma and the t quantile. Each call then evaluates the model columns
 * into a reused buffer and allocates nothing (unless asked for a fresh result object).
 */
import { tQuantile } from '../dist/student-t.ts';
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';
import type { FittedModel } from '../fit/analysis.ts';
import { tIntervals } from '../fit/t-intervals.ts';
import { checkTerms, isSquare, termColumnFactors, termMask, termOrder } from '../model/term.ts';

/**
 * Off-diagonal entries of (X'X)^-1 below this fraction of sqrt(C_ii C_jj) are rounding, so the
 * covariance is treated as diagonal (an orthogonal design). Common practice; far below any
 * real correlation between two estimates.
 */
export const DIAGONAL_TOLERANCE = 1e-12;

/** Fit, standard error and the two intervals at one point; null where the runs cannot give it. */
export interface PointInterval {
  fit: number;
  se: number | null;
  ciLo: number | null;
  ciHi: number | null;
  piLo: number | null;
  piHi: number | null;
}

export interface CompiledPredictor {
  readonly response: string;
  readonly factors: readonly Factor[];
  /** Confidence level of the intervals (0.95 unless asked). */
  readonly level: number;
  readonly sigma: number | null;
  readonly dfResidual: number;
  /** t_{1-(1-level)/2, df}; null when the residual df is 0. */
  readonly tValue: number | null;
  /** True when (X'X)^-1 over the intercept and terms is diagonal, so x0'Cx0 costs O(p). */
  readonly diagonal: boolean;
  /** Fitted value at coded settings (one per factor, declared order). */
  fit(coded: ArrayLike<number>): number;
  /** x0' (X'X)^-1 x0 at coded settings: the squared standard error of the fit over sigma^2. */
  varianceFactor(coded: ArrayLike<number>): number;
  /** Fit, se, confidence and prediction intervals; fills `out` when given, else a new object. */
  interval(coded: ArrayLike<number>, out?: PointInterval): PointInterval;
}

class Compiled implements CompiledPredictor {
  readonly response: string;
  readonly factors: readonly Factor[];
  readonly level: number;
  readonly sigma: number | null;
  readonly dfResidual: number;
  readonly tValue: number | null;
  readonly diagonal: boolean;
  private readonly k: number;
  private readonly m: number;
  /** factor mask of each term (a square's single factor) */
  private readonly masks: Int32Array;
  /** 1 where the term is a square (its column is the table entry squared) */
  private readonly squares: Uint8Array;
  private readonly hasSquares: boolean;
  /** coefficients over [intercept, terms...] */
  private readonly b: Float64Array;
  /** diagonal of C over [intercept, terms...] */
  private readonly d: Float64Array;
  /** strictly upper triangle of C, row by row (i < j), times 2; empty when diagonal */
  private readonly upper2: Float64Array;
  /** model column values at the last point */
  private readonly v: Float64Array;
  /** subset-product table (2^k entries) when that is cheaper than term by term, else null */
  private readonly table: Float64Array | null;
  private readonly lowBit: Int8Array | null;
  /** factor indices of each term with repeats (A^2 -> 0, 0), flattened, with start offsets (term-by-term path) */
  private readonly idx: Int32Array;
  private readonly start: Int32Array;

  constructor(model: FittedModel, level: number) {
    const k = model.factors.length;
    const nt = model.terms.length;
    const nb = model.blockColumns;
    const mf = 1 + nb + nt;
    if (k === 0) throw new InputError('A prediction needs a model with at least one factor, got none');
    if (!Number.isInteger(nb) || nb < 0) throw new InputError(`The model's block columns must be a whole number of 0 or more, got ${nb}`);
    if (model.coef.length !== mf) {
      throw new InputError(`The model needs ${mf} coefficients (intercept, ${nb} block, ${nt} terms), got ${model.coef.length}`);
    }
    if (model.covUnscaled.length !== mf * mf) throw new InputError(`The model needs a ${mf} x ${mf} covariance, got ${model.covUnscaled.length} entries`);
    if (!(level > 0 && level < 1)) throw new InputError(`The confidence level must lie between 0 and 1, got ${level}`);
    checkTerms(model.terms, model.factors);
    for (let j = 0; j < mf; j++) {
      if (!Number.isFinite(model.coef[j])) throw new InputError(`The model's coefficient ${j + 1} must be a finite number, got ${model.coef[j]}`);
    }
    this.response = model.response;
    this.factors = model.factors;
    this.level = level;
    this.dfResidual = model.dfResidual;
    this.sigma = model.dfResidual > 0 ? model.sigma : null;
    this.tValue = this.sigma !== null && model.dfResidual > 0 ? tQuantile(1 - (1 - level) / 2, model.dfResidual) : null;
    this.k = k;
    const m = 1 + nt;
    this.m = m;
    this.masks = Int32Array.from(model.terms, termMask);
    this.squares = Uint8Array.from(model.terms, (t) => (isSquare(t) ? 1 : 0));
    this.hasSquares = this.squares.includes(1);
    // Local column a -> model column: 0 -> 0 (intercept), 1 + j -> 1 + nb + j (term j).
    const col = (a: number) => (a === 0 ? 0 : nb + a);
    this.b = new Float64Array(m);
    this.d = new Float64Array(m);
    for (let a = 0; a < m; a++) {
      this.b[a] = model.coef[col(a)];
      this.d[a] = model.covUnscaled[col(a) * mf + col(a)];
    }
    let diagonal = true;
    for (let a = 0; a < m && diagonal; a++) {
      for (let c = a + 1; c < m; c++) {
        const off = model.covUnscaled[col(c) * mf + col(a)];
        if (Math.abs(off) > DIAGONAL_TOLERANCE * Math.sqrt(Math.abs(this.d[a] * this.d[c]))) {
          diagonal = false;
          break;
        }
      }
    }
    this.diagonal = diagonal;
    this.upper2 = new Float64Array(diagonal ? 0 : (m * (m - 1)) / 2);
    if (!diagonal) {
      let p = 0;
      for (let a = 0; a < m; a++) for (let c = a + 1; c < m; c++) this.upper2[p++] = 2 * model.covUnscaled[col(c) * mf + col(a)];
    }
    this.v = new Float64Array(m);
    this.v[0] = 1;
    let totalOrder = 0;
    for (const t of model.terms) totalOrder += termOrder(t);
    const size = 2 ** k;
    if (k <= 16 && size <= 2 * totalOrder + 8) {
      this.table = new Float64Array(size);
      this.lowBit = new Int8Array(size);
      for (let s = 1; s < size; s++) this.lowBit[s] = 31 - Math.clz32(s & -s);
      this.idx = new Int32Array(0);
      this.start = new Int32Array(0);
    } else {
      this.table = null;
      this.lowBit = null;
      this.idx = new Int32Array(totalOrder);
      this.start = new Int32Array(nt + 1);
      let p = 0;
      for (let j = 0; j < nt; j++) {
        this.start[j] = p;
        for (const i of termColumnFactors(model.terms[j])) this.idx[p++] = i;
      }
      this.start[nt] = p;
    }
  }

  /** Fills v with the model columns at x and returns the fitted value. */
  private columns(x: ArrayLike<number>): number {
    if (x.length !== this.k) throw new InputError(`A prediction needs ${this.k} coded settings (one per factor), got ${x.length}`);
    const v = this.v;
    const b = this.b;
    const nt = this.m - 1;
    let fit = b[0];
    const table = this.table;
    if (table !== null) {
      const low = this.lowBit!;
      table[0] = 1;
      for (let s = 1; s < table.length; s++) table[s] = table[s & (s - 1)] * x[low[s]];
      const masks = this.masks;
      if (!this.hasSquares) {
        for (let j = 0; j < nt; j++) {
          const val = table[masks[j]];
          v[j + 1] = val;
          fit += b[j + 1] * val;
        }
      } else {
        const sq = this.squares;
        for (let j = 0; j < nt; j++) {
          const t = table[masks[j]];
          const val = sq[j] === 1 ? t * t : t;
          v[j + 1] = val;
          fit += b[j + 1] * val;
        }
      }
    } else {
      const idx = this.idx;
      const start = this.start;
      for (let j = 0; j < nt; j++) {
        let val = 1;
        for (let p = start[j]; p < start[j + 1]; p++) val *= x[idx[p]];
        v[j + 1] = val;
        fit += b[j + 1] * val;
      }
    }
    return fit;
  }

  private quadratic(): number {
    const v = this.v;
    const d = this.d;
    const m = this.m;
    let q = 0;
    if (this.diagonal) {
      for (let a = 0; a < m; a++) q += d[a] * v[a] * v[a];
    } else {
      const u = this.upper2;
      let p = 0;
      for (let a = 0; a < m; a++) {
        const va = v[a];
        let s = d[a] * va;
        for (let c = a + 1; c < m; c++) s += u[p++] * v[c];
        q += va * s;
      }
    }
    return q > 0 ? q : 0;
  }

  fit(x: ArrayLike<number>): number {
    return this.columns(x);
  }

  varianceFactor(x: ArrayLike<number>): number {
    this.columns(x);
    return this.quadratic();
  }

  interval(x: ArrayLike<number>, out?: PointInterval): PointInterval {
    const fit = this.columns(x);
    const r = out ?? { fit: 0, se: null, ciLo: null, ciHi: null, piLo: null, piHi: null };
    r.fit = fit;
    return tIntervals(fit, this.sigma === null || this.tValue === null ? 0 : this.quadratic(), this.sigma, this.tValue, r);
  }
}

/**
 * Prepares a fitted model for fast predictions at coded settings x0 (one value per factor).
 * Method: x0 holds 1 for the intercept and, for each term, the product of its factors' coded
 * values or, for a square, the factor's coded value squared (block columns are 0: an average
 * block); fit = b'x0; se_fit = sigma sqrt(x0' C x0) with
 * C = (X'X)^-1; the intervals by tIntervals (fit/t-intervals.ts): the 100(1-a)% confidence interval for the mean response is fit +- t_{a/2,df}
 * se_fit and the prediction interval for one new run is fit +- t_{a/2,df} sigma sqrt(1 + x0' C x0)
 * (Montgomery, Design and Analysis of Experiments, 8th ed., section 10.6, Eqs. 10.39-10.41;
 * Montgomery section 10.5 for the mean response). With residual df 0 sigma is unknown and the
 * intervals are null.
 * Cost: compile O(p^2) with p = 1 + terms; each call O(p + sum of term orders) for the fit (or
 * O(2^k) by a subset-product table when that is cheaper) and O(p) for x0'Cx0 when C is diagonal
 * (orthogonal designs), else p(p+1)/2 multiply-adds. A call allocates nothing when `out` is given.
 * Throws InputError for a model without factors, inconsistent sizes, a term beyond the factors or
 * a square that is not of one numeric factor (checkTerm),
 * a non-finite coefficient, a level outside (0, 1), or (per call) a wrong number of settings.
 * Example: for the fit yhat = 40.44 + 0.775 x1 + 0.325 x2 (Montgomery 8th ed., section 6.8 data),
 * compilePredictor(model).fit([1, 1]) -> 41.54.
 */
export function compilePredictor(model: FittedModel, level = 0.95): CompiledPredictor {
  return new Compiled(model, level);
}

const cache = new WeakMap<FittedModel, Map<number, CompiledPredictor>>();

/**
 * compilePredictor, remembered per model object and level, so that repeated predictions from the
 * same fit (a screen redrawing as a slider moves) compile once. Same method, result and throws as
 * compilePredictor; cost O(1) after the first call for a model.
 * Example: cachedPredictor(model) === cachedPredictor(model) -> true.
 */
export function cachedPredictor(model: FittedModel, level = 0.95): CompiledPredictor {
  let byLevel = cache.get(model);
  if (!byLevel) cache.set(model, (byLevel = new Map()));
  let p = byLevel.get(level);
  if (!p) byLevel.set(level, (p = compilePredictor(model, level)));
  return p;
}
