/**
 * The ANOVA step of the analysis: the sequential table (blocks, model, each term after those
 * above it, then residual, lack of fit, pure error and total) and, when the columns are not
 * orthogonal, the adjusted table (each term after all the others).
 * Formulas: sequential SS of a column = (Q'y)_j^2 from the QR (or N_f b^2 on the Yates path);
 * adjusted SS of a term = b_j^2 / (X'X)^-1_jj; adjusted SS of the blocks = b_B' V_BB^-1 b_B over
 * the block columns; F = MS / MS_res on (df, df_res); lack of fit SS = RSS - SS_pe on
 * df_res - df_pe, tested by MS_lof / MS_pe. For orthogonal columns the one-df F of a term is the
 * square of its t, so its p is the t-test's. Source: Montgomery, Design and Analysis of
 * Experiments, 8th ed., sections 6.3 (ANOVA of a 2^k), 10.4 (the extra sum of squares, which
 * gives the adjusted rows) and 10.7 (lack of fit).
 * Cost O(p + b^3) for b block columns.
 * Example: the 2^2 yield data (Montgomery 8th ed., Table 6.2) -> SS_A 208.33, SS_B 75.00, SS_E 31.33 on 8 df.
 */
import { fUpperP } from '../dist/f-dist.ts';
import { inverseQuadraticForm } from '../linalg/small-solve.ts';
import type { AnovaRow, AnovaTable } from './analysis.ts';
import type { ColumnLabel } from './column-labels.ts';
import type { LinearFit } from './linear-fit.ts';

export interface AnovaTables {
  readonly anova: AnovaTable;
  readonly anovaAdjusted: AnovaTable | null;
  readonly dfModel: number;
  readonly dfBlocks: number;
  /** Lack-of-fit df, null without pure error. */
  readonly dfLackOfFit: number | null;
  /** p of the lack-of-fit test, null when it cannot be made (no pure error, no lack-of-fit df, or MS_pe = 0). */
  readonly lackOfFitP: number | null;
  /** Total sum of squares about the mean. */
  readonly ssTotal: number;
}

/**
 * `labels`: every column's name (column-labels.ts); `termP`: the t-test p of each kept term
 * column in model order (used for orthogonal columns); `pure`: pure error (ss, df).
 */
export function anovaTables(
  fit: LinearFit,
  y: readonly number[],
  labels: readonly ColumnLabel[],
  termP: readonly (number | null)[],
  pure: { readonly ss: number; readonly df: number },
): AnovaTables {
  const n = y.length;
  const m = fit.kept.length;
  const dfRes = fit.dfResidual;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += y[i];
  mean /= n;
  let ssTot = 0;
  for (let i = 0; i < n; i++) ssTot += (y[i] - mean) ** 2;
  const msRes = dfRes > 0 ? fit.rss / dfRes : null;
  const fRow = (source: string, df: number, ss: number): AnovaRow => {
    const ms = df > 0 ? ss / df : null;
    const f = ms !== null && msRes !== null && msRes > 0 ? ms / msRes : null;
    return { source, df, ss, ms, f, p: f !== null ? fUpperP(f, df, dfRes) : null };
  };
  let ssBlocksSeq = 0;
  let dfBlocks = 0;
  let ssModel = 0;
  let dfModel = 0;
  const termRowsSeq: AnovaRow[] = [];
  const termRowsAdj: AnovaRow[] = [];
  const blockIdx: number[] = [];
  // Orthogonal columns have no adjusted table (it would equal the sequential one): its rows, each
  // an F tail, are only worked out when it is reported.
  const adjusted = !fit.orthogonal;
  const tByF = fit.orthogonal && msRes !== null && msRes > 0;
  for (let j = 1; j < m; j++) {
    const c = fit.columns[fit.kept[j]];
    if (c.kind === 'block') {
      ssBlocksSeq += fit.seqSS[j];
      dfBlocks++;
      blockIdx.push(j);
    } else if (c.kind === 'term') {
      ssModel += fit.seqSS[j];
      dfModel++;
      const name = labels[fit.kept[j]].name;
      const ss = fit.seqSS[j];
      if (tByF) {
        // Orthogonal columns: the one-df F is the square of the term's t, so its p is the t-test's.
        termRowsSeq.push({ source: name, df: 1, ss, ms: ss, f: ss / msRes!, p: termP[dfModel - 1] ?? null });
      } else termRowsSeq.push(fRow(name, 1, ss));
      if (adjusted) termRowsAdj.push(fRow(name, 1, (fit.coef[j] * fit.coef[j]) / fit.covUnscaled[j * m + j]));
    }
  }
  const dfLof = dfRes - pure.df;
  const tail: AnovaRow[] = [{ source: 'Residual', df: dfRes, ss: fit.rss, ms: msRes, f: null, p: null }];
  let lofP: number | null = null;
  if (pure.df > 0 && dfLof > 0) {
    const ssLof = Math.max(0, fit.rss - pure.ss);
    const msPe = pure.ss / pure.df;
    const f = msPe > 0 ? ssLof / dfLof / msPe : null;
    lofP = f !== null ? fUpperP(f, dfLof, pure.df) : null;
    tail.push({ source: 'Lack of fit', df: dfLof, ss: ssLof, ms: ssLof / dfLof, f, p: lofP });
  }
  if (pure.df > 0) tail.push({ source: 'Pure error', df: pure.df, ss: pure.ss, ms: pure.ss / pure.df, f: null, p: null });
  tail.push({ source: 'Total', df: n - 1, ss: ssTot, ms: null, f: null, p: null });
  const head = (blocksSS: number): AnovaRow[] => [...(dfBlocks > 0 ? [fRow('Blocks', dfBlocks, blocksSS)] : []), fRow('Model', dfModel, ssModel)];
  const seqRows = head(ssBlocksSeq);
  for (const r of termRowsSeq) seqRows.push(r);
  for (const r of tail) seqRows.push(r);
  const anova: AnovaTable = { type: 'sequential', rows: seqRows };
  let anovaAdjusted: AnovaTable | null = null;
  if (!fit.orthogonal) {
    let ssBlocksAdj = ssBlocksSeq;
    if (blockIdx.length > 0) {
      const sub = new Float64Array(blockIdx.length * blockIdx.length);
      const b = blockIdx.map((j) => fit.coef[j]);
      blockIdx.forEach((ja, a) => blockIdx.forEach((jb, bb) => (sub[bb * blockIdx.length + a] = fit.covUnscaled[jb * m + ja])));
      ssBlocksAdj = inverseQuadraticForm(sub, blockIdx.length, b);
    }
    anovaAdjusted = { type: 'adjusted', rows: [...head(ssBlocksAdj), ...termRowsAdj, ...tail] };
  }
  return { anova, anovaAdjusted, dfModel, dfBlocks, dfLackOfFit: pure.df > 0 ? dfLof : null, lackOfFitP: lofP, ssTotal: ssTot };
}
