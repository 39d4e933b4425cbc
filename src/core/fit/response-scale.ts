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
import type { Analysis, AnovaTable, Estimate, EffectPoint, FittedModel } from './analysis.ts';
import type { Verdict } from './verdicts.ts';

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

/** x 2^e, in two halves so that 2^e itself never overflows (e up to +-2100). Exact unless the result over- or underflows. */
export function timesPow2(x: number, e: number): number {
  const a = Math.trunc(e / 2);
  return x * 2 ** a * 2 ** (e - a);
}

/** The smallest normal double (IEEE 754 binary64): below it a number keeps fewer than 53 bits. */
const SMALLEST_NORMAL = 2 ** -1022;

/** x 2^e where the result is a normal double (or exactly 0), else null: digits would be lost. */
function scaledOrNull(x: number, e: number): number | null {
  if (x === 0) return 0;
  const v = timesPow2(x, e);
  return Number.isFinite(v) && Math.abs(v) >= SMALLEST_NORMAL ? v : null;
}

/** A figure in the response's unit, scaled back (exact: within 2^-e of the response's own magnitude). */
function back(x: number, e: number): number {
  return timesPow2(x, e);
}

function estimate<T extends Estimate>(v: T, e: number): T {
  return { ...v, coef: back(v.coef, e), se: v.se === null ? null : back(v.se, e), ci: v.ci === null ? null : [back(v.ci[0], e), back(v.ci[1], e)] };
}

function table(t: AnovaTable, e: number): AnovaTable {
  return { ...t, rows: t.rows.map((r) => ({ ...r, ss: r.ss === null ? null : scaledOrNull(r.ss, 2 * e), ms: r.ms === null ? null : scaledOrNull(r.ms, 2 * e) })) };
}

function points(list: readonly EffectPoint[], e: number): EffectPoint[] {
  return list.map((p) => ({ ...p, effect: back(p.effect, e) }));
}

function verdict(v: Verdict, e: number): Verdict {
  return v.kind === 'curvature' ? { ...v, estimate: back(v.estimate, e) } : v;
}

/**
 * An analysis made on y 2^-e, in the unit of y: every figure in that unit times 2^e, sums of
 * squares and mean squares times 2^2e (null where binary64 cannot hold them), the rest as it is.
 * `warnings` is left to the caller, which writes it from the scaled-back verdicts.
 */
export function scaleAnalysisBack(a: Analysis, e: number): Omit<Analysis, 'warnings'> {
  const model: FittedModel = { ...a.model, coef: a.model.coef.map((c) => back(c, e)), sigma: a.model.sigma === null ? null : back(a.model.sigma, e) };
  return {
    ...a,
    intercept: estimate(a.intercept, e),
    terms: a.terms.map((t) => ({ ...estimate(t, e), effect: back(t.effect, e) })),
    blocks: a.blocks === null ? null : a.blocks.map((b) => ({ ...b, offset: back(b.offset, e) })),
    sigma: a.sigma === null ? null : back(a.sigma, e),
    anova: table(a.anova, e),
    anovaAdjusted: a.anovaAdjusted === null ? null : table(a.anovaAdjusted, e),
    lenth: a.lenth === null ? null : { ...a.lenth, pse: back(a.lenth.pse, e), me: back(a.lenth.me, e), sme: back(a.lenth.sme, e), effects: points(a.lenth.effects, e) },
    curvature: a.curvature === null ? null : { ...a.curvature, estimate: back(a.curvature.estimate, e), se: a.curvature.se === null ? null : back(a.curvature.se, e) },
    runs: a.runs.map((r) => ({ ...r, y: back(r.y, e), fitted: back(r.fitted, e), residual: back(r.residual, e) })),
    halfNormal: points(a.halfNormal, e),
    verdicts: a.verdicts.map((v) => verdict(v, e)),
    model,
  };
}
