/**
 * The ANOVA of a second-order model grouped by kind of term: the main effects (linear), the
 * two-factor interactions, and the squares, each as the extra sum of squares it adds to the
 * kinds before it, tested against the residual mean square. This is the usual reading of a
 * response-surface fit: does curvature (the squares) earn its place after the plane and its
 * twist? Source: Montgomery, Design and Analysis of Experiments, 8th ed., section 10.3.3 (the
 * extra sum of squares) and section 11.3 (the sequential table of Example 11.2: linear,
 * two-factor interaction, quadratic; from memory).
 */
import { fUpperP } from '../dist/f-dist.ts';
import { isInteraction, isSquare, type Term } from '../model/term.ts';
import type { AnovaRow, AnovaTable, TermEstimate } from './analysis.ts';

export type TermKind = 'linear' | 'two-factor' | 'quadratic';

export interface KindRow {
  readonly kind: TermKind;
  readonly df: number;
  readonly ss: number;
  readonly ms: number;
  readonly f: number | null;
  readonly p: number | null;
}

/**
 * The kind of a model term: a square, an interaction, or a main effect (an interaction of three
 * or more factors, which a quadratic model never holds, counts with the two-factor ones).
 * Example: termKind(0b11) -> 'two-factor'.
 */
export function termKind(t: Term): TermKind {
  return isSquare(t) ? 'quadratic' : isInteraction(t) ? 'two-factor' : 'linear';
}

const ORDER: readonly TermKind[] = ['linear', 'two-factor', 'quadratic'];

/**
 * The rows by kind from a sequential ANOVA table and the analysis's terms: SS_kind = the sum of
 * its terms' sequential sums of squares, F = (SS_kind / df_kind) / MS_residual, p its upper tail
 * on (df_kind, df_residual) (fUpperP). A sum of sequential rows is the extra sum of squares only
 * when each kind's terms come together, in the order linear, two-factor, quadratic, as the
 * quadratic model lists them (model/formula.ts quadraticTerms); otherwise, or for an adjusted
 * table, or with a sum of squares beyond binary64 (null), the grouping has no such reading and null is returned. Kinds without a term are left
 * out; F and p are null with no residual df. Cost O(terms).
 * Example: Montgomery 8th ed., Example 11.2 -> linear df 2, SS 10.04; two-factor df 1, SS 0.25;
 * quadratic df 2, SS 17.95 (from memory).
 */
export function anovaByKind(table: AnovaTable, terms: readonly TermEstimate[]): KindRow[] | null {
  if (table.type !== 'sequential') return null;
  // A sum of squares beyond binary64 (fit/response-scale.ts) has no sum to add to.
  if (table.rows.some((r) => r.ss === null)) return null;
  const byName = new Map<string, AnovaRow>(table.rows.map((r) => [r.source, r]));
  const residual = byName.get('Residual');
  const inTable = terms.filter((t) => byName.has(t.name));
  let last = -1;
  for (const t of inTable) {
    const at = ORDER.indexOf(termKind(t.term));
    if (at < last) return null;
    last = at;
  }
  const msRes = residual && residual.df > 0 ? residual.ss! / residual.df : null;
  const out: KindRow[] = [];
  for (const kind of ORDER) {
    const rows = inTable.filter((t) => termKind(t.term) === kind).map((t) => byName.get(t.name)!);
    if (rows.length === 0) continue;
    const df = rows.reduce((s, r) => s + r.df, 0);
    const ss = rows.reduce((s, r) => s + r.ss!, 0);
    const ms = ss / df;
    const f = msRes !== null && msRes > 0 ? ms / msRes : null;
    out.push({ kind, df, ss, ms, f, p: f === null ? null : fUpperP(f, df, residual!.df) });
  }
  return out;
}
