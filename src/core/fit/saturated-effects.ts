/**
 * The saturated set of effects that the factorial runs can estimate, for Lenth's method and the
 * half-normal chart: one per column of an unreplicated full factorial, one per alias chain of a
 * fraction (represented by its shortest word, since terms are offered lowest order first), with
 * blocks, when present, taken out first. Found by Householder QR with rank detection over the
 * factorial runs alone, adding terms order by order until the runs are used up; when the runs
 * are a full factorial less a few, the same set and chains come from walsh-plan.ts without that
 * factorisation. The set holds
 * two-level products only (bit masks below 2^k, never a square): on factorial runs every
 * coded column is +-1, so a square is the constant 1, the intercept's column.
 * With `actual` given, `coded` holds the nominal settings (nominal-settings.ts), which decide
 * the set, and the effects are estimated on the actual settings (fit-on-plan.ts), so that the
 * half-normal chart shows the same kind of estimates as the model's bars.
 * Cost O(n r T) for n factorial runs, rank r and T terms tried. `prefix`: the model's factorisations
 * (nominal and actual settings); when the model's columns lead the saturated set on the same runs,
 * the saturated fits resume from them (householder-qr.ts), with the same result. The actual fit
 * is kept by its settings (fit-qr.ts fitQrOnSettings): the same runs again cost O(n^2).
 */
import { compareTerms, termOrder, type Term } from '../model/term.ts';
import { blockLevels, modelColumns, modelMatrix, type Column } from './columns.ts';
import { fitOnPlan } from './fit-on-plan.ts';
import { fitQr } from './fit-qr.ts';
import type { QrFactor } from '../linalg/householder-qr.ts';
import type { LinearFit } from './linear-fit.ts';
import { walshPlan, type WalshPlan } from './walsh-plan.ts';

export interface SaturatedEffect {
  readonly term: Term;
  readonly effect: number;
  /** Terms whose columns equal (weight +1) or mirror (weight -1) this one in the factorial runs. */
  readonly aliases: readonly { readonly term: Term; readonly weight: number }[];
}

export function saturatedEffects(
  k: number,
  coded: readonly (readonly number[])[],
  y: readonly number[],
  blocks: readonly number[] | null,
  actual?: readonly (readonly number[])[],
  prefix?: { readonly nominal?: QrFactor; readonly actual?: QrFactor },
): SaturatedEffect[] {
  const levels = blockLevels(blocks);
  const target = coded.length; // the most columns the runs can separate
  // Start from the lowest order whose terms could use up the runs; go higher only if aliases leave runs over.
  let order = 1;
  let count = k;
  while (order < k && count + levels.length < target) {
    order++;
    count += binomial(k, order);
  }
  let fit = null as LinearFit | null;
  // A full factorial less a few runs: the set and its chains without a nominal factorisation (walsh-plan.ts).
  let plan: WalshPlan | null = null;
  let cols: Column[] = [];
  for (; order <= k; order++) {
    cols = levels.length > 1 ? modelColumns(levels, termsUpTo(k, order)) : unblockedColumns(k, order);
    plan = blocks ? null : walshPlan(cols, coded, k);
    if (plan) {
      if (plan.kept.length >= target) break;
      continue;
    }
    fit = fitQr(cols, modelMatrix(cols, coded, blocks), y, true, prefix?.nominal);
    if (fit.kept.length >= target) break;
  }
  // The set comes from the nominal settings (`coded`); the effects, like the model's, from the actual ones.
  // The plan found above (a lean nominal fit, or walsh-plan.ts) is not worked out again by
  // fitOnPlan; only the estimates are read here, so the actual fit is lean as well (no (X'X)^-1, no leverage).
  // The actual fit is found by its settings (fit-qr.ts fitQrOnSettings), its matrix built only when new.
  if (plan) fit = fitOnPlan(cols, new Float64Array(0), { coded: actual ?? coded, blocks }, y, plan, true, actual ? prefix?.actual : prefix?.nominal);
  else if (fit && actual) fit = fitOnPlan(fit.columns, new Float64Array(0), { coded: actual, blocks }, y, fit, true, prefix?.actual);
  if (!fit) return [];
  const byColumn = new Map<number, { term: Term; weight: number }[]>();
  for (const a of fit.aliased) {
    const c = fit.columns[a.column];
    if (c.kind !== 'term' || a.combination.length !== 1) continue;
    const list = byColumn.get(a.combination[0].column) ?? [];
    list.push({ term: c.term, weight: a.combination[0].weight });
    byColumn.set(a.combination[0].column, list);
  }
  const out: SaturatedEffect[] = [];
  for (let j = 0; j < fit.kept.length; j++) {
    const c = fit.columns[fit.kept[j]];
    if (c.kind !== 'term') continue;
    out.push({ term: c.term, effect: 2 * fit.coef[j], aliases: byColumn.get(fit.kept[j]) ?? [] });
  }
  return out;
}

/* One-entry memo: every product of up to `order` of k factors, in model order, and its columns
 * without blocks; the same for every analysis of a study (shared, never modified). */
let memoKey = '';
let memoTerms: readonly Term[] = [];
let memoColumns: Column[] = [];

function termsUpTo(k: number, order: number): readonly Term[] {
  const key = `${k}|${order}`;
  if (key !== memoKey) {
    const terms: Term[] = [];
    for (let t = 1; t < 1 << k; t++) if (termOrder(t) <= order) terms.push(t);
    terms.sort(compareTerms);
    memoTerms = terms;
    memoColumns = modelColumns([], terms);
    memoKey = key;
  }
  return memoTerms;
}

/** modelColumns([], termsUpTo(k, order)), kept with the terms. */
function unblockedColumns(k: number, order: number): Column[] {
  termsUpTo(k, order);
  return memoColumns;
}

function binomial(n: number, r: number): number {
  let c = 1;
  for (let i = 1; i <= r; i++) c = (c * (n - r + i)) / i;
  return Math.round(c);
}
