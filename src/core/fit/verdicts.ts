/**
 * What the analysis concludes about the runs, as typed data (a kind and its figures), never as
 * text: the screens, the text report and the warnings all turn these into words through one
 * module (core/text/verdict-text.ts), so they say the same thing in one wording.
 * The significance rules are common practice (p below the chosen alpha, 0.05 by default);
 * the tests themselves are in curvature.ts, anova-tables.ts and lenth.ts.
 */

/** Whether the center runs differ from the factorial runs (Montgomery, 8th ed., section 6.8). */
export interface CurvatureVerdict {
  readonly kind: 'curvature';
  /** 'curved': p < alpha; 'flat': p >= alpha; 'untestable': no p (see `reason`). */
  readonly outcome: 'curved' | 'flat' | 'untestable';
  /** Why there is no test: no repeated runs, or repeated runs that agree exactly (pure error 0). */
  readonly reason: 'no-repeats' | 'no-spread' | null;
  /** Letters of the model's square terms ("A^2"); when there are any, the model allows for the curvature. */
  readonly squares?: readonly string[];
  readonly p: number | null;
  readonly alpha: number;
  /** Factorial mean minus center mean. */
  readonly estimate: number;
  readonly nCenter: number;
  readonly nFactorial: number;
}

export type Verdict =
  /** Repeats of a planned point whose actual settings differ slightly (near replicates). */
  | { readonly kind: 'near-replicates'; readonly groups: number }
  /**
   * Runs with a setting more than 0.1 coded from its planned level (planned) or from every level
   * -1, 0, +1 (no plan): each counts as a point of its own.
   */
  | { readonly kind: 'off-levels'; readonly runs: number; readonly planned: boolean }
  /** Terms whose VIF is above the limit, each with up to three runs whose removal lowers it most. */
  | { readonly kind: 'collinear'; readonly limit: number; readonly terms: readonly { readonly letters: string; readonly vif: number; readonly runs: readonly string[] }[] }
  /** Columns not orthogonal: sequential and adjusted sums of squares differ. */
  | { readonly kind: 'not-orthogonal' }
  | CurvatureVerdict
  /** Lack of fit tested against pure error. */
  | { readonly kind: 'lack-of-fit'; readonly outcome: 'significant' | 'not-significant'; readonly p: number; readonly alpha: number }
  /** Lenth's method over fewer contrasts than advised. */
  | { readonly kind: 'lenth-weak'; readonly m: number; readonly advised: number }
  /** No residual degrees of freedom: no standard errors, t or p (`secondOrder`: the model has squares, so Lenth's method is no way out). */
  | { readonly kind: 'no-residual-df'; readonly secondOrder?: boolean }
  /**
   * A model with squares (a central composite or Box-Behnken study): the squares' own t tests,
   * each made after all the other terms, take the place of the center-run curvature test and of
   * the two-level notes on orthogonality and Lenth's method (Montgomery 8th ed., section 11.3).
   */
  | { readonly kind: 'squares'; readonly alpha: number; readonly terms: readonly { readonly name: string; readonly letters: string; readonly p: number | null }[] }
  /** A Plackett-Burman plan: main effects partly mixed with two-factor interactions (correlations up to `largestCorrelation`). */
  | { readonly kind: 'partial-aliasing'; readonly runs: number; readonly largestCorrelation: number }
  /** Model terms the runs cannot separate, and what each kept estimate carries. */
  | {
      readonly kind: 'aliased';
      readonly count: number;
      readonly carried: readonly { readonly letters: string; readonly estimates: string }[];
      readonly withInterceptOrBlocks: boolean;
      /** Each term left out, with the combination of kept columns it equals ("CD" with "AB"), in the list the screen shows. */
      readonly terms?: readonly { readonly letters: string; readonly equals: string }[];
    };

export type VerdictKind = Verdict['kind'];

/**
 * Whether a verdict is a warning (it goes into `warnings`) or a plain statement (a flat
 * curvature test, lack of fit that is not significant). Cost O(1).
 * Example: isWarning({ kind: 'not-orthogonal' }) -> true.
 */
export function isWarning(v: Verdict): boolean {
  switch (v.kind) {
    case 'curvature':
      return v.outcome === 'curved' ? (v.squares ?? []).length === 0 : v.outcome !== 'flat';
    case 'lack-of-fit':
      return v.outcome === 'significant';
    case 'squares':
      return false;
    default:
      return true;
  }
}
