/**
 * The diagnostics step of the analysis: per run the fitted value, residual, leverage, internally
 * studentized residual r_i = e_i / (sigma sqrt(1 - h_i)) and externally studentized (deleted)
 * residual r_i sqrt((df - 1) / (df - r_i^2)); and the fit's R^2 = 1 - RSS/SS_T, adjusted
 * R^2 = 1 - (RSS/df_res) / (SS_T/(n - 1)) and predicted R^2 = 1 - PRESS/SS_T with
 * PRESS = sum (e_i / (1 - h_i))^2. A run with leverage within LEVERAGE_TOLERANCE of 1 alone fixes
 * its fitted value: its studentized residuals and the PRESS are then null.
 * Sources: Belsley, Kuh and Welsch, Regression Diagnostics (1980), Eq. 2.26; Montgomery, Peck
 * and Vining, Introduction to Linear Regression Analysis, 5th ed., sections 4.2.3 (R-student)
 * and 4.3 (PRESS). Cost O(n).
 * Example: a saturated fit (df_res 0) -> every studentized residual null, r2 1, r2adj and r2pred null.
 */
import { LEVERAGE_TOLERANCE } from '../tolerance.ts';
import type { RunDiagnostics } from './analysis.ts';
import type { LinearFit } from './linear-fit.ts';

export interface FitDiagnostics {
  readonly runs: readonly RunDiagnostics[];
  readonly r2: number;
  readonly r2adj: number | null;
  readonly r2pred: number | null;
}

export function runDiagnostics(
  fit: LinearFit,
  y: readonly number[],
  labels: readonly string[],
  kinds: readonly ('factorial' | 'center' | 'other')[],
  sigma: number | null,
  ssTotal: number,
): FitDiagnostics {
  const n = y.length;
  const dfRes = fit.dfResidual;
  const leverageOne = 1 - LEVERAGE_TOLERANCE;
  let press = 0;
  let pressOk = true;
  const runs: RunDiagnostics[] = [];
  const withSigma = sigma !== null && sigma > 0;
  // sigma sqrt(1 - h) for the last leverage seen: a complete balanced design has two leverages only.
  let lastH = NaN;
  let scale = NaN;
  for (let i = 0; i < n; i++) {
    const h = fit.leverage[i];
    const e = fit.residuals[i];
    if (h >= leverageOne) pressOk = false;
    else press += (e / (1 - h)) ** 2;
    if (withSigma && h !== lastH) {
      lastH = h;
      scale = sigma! * Math.sqrt(1 - h);
    }
    const r = withSigma && h < leverageOne ? e / scale : null;
    runs.push({
      label: labels[i] ?? String(i + 1),
      y: y[i],
      fitted: fit.fitted[i],
      residual: e,
      leverage: h,
      studentized: r,
      deleted: r !== null && dfRes > 1 && dfRes - r * r > 0 ? r * Math.sqrt((dfRes - 1) / (dfRes - r * r)) : null,
      kind: kinds[i],
    });
  }
  return {
    runs,
    r2: 1 - fit.rss / ssTotal,
    r2adj: dfRes > 0 ? 1 - fit.rss / dfRes / (ssTotal / (n - 1)) : null,
    r2pred: pressOk ? 1 - press / ssTotal : null,
  };
}
