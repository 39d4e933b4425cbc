/**
 * The response's scale, taken out before the fit and put back after it, so that the analysis
 * works the same at every magnitude a double can hold (1e-300 and 1e300 alike): the response is
 * multiplied by 2^-e, e the binary exponent of its largest magnitude (so the largest becomes a
 * number in [1, 2)), and every figure in the response's unit is multiplied back by 2^e (sums of
 * squares and mean squares by 2^2e). Multiplying by a power of two only changes the exponent
 * (IEEE 754, section 3.4), so it is exact away from overflow and the subnormal range: the
 * analysis of y 2^k is the analysis of y, term for term, with every effect, standard error and
 * interval times 2^k, and t, F, p, R^2, leverage and the verdicts unchanged.
 * A sum of squares that 2^2e carries beyond binary64 (above 1.8e308, or below the smallest normal
 * 2.2e-308, where digits are lost) is reported as null: the F and p values are computed on the
 * scaled response and stay exact. Cost O(n + p^2).
 * Example: scaleExponent([3e200, -1e200]) -> 665 (3e200 = 1.52... x 2^665).
 */
import type { Analysis, AnovaTable, Estimate, EffectPoint, FittedModel, RunDiagnostics, TermEstimate } from './analysis.ts';
import type { Verdict } from './verdicts.ts';

type Mutable<T> = { -readonly [K in keyof T]: T[K] };

/** The binary exponent e of the largest |v| (largest / 2^e in [1, 2)); 0 when all are 0. Cost O(n). */
export function scaleExponent(values: ArrayLike<number>): number {
  let big = 0;
  for (let i = 0; i < values.length; i++) big = Math.max(big, Math.abs(values[i]));
  if (!(big > 0) || !Number.isFinite(big)) return 0;
  let e = Math.floor(Math.log2(big));
  // log2 rounds near powers of two; settle the exponent exactly.
  if (timesPow2(big, -e) >= 2) e += 1;
  else if (timesPow2(big, -e) < 1) e -= 1;
  return e;
}

/**
 * The largest |scaleExponent| at which the analysis is made on y as it is: up to 2^64 either way
 * of [1, 2), every value the analysis forms (sums, products and quotients of y, squares and sums
 * of squares up to n 2^130, square roots of sums of squares) stays a normal double, and each of
 * those operations commutes exactly with a power of two (IEEE 754, sections 3.4 and 5.4: a
 * correctly rounded +, -, x, / or square root of x 2^k, of x^2 2^2k, is the result times that
 * power), so the analysis of y equals the scaled one scaled back, figure for figure and bit for
 * bit, without the two passes (test/core/fit/response-scale.test.ts checks it).
 */
export const SCALE_FREE_EXPONENT = 64;

/** The exponent to take out before the analysis: scaleExponent(values), or 0 within SCALE_FREE_EXPONENT of it. Cost O(n). */
export function analysisScaleExponent(values: ArrayLike<number>): number {
  const e = scaleExponent(values);
  return e >= -SCALE_FREE_EXPONENT && e <= SCALE_FREE_EXPONENT ? 0 : e;
}

/** x 2^e, in two halves when 2^e itself is not a normal double (e outside -1022..1023). Exact unless the result over- or underflows. */
export function timesPow2(x: number, e: number): number {
  if (e >= -1022 && e <= 1023) return x * 2 ** e;
  const a = Math.trunc(e / 2);
  return x * 2 ** a * 2 ** (e - a);
}

/** A multiplier by 2^e, with 2^e worked out once (the scale-back touches every figure). */
export function pow2Scaler(e: number): (x: number) => number {
  if (e === 0) return (x) => x;
  if (e >= -1022 && e <= 1023) {
    const f = 2 ** e;
    return (x) => x * f;
  }
  const a = Math.trunc(e / 2);
  const f1 = 2 ** a;
  const f2 = 2 ** (e - a);
  return (x) => x * f1 * f2;
}

/** values times 2^e, exact, into a new array (one factor for all where 2^e is a normal double, as in pow2Scaler). */
export function scaledByPow2(values: ArrayLike<number>, e: number): Float64Array {
  const out = new Float64Array(values.length);
  if (e >= -1022 && e <= 1023) {
    const f = 2 ** e;
    for (let i = 0; i < values.length; i++) out[i] = values[i] * f;
  } else for (let i = 0; i < values.length; i++) out[i] = timesPow2(values[i], e);
  return out;
}

/** The smallest normal double (IEEE 754 binary64): below it a number keeps fewer than 53 bits. */
const SMALLEST_NORMAL = 2 ** -1022;

/** x 2^2e where the result is a normal double (or exactly 0), else null: digits would be lost. */
function squareScaler(e: number): (x: number) => number | null {
  const by = pow2Scaler(2 * e);
  return (x) => {
    if (x === 0) return 0;
    const v = by(x);
    return Number.isFinite(v) && Math.abs(v) >= SMALLEST_NORMAL ? v : null;
  };
}

/**
 * An analysis made on y 2^-e, in the unit of y: every figure in that unit times 2^e, sums of
 * squares and mean squares times 2^2e (null where binary64 cannot hold them), the rest as it is.
 * `warnings` is left to the caller, which writes it from the scaled-back verdicts. Cost O(n + p).
 */
export function scaleAnalysisBack(a: Analysis, e: number): Omit<Analysis, 'warnings'> {
  if (e === 0) return a;
  const s = pow2Scaler(e);
  const sq = squareScaler(e);
  const sn = (x: number | null) => (x === null ? null : s(x));
  const estimate = <T extends Estimate>(v: T): T => ({ ...v, coef: s(v.coef), se: sn(v.se), ci: v.ci === null ? null : [s(v.ci[0]), s(v.ci[1])] });
  // A term: one copy, then its fields in that unit rewritten in place (keys keep their order);
  // spreading twice per term was a measurable share of the analysis (test/bench).
  const term = (t: TermEstimate): TermEstimate => {
    const c: Mutable<TermEstimate> = { ...t };
    c.coef = s(t.coef);
    c.se = sn(t.se);
    c.ci = t.ci === null ? null : [s(t.ci[0]), s(t.ci[1])];
    c.effect = s(t.effect);
    return c;
  };
  // A run, field by field (RunDiagnostics has no optional fields): no spread per run.
  const run = (r: RunDiagnostics): RunDiagnostics => ({ label: r.label, y: s(r.y), fitted: s(r.fitted), residual: s(r.residual), leverage: r.leverage, studentized: r.studentized, deleted: r.deleted, kind: r.kind });
  const table = (t: AnovaTable): AnovaTable => ({ ...t, rows: t.rows.map((r) => ({ ...r, ss: r.ss === null ? null : sq(r.ss), ms: r.ms === null ? null : sq(r.ms) })) });
  const points = (list: readonly EffectPoint[]): EffectPoint[] => list.map((p) => ({ ...p, effect: s(p.effect) }));
  const verdict = (v: Verdict): Verdict => (v.kind === 'curvature' ? { ...v, estimate: s(v.estimate) } : v);
  const model: FittedModel = { ...a.model, coef: a.model.coef.map(s), sigma: sn(a.model.sigma) };
  return {
    ...a,
    intercept: estimate(a.intercept),
    terms: a.terms.map(term),
    blocks: a.blocks === null ? null : a.blocks.map((b) => ({ ...b, offset: s(b.offset) })),
    sigma: sn(a.sigma),
    anova: table(a.anova),
    anovaAdjusted: a.anovaAdjusted === null ? null : table(a.anovaAdjusted),
    lenth: a.lenth === null ? null : { ...a.lenth, pse: s(a.lenth.pse), me: s(a.lenth.me), sme: s(a.lenth.sme), effects: points(a.lenth.effects) },
    curvature: a.curvature === null ? null : { ...a.curvature, estimate: s(a.curvature.estimate), se: sn(a.curvature.se) },
    runs: a.runs.map(run),
    halfNormal: points(a.halfNormal),
    verdicts: a.verdicts.map(verdict),
    model,
  };
}
