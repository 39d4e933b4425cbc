/**
 * Effects of given contrast columns, for Lenth's method over a screening design's orthogonal
 * columns (the factors' and the unused ones of a Plackett-Burman plan) rather than over
 * interactions that are only partly aliased with them.
 */
import { InputError } from '../errors.ts';
import { applyQt, householderQr } from '../linalg/householder-qr.ts';
import { solveUpper } from '../linalg/triangular.ts';

export interface ContrastEffect {
  /** Index of the column among those given. */
  readonly column: number;
  /** Twice its least-squares coefficient: the change from -1 to +1. */
  readonly effect: number;
}

/**
 * The effect of each contrast column by least squares of y on an intercept and the columns,
 * by Householder QR with rank detection; a column that the runs cannot separate from earlier
 * ones (a run missing from the plan) is left out. With every run of an N-run Plackett-Burman
 * design present this is the usual contrast estimate, effect_j = (x_j . y) / (N / 2) (Plackett
 * and Burman 1946; Lenth 1989, Technometrics 31, 469-473, section 2, applies his method to
 * these N - 1 contrasts). Source of the least-squares form: common practice.
 * Cost O(n p^2) for n runs and p columns.
 * Throws InputError for columns whose length is not the number of responses, or no runs.
 * Example: columns [[-1, 1, -1, 1], [-1, -1, 1, 1]] and y [1, 3, 2, 6] -> effects 3 and 2.
 */
export function contrastEffects(columns: readonly (readonly number[])[], y: readonly number[]): ContrastEffect[] {
  const n = y.length;
  if (n === 0) throw new InputError('Contrast effects need runs with a response, got none');
  columns.forEach((c, j) => {
    if (c.length !== n) throw new InputError(`Contrast column ${j + 1} needs one entry per run (${n}), got ${c.length}`);
  });
  const p = columns.length + 1;
  const x = new Float64Array(n * p);
  for (let i = 0; i < n; i++) x[i] = 1;
  columns.forEach((c, j) => {
    for (let i = 0; i < n; i++) x[(j + 1) * n + i] = c[i];
  });
  const qr = householderQr(x, n, p);
  const rhs = Float64Array.from(y);
  applyQt(qr, rhs);
  const coef = rhs.slice(0, qr.rank);
  solveUpper(qr.r, qr.rank, coef);
  const out: ContrastEffect[] = [];
  for (let a = 0; a < qr.rank; a++) {
    const j = qr.kept[a];
    if (j > 0) out.push({ column: j - 1, effect: 2 * coef[a] });
  }
  return out;
}
