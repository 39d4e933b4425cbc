/**
 * The verdicts step of the analysis, written last: from the other steps' figures, what the
 * analysis concludes, as typed verdicts (verdicts.ts), in the order the warnings are read:
 * runs off every level, near replicates, non-orthogonal runs, collinear terms, curvature, the squares' tests, lack of fit, a weak Lenth's method, no
 * residual df, partial aliasing of a Plackett-Burman plan, terms the runs cannot separate. Significance is p < alpha (common practice:
 * 0.05); Lenth's method is weak below LENTH_MIN_CONTRASTS effects (Lenth 1989, section 4).
 * Cost O(p).
 * Example: the 2^2 with five center points (Montgomery 8th ed., section 6.8) -> one verdict,
 * curvature 'flat' with p 0.8137.
 */
import type { AliasedTerm, TermEstimate } from './analysis.ts';
import type { Curvature } from './curvature.ts';
import { LENTH_MIN_CONTRASTS, type LenthResult } from './lenth.ts';
import type { Verdict } from './verdicts.ts';
import { combinationLabel } from './combination-label.ts';
import { isSquare } from '../model/term.ts';

export interface VerdictInput {
  readonly alpha: number;
  readonly nearReplicates: number;
  /** Terms whose VIF is above VIF_LIMIT (vif.ts), with the runs that drive it. */
  readonly collinear?: { readonly limit: number; readonly terms: readonly { readonly letters: string; readonly vif: number; readonly runs: readonly string[] }[] };
  /** Runs with a setting more than 0.1 coded from every level (nominal-settings.ts `away`), and whether a plan gave the levels. */
  readonly offLevels?: { readonly runs: number; readonly planned: boolean };
  readonly orthogonal: boolean;
  readonly curvature: Curvature | null;
  /** Letters of the model's square terms, if any. */
  readonly squares?: readonly string[];
  /** Pure-error df (0 when none). */
  readonly pureErrorDf: number;
  readonly lackOfFitP: number | null;
  readonly lenth: LenthResult | null;
  readonly dfResidual: number;
  readonly aliased: readonly AliasedTerm[];
  /** Whether an inseparable term is confounded with the intercept or blocks (estimate-terms.ts). */
  readonly aliasedWithInterceptOrBlocks: boolean;
  readonly terms: readonly TermEstimate[];
  /** A Plackett-Burman plan's runs and largest |correlation| of a main effect with a two-factor interaction; absent otherwise. */
  readonly partialAliasing?: { readonly runs: number; readonly largestCorrelation: number } | null;
}

export function analysisVerdicts(v: VerdictInput): Verdict[] {
  const out: Verdict[] = [];
  // With squares (a second-order model) the two-level notes do not fit: the columns of a central
  // composite or Box-Behnken design are never orthogonal to the intercept, and Lenth's method
  // assumes independent two-level contrasts; the squares' own tests speak instead.
  const secondOrder = (v.squares ?? []).length > 0;
  if (v.offLevels && v.offLevels.runs > 0) out.push({ kind: 'off-levels', runs: v.offLevels.runs, planned: v.offLevels.planned });
  if (v.nearReplicates > 0) out.push({ kind: 'near-replicates', groups: v.nearReplicates });
  if (!v.orthogonal && !secondOrder) out.push({ kind: 'not-orthogonal' });
  if (v.collinear && v.collinear.terms.length > 0) out.push({ kind: 'collinear', limit: v.collinear.limit, terms: v.collinear.terms });
  const c = v.curvature;
  if (c) {
    // Written out field by field (the order of the keys kept): no spread of a base object.
    const squares = v.squares ?? [];
    if (c.p === null) {
      out.push({ kind: 'curvature', p: c.p, alpha: v.alpha, estimate: c.estimate, nCenter: c.nCenter, nFactorial: c.nFactorial, squares, outcome: 'untestable', reason: v.pureErrorDf > 0 ? 'no-spread' : 'no-repeats' });
    } else out.push({ kind: 'curvature', p: c.p, alpha: v.alpha, estimate: c.estimate, nCenter: c.nCenter, nFactorial: c.nFactorial, squares, outcome: c.p < v.alpha ? 'curved' : 'flat', reason: null });
  }
  if (secondOrder) {
    out.push({ kind: 'squares', alpha: v.alpha, terms: v.terms.filter((t) => isSquare(t.term)).map((t) => ({ name: t.name, letters: t.letters, p: t.p })) });
  }
  if (v.lackOfFitP !== null) {
    out.push({ kind: 'lack-of-fit', outcome: v.lackOfFitP < v.alpha ? 'significant' : 'not-significant', p: v.lackOfFitP, alpha: v.alpha });
  }
  if (v.lenth && v.lenth.m < LENTH_MIN_CONTRASTS && !secondOrder) out.push({ kind: 'lenth-weak', m: v.lenth.m, advised: LENTH_MIN_CONTRASTS });
  if (v.dfResidual === 0) out.push(secondOrder ? { kind: 'no-residual-df', secondOrder: true } : { kind: 'no-residual-df' });
  if (v.partialAliasing) out.push({ kind: 'partial-aliasing', ...v.partialAliasing });
  if (v.aliased.length > 0) {
    out.push({
      kind: 'aliased',
      count: v.aliased.length,
      carried: v.terms.flatMap((t) => (t.estimates ? [{ letters: t.letters, estimates: t.estimates }] : [])),
      withInterceptOrBlocks: v.aliasedWithInterceptOrBlocks,
      terms: v.aliased.map((t) => ({ letters: t.letters, equals: combinationLabel(t.combination) })),
    });
  }
  return out;
}
