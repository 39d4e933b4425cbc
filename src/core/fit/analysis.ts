/**
 * What the analysis of one response reports. Plain data (numbers, strings, null), so the screens,
 * the command line's JSON and the reports all show the same thing. null means "not available
 * from these runs" (never NaN).
 */
import type { Factor } from '../factor/factor.ts';
import type { Term } from '../model/term.ts';
import type { BoxCox } from './box-cox.ts';
import type { LenthResult } from './lenth.ts';
import type { Verdict } from './verdicts.ts';

export interface CodingRow {
  readonly name: string;
  readonly letter: string;
  readonly kind: 'numeric' | 'categorical';
  /** Real setting coded -1 and +1 (a level label for a categorical factor). */
  readonly low: number | string;
  readonly high: number | string;
  readonly scale: 'linear' | 'log';
  readonly unit?: string;
}

export interface Estimate {
  readonly coef: number;
  readonly se: number | null;
  readonly t: number | null;
  readonly p: number | null;
  /** 95% confidence interval of the coefficient. */
  readonly ci: readonly [number, number] | null;
}

export interface TermEstimate extends Estimate {
  readonly term: Term;
  readonly name: string;
  readonly letters: string;
  /** 2 x coef: the predicted change from -1 to +1 with the other factors at 0. */
  readonly effect: number;
  /** Effect over Lenth's pseudo standard error, when the residual df is 0. */
  readonly lenthT?: number;
  /** When the runs cannot separate this term from others, the combination it estimates ("A + BCD"). */
  readonly estimates?: string;
  /** Variance inflation factor 1 / (1 - R^2) of its column (fit/vif.ts); null when undefined. Set by analyze. */
  readonly vif?: number | null;
}

export interface AnovaRow {
  readonly source: string;
  readonly df: number;
  /** null when the response's scale carries it beyond binary64 (fit/response-scale.ts); F and p stay exact. */
  readonly ss: number | null;
  readonly ms: number | null;
  readonly f: number | null;
  readonly p: number | null;
}

export interface AnovaTable {
  readonly type: 'sequential' | 'adjusted';
  readonly rows: readonly AnovaRow[];
}

export interface RunDiagnostics {
  readonly label: string;
  readonly y: number;
  readonly fitted: number;
  readonly residual: number;
  readonly leverage: number;
  /** Internally studentized residual e / (sigma sqrt(1 - h)); null when sigma is unknown or h = 1. */
  readonly studentized: number | null;
  /**
   * Externally studentized (deleted) residual r sqrt((df - 1) / (df - r^2)): the residual over
   * the noise estimated without this run, so one wild run cannot hide itself; null when the
   * residual df is below 2 or the internal one is null.
   */
  readonly deleted: number | null;
  readonly kind: 'factorial' | 'center' | 'other';
}

export interface EffectPoint {
  readonly name: string;
  readonly letters: string;
  readonly effect: number;
  /** Half-normal quantile for its rank among the absolute effects. */
  readonly quantile: number;
  /** Beyond Lenth's margin of error ('likely') or simultaneous margin ('active'), when Lenth applies. */
  readonly mark?: 'likely' | 'active';
}

export interface AliasedTerm {
  readonly name: string;
  readonly letters: string;
  /** What the runs give instead: the term equals this combination of estimable columns. */
  readonly combination: readonly { readonly name: string; readonly letters: string; readonly weight: number }[];
}

/** What prediction needs of a fit (see core/predict). */
export interface FittedModel {
  readonly factors: readonly Factor[];
  readonly response: string;
  /** Estimable terms, in model order; the intercept is not among them. */
  readonly terms: readonly Term[];
  /** Per term: the combination its estimate carries when the runs cannot separate it ("C + AB"), else null. */
  readonly estimates: readonly (string | null)[];
  /** Coefficients: intercept, then one per block contrast, then one per term. */
  readonly coef: Float64Array;
  /** Number of block-contrast columns after the intercept (0 when unblocked). */
  readonly blockColumns: number;
  /** (X'X)^-1 over the same columns, column-major. */
  readonly covUnscaled: Float64Array;
  readonly sigma: number | null;
  readonly dfResidual: number;
  /** Main-effect and interaction significance, for the path's warnings. */
  readonly pValues: ReadonlyMap<Term, number | null>;
  readonly curvatureP: number | null;
  /**
   * Per factor, the half-width of its tested range in coded units (1, the factorial box, or the
   * axial distance of the design's axial runs: predict/tested-extent.ts). Absent means 1 each.
   */
  readonly extent?: readonly number[];
  /**
   * The transform the fit was made on: coefficients are on the scale (y'^lambda - 1) / lambda,
   * y' = y - lowerBound (fit/response-transform.ts); lambda 1 (none) is the response itself.
   * Absent means none.
   */
  readonly transform?: FitTransform;
}

export interface FitTransform {
  /** none, log, sqrt, inverse or power=L. */
  readonly token: string;
  readonly lambda: number;
  /** The response's lower bound L, or null when it has none. */
  readonly lowerBound: number | null;
  /** The Box-Cox suggestion for the untransformed response (a transform token), or null. */
  readonly suggestion?: string | null;
}

export interface Analysis {
  readonly response: string;
  readonly n: number;
  readonly method: 'qr' | 'yates';
  readonly coding: readonly CodingRow[];
  readonly intercept: Estimate;
  readonly terms: readonly TermEstimate[];
  readonly blocks: readonly { readonly block: number; readonly offset: number }[] | null;
  readonly df: {
    readonly model: number;
    readonly blocks: number;
    readonly residual: number;
    readonly pureError: number | null;
    readonly lackOfFit: number | null;
  };
  readonly sigma: number | null;
  readonly r2: number;
  readonly r2adj: number | null;
  readonly r2pred: number | null;
  readonly anova: AnovaTable;
  /** Present when the runs are not orthogonal, so the order of terms matters. */
  readonly anovaAdjusted: AnovaTable | null;
  readonly lenth: (LenthResult & { readonly effects: readonly EffectPoint[] }) | null;
  readonly curvature: {
    readonly estimate: number;
    readonly se: number | null;
    readonly t: number | null;
    readonly p: number | null;
    readonly nFactorial: number;
    readonly nCenter: number;
  } | null;
  readonly aliased: readonly AliasedTerm[];
  readonly runs: readonly RunDiagnostics[];
  readonly halfNormal: readonly EffectPoint[];
  /** What the analysis concludes, as typed data (kind and figures), warnings and plain statements alike. */
  readonly verdicts: readonly Verdict[];
  /** The notes that came with the runs, then the verdicts that are warnings, in words (core/text/verdict-text.ts). */
  readonly warnings: readonly string[];
  /** The transform the figures are on (none when the response itself). */
  readonly transform: FitTransform;
  /** The Box-Cox power for the untransformed response minus its bound (fit/box-cox.ts), or null. */
  readonly boxCox: BoxCox | null;
  readonly model: FittedModel;
}
