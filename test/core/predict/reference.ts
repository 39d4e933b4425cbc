/**
 * Outside references for the prediction tests: the regression library
 * ml-regression-multivariate-linear 2.0.4 (a general-purpose least-squares fit; its
 * stdErrorMatrix is s^2 (X'X)^-1 with the intercept last) for the fit and se_fit =
 * sqrt(x0' Cov x0), and jstat 1.9.6 for the t quantile. The intervals are then formed as in
 * Montgomery, Design and Analysis of Experiments, 8th ed., section 10.6, Eqs. 10.39-10.41.
 */
import { createRequire } from 'node:module';
import MLR from 'ml-regression-multivariate-linear';
import { termValue } from '../../../src/core/model/term.ts';
import type { ResponseData } from '../../../src/core/study/response-data.ts';

const require = createRequire(import.meta.url);
const jStat = require('jstat') as { studentt: { inv(p: number, df: number): number } };

/** jstat 1.9.6: the p quantile of Student's t with df degrees of freedom. */
export function jstatT(p: number, df: number): number {
  return jStat.studentt.inv(p, df);
}

function blockColumns(data: ResponseData, i: number): number[] {
  if (!data.blocks) return [];
  const levels = [...new Set(data.blocks)].sort((a, b) => a - b);
  if (levels.length < 2) return [];
  const last = levels[levels.length - 1];
  const b = data.blocks[i];
  // effect (sum-to-zero) coding, as the analysis core documents for blocks
  return levels.slice(0, -1).map((l) => (b === l ? 1 : b === last ? -1 : 0));
}

export interface ReferenceInterval {
  fit: number;
  se: number;
  ci: [number, number];
  pi: [number, number];
}

/** A reference fit of the same model, and intervals at coded settings x0 for an average block (block columns 0). */
export function referenceModel(data: ResponseData, terms: readonly number[], level = 0.95) {
  return referenceColumnsModel(data, (row) => terms.map((t) => termValue(t, row)), level);
}

/**
 * The same, with the model columns built by the caller from the coded settings (so a test can
 * write x1^2 or x1 x2 by hand, independent of the core's term code).
 */
export function referenceColumnsModel(data: ResponseData, columns: (coded: readonly number[]) => number[], level = 0.95) {
  const x = data.coded.map((row, i) => [...blockColumns(data, i), ...columns(row)]);
  const width = columns(data.coded[0]).length;
  const nb = x[0].length - width;
  const reg = new MLR(x, data.y.map((v) => [v]), { intercept: true, statistics: true });
  const cov = reg.stdErrorMatrix.to2DArray();
  const df = data.y.length - (x[0].length + 1);
  const t = jstatT(1 - (1 - level) / 2, df);
  const s = reg.stdError;
  return {
    reg,
    at(x0: readonly number[]): ReferenceInterval {
      const row = [...Array(nb).fill(0), ...columns(x0)];
      const fit = reg.predict(row)[0];
      const v = [...row, 1];
      let q = 0;
      for (let a = 0; a < v.length; a++) for (let b = 0; b < v.length; b++) q += v[a] * cov[a][b] * v[b];
      const se = Math.sqrt(q);
      const pe = Math.sqrt(s * s + q);
      return { fit, se, ci: [fit - t * se, fit + t * se], pi: [fit - t * pe, fit + t * pe] };
    },
  };
}
