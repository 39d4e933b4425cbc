/**
 * The prediction interval for the mean of m new runs at x0, worked out with general-purpose
 * reference libraries for the confirmation tests: y-hat +- t(0.975, df) s sqrt(1/m + x0'(X'X)^-1 x0)
 * (Montgomery, Design and Analysis of Experiments, 8th ed., section 10.6, from memory), with the
 * least-squares fit by ml-regression-multivariate-linear (intercept added) and t and (X'X)^-1 by
 * jstat. X holds the model's columns without the intercept; x0 the same columns at the setting.
 */
import jStat from 'jstat';
import MLR from 'ml-regression-multivariate-linear';

export function referenceInterval(X: readonly (readonly number[])[], y: readonly number[], x0: readonly number[], m: number): { fit: number; half: number } {
  const rows = X.map((r) => [...r]);
  const reg = new MLR(rows, y.map((v) => [v]));
  const fit = reg.predict([...x0])[0];
  const df = rows.length - (x0.length + 1);
  const s = Math.sqrt(y.reduce((a, v, i) => a + (v - reg.predict(rows[i])[0]) ** 2, 0) / df);
  const A = rows.map((r) => [1, ...r]);
  const p = x0.length + 1;
  const xtx = Array.from({ length: p }, (_, i) => Array.from({ length: p }, (_, j) => A.reduce((acc, r) => acc + r[i] * r[j], 0)));
  const inv = jStat.inv(xtx) as number[][];
  const v = [1, ...x0];
  const q = v.reduce((acc, vi, i) => acc + vi * v.reduce((a2, vj, j) => a2 + inv[i][j] * vj, 0), 0);
  return { fit, half: jStat.studentt.inv(0.975, df) * s * Math.sqrt(1 / m + q) };
}
