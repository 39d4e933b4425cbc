/**
 * The estimates step of the analysis: each kept column's coefficient with its standard error,
 * t, two-sided p and confidence interval; effect = 2 x coefficient; the terms the runs cannot
 * separate, with the combination each kept estimate carries ("C + AB"); the block offsets,
 * which sum to zero (the last is minus the sum of the others).
 * Formulas: sigma^2 = RSS / df_res; se_j = sigma sqrt((X'X)^-1_jj); t = b_j / se_j on df_res;
 * CI = b_j +- t(1 - alpha/2; df_res) se_j. Source: Montgomery, Design and Analysis of
 * Experiments, 8th ed., sections 6.4 and 10.4. With df_res = 0 every se, t, p and CI is null.
 * Cost O(p + aliased terms x their combination).
 * Example: the 2^2 yield data (Montgomery 8th ed., section 6.2) -> effect of A 8.333, of B -5.
 */
import type { Factor } from '../factor/factor.ts';
import { tQuantile, tTwoSidedP } from '../dist/student-t.ts';
import type { AliasedTerm, Estimate, TermEstimate } from './analysis.ts';
import { columnLabels, type ColumnLabel } from './column-labels.ts';
import { combinationLabel } from './combination-label.ts';
import type { LinearFit } from './linear-fit.ts';
import { tIntervals } from './t-intervals.ts';

// Locals: module bindings are getters under some loaders, and these run once per term.
const tPValue = tTwoSidedP;
const intervals = tIntervals;

export interface TermEstimates {
  readonly intercept: Estimate;
  /** One per kept term column, in model order. */
  readonly terms: readonly TermEstimate[];
  readonly aliased: readonly AliasedTerm[];
  /** Block offsets in ascending block order (summing to zero), or null when unblocked. */
  readonly blockOffsets: readonly { readonly block: number; readonly offset: number }[] | null;
  /** Residual standard deviation, null when df_res = 0. */
  readonly sigma: number | null;
  /** Name and letters of every column of the fit. */
  readonly labels: readonly ColumnLabel[];
  /** True when some inseparable term equals a combination that involves the intercept or a block column. */
  readonly aliasedWithInterceptOrBlocks: boolean;
}

/** `blockLevels`: the block labels in ascending order when blocked (the last one's offset is implied), else empty. */
/** `vifs`: per kept column its VIF (vif.ts), carried into each term when given. */
export function estimateTerms(fit: LinearFit, factors: readonly Factor[], blockLevels: readonly number[], alpha: number, vifs?: readonly (number | null)[]): TermEstimates {
  const m = fit.kept.length;
  const dfRes = fit.dfResidual;
  const sigma = dfRes > 0 ? Math.sqrt(fit.rss / dfRes) : null;
  const tq = dfRes > 0 ? tQuantile(1 - alpha / 2, dfRes) : null;
  const iv = { se: null as number | null, ciLo: null as number | null, ciHi: null as number | null, piLo: null as number | null, piHi: null as number | null }; // reused per column
  // The figures of column j, written into one scratch object (no object per column besides the result).
  const est: { coef: number; se: number | null; t: number | null; p: number | null; ci: [number, number] | null } = { coef: 0, se: null, t: null, p: null, ci: null };
  const estimate = (j: number): void => {
    const coef = fit.coef[j];
    est.coef = coef;
    if (sigma === null || tq === null) {
      est.se = est.t = est.p = est.ci = null;
      return;
    }
    const { se, ciLo, ciHi } = intervals(coef, fit.covUnscaled[j * m + j], sigma, tq, iv);
    est.se = se;
    est.ci = [ciLo!, ciHi!];
    if (se === 0) {
      est.t = est.p = null;
      return;
    }
    const t = coef / se!;
    est.t = t;
    est.p = tPValue(t, dfRes);
  };

  const labels = columnLabels(fit.columns, factors);
  // Which estimable column carries which inseparable terms.
  const carried = new Map<number, { letters: string; weight: number }[]>();
  const aliased: AliasedTerm[] = [];
  let withInterceptOrBlocks = false;
  for (const a of fit.aliased) {
    const label = labels[a.column];
    aliased.push({ ...label, combination: a.combination.map((w) => ({ ...labels[w.column], weight: w.weight })) });
    for (const w of a.combination) {
      if (fit.columns[w.column].kind !== 'term') withInterceptOrBlocks = true;
      const list = carried.get(w.column) ?? [];
      list.push({ letters: label.letters, weight: w.weight });
      carried.set(w.column, list);
    }
  }

  const terms: TermEstimate[] = [];
  const blockOffsets: { block: number; offset: number }[] = [];
  let blockSum = 0;
  for (let j = 0; j < m; j++) {
    const c = fit.columns[fit.kept[j]];
    if (c.kind === 'block') {
      blockOffsets.push({ block: c.block, offset: fit.coef[j] });
      blockSum += fit.coef[j];
    }
    if (c.kind !== 'term') continue;
    const label = labels[fit.kept[j]];
    const extra = carried.get(fit.kept[j]);
    estimate(j);
    // Built field by field: object spreads are slow on this hot path (see test/bench).
    const base: TermEstimate = vifs
      ? { term: c.term, name: label.name, letters: label.letters, coef: est.coef, se: est.se, t: est.t, p: est.p, ci: est.ci, effect: 2 * est.coef, vif: vifs[j] ?? null }
      : { term: c.term, name: label.name, letters: label.letters, coef: est.coef, se: est.se, t: est.t, p: est.p, ci: est.ci, effect: 2 * est.coef };
    terms.push(extra ? { ...base, estimates: combinationLabel([{ letters: label.letters, weight: 1 }, ...extra]) } : base);
  }
  const blocked = blockLevels.length > 1;
  if (blocked) blockOffsets.push({ block: blockLevels[blockLevels.length - 1], offset: -blockSum });
  estimate(0);
  const intercept: Estimate = { coef: est.coef, se: est.se, t: est.t, p: est.p, ci: est.ci };
  return { intercept, terms, aliased, blockOffsets: blocked ? blockOffsets : null, sigma, labels, aliasedWithInterceptOrBlocks: withInterceptOrBlocks };
}
