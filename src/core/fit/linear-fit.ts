/**
 * The result of a least-squares fit, whichever path computed it (Householder QR in general,
 * Yates' algorithm for complete balanced factorials). Everything the analysis reports is
 * derived from this.
 */
import type { QrFactor } from '../linalg/householder-qr.ts';
import type { Column } from './columns.ts';

export interface AliasedColumn {
  /** Index into `columns` of the column that could not be separated. */
  readonly column: number;
  /** It equals this combination of estimable columns: x_aliased = sum weight * x_column. */
  readonly combination: readonly { readonly column: number; readonly weight: number }[];
}

export interface LinearFit {
  readonly n: number;
  readonly columns: readonly Column[];
  /** Indices into `columns` of the estimable columns, in model order. */
  readonly kept: Int32Array;
  /** Coefficient of each kept column. */
  readonly coef: Float64Array;
  /** (X'X)^-1 over the kept columns, column-major rank x rank. */
  readonly covUnscaled: Float64Array;
  /** Sequential sum of squares of each kept column, in model order (the intercept's first). */
  readonly seqSS: Float64Array;
  readonly fitted: Float64Array;
  readonly residuals: Float64Array;
  readonly leverage: Float64Array;
  /** X R^-1 over the kept columns, column-major n x rank (the thin Q1 up to signs), when the fit computed leverage by QR. */
  readonly basis?: Float64Array;
  /** Residual sum of squares. */
  readonly rss: number;
  readonly dfResidual: number;
  readonly aliased: readonly AliasedColumn[];
  /** True when all kept columns are mutually orthogonal (sequential = adjusted sums of squares). */
  readonly orthogonal: boolean;
  readonly method: 'qr' | 'yates';
  /** On the QR path, the factorisation of the columns, kept for steps that fit other responses to the same model (residual-ss.ts). */
  readonly qr?: QrFactor;
  /** On a fit made on the plan (fit-on-plan.ts), the factorisation of the nominal matrix, from which a wider fit on the same plan can resume. */
  readonly planQr?: QrFactor;
}
