/**
 * Least squares where the nominal plan decides what can be estimated: rank detection and the
 * alias chains come from Householder QR of the NOMINAL model matrix (fit-qr.ts); the kept
 * columns (each chain's first term in model order) are then fitted on the ACTUAL settings, so
 * off-target settings adjust the estimates but never separate what the plan confounds. Aliases
 * are those of the plan (weights +-1 in a regular fraction). Source: common practice; the QR
 * method as in fit-qr.ts (Golub and Van Loan, Matrix Computations, 4th ed., section 5.3).
 * The plan may also come from walsh-plan.ts (a full factorial less a few runs), with the same
 * kept columns and chains and no nominal factorisation.
 * Cost: two QR factorisations, O(n p^2), or one with the plan given. Throws nothing.
 * Example: a 2^(4-1) with D = ABC and one setting at 0.8 instead of 1, terms A..D and all
 * two-factor interactions -> 7 kept columns, aliased BC (= AD), BD (= AC), CD (= AB).
 */
import type { Column } from './columns.ts';
import type { QrFactor } from '../linalg/householder-qr.ts';
import { fitQr, fitQrOnSettings } from './fit-qr.ts';
import type { AliasedColumn, LinearFit } from './linear-fit.ts';

/** What the nominal plan decides: kept and aliased columns (a lean nominal fit has them, or walsh-plan.ts). */
export interface PlanColumns {
  readonly kept: Int32Array;
  readonly aliased: readonly AliasedColumn[];
  readonly qr?: QrFactor;
}

/** The actual settings themselves, from which the kept columns' matrix is built (fit-qr.ts fitQrOnSettings: kept by them). */
export interface ActualSettings {
  readonly coded: readonly (readonly number[])[];
  readonly blocks: readonly number[] | null;
}

/**
 * `planFit`: the plan's kept and aliased columns when the caller already has them (saves the
 * nominal factorisation; `xNominal` is then not read); `lean`: the actual fit is lean too (fit-qr.ts: no (X'X)^-1, no leverage), for a
 * caller that needs only the estimates (the saturated set of Lenth's method); `actualPrefix`: a
 * factorisation of the first kept columns on the actual settings, reused when it matches
 * (householder-qr.ts: the same result, less work). `xActual` holds every column, or the kept ones only,
 * or is the actual settings (ActualSettings), from which the kept columns are built.
 */
export function fitOnPlan(columns: readonly Column[], xNominal: Float64Array, xActual: Float64Array | ActualSettings, y: readonly number[], planFit?: PlanColumns, lean = false, actualPrefix?: QrFactor): LinearFit {
  const n = y.length;
  const plan = planFit ?? fitQr(columns, xNominal, y, true);
  const m = plan.kept.length;
  // Plain loops here and below: Array.from and Int32Array.from with a map function, and object
  // spreads, cost more than the rest of a small fit.
  const kept: Column[] = [];
  for (let a = 0; a < m; a++) kept.push(columns[plan.kept[a]]);
  let all = m === columns.length;
  for (let a = 0; a < m && all; a++) all = plan.kept[a] === a;
  let act: LinearFit;
  if (xActual instanceof Float64Array) {
    // Every column kept, or only the kept columns given: the actual matrix as it is (not modified by the fit).
    const given = all || xActual.length === n * m;
    const x = given ? xActual : new Float64Array(n * m);
    if (!given) for (let a = 0; a < m; a++) x.set(xActual.subarray(plan.kept[a] * n, (plan.kept[a] + 1) * n), a * n);
    act = fitQr(kept, x, y, lean, actualPrefix);
  } else act = fitQrOnSettings(kept, xActual.coded, xActual.blocks, y, lean, actualPrefix);
  const up = (a: number): number => plan.kept[a];
  // Should the actual settings lose a further column (they almost never do), it is listed too.
  const aliased: AliasedColumn[] = [];
  for (const a of plan.aliased) aliased.push(a); // a loop: slice() of a frozen array (walsh-plan.ts keeps them frozen) takes a slow path
  for (const al of act.aliased) aliased.push({ column: up(al.column), combination: al.combination.map((w) => ({ column: up(w.column), weight: w.weight })) });
  const keptUp = new Int32Array(act.kept.length);
  for (let a = 0; a < keptUp.length; a++) keptUp[a] = plan.kept[act.kept[a]];
  // The actual fit's fields, with the plan's columns, kept columns and aliases.
  const out: { -readonly [K in keyof LinearFit]: LinearFit[K] } = {
    n: act.n,
    columns,
    kept: keptUp,
    coef: act.coef,
    covUnscaled: act.covUnscaled,
    seqSS: act.seqSS,
    fitted: act.fitted,
    residuals: act.residuals,
    leverage: act.leverage,
    rss: act.rss,
    dfResidual: act.dfResidual,
    aliased,
    orthogonal: act.orthogonal,
    method: act.method,
    qr: act.qr,
  };
  if (act.basis) out.basis = act.basis;
  if (plan.qr) out.planQr = plan.qr;
  return out;
}
