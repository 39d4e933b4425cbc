/**
 * Rotatability of a second-order design: the variance of y-hat depends only on the distance from
 * the center when the design's moments up to order four are those of a sphere: every moment with
 * an odd power is 0, every [ii] = sum_u x_iu^2 / N is the same, and [iiii] = 3 [iijj] for every
 * i != j, all equal (Box and Hunter 1957, Annals of Mathematical Statistics 28, 195-241,
 * section 4, from memory; Montgomery, Design and Analysis of Experiments, 8th ed., section 11.4.1).
 */
import { InputError } from '../errors.ts';
import { MOMENT_TOLERANCE, TINY_SCALE } from '../tolerance.ts';

/**
 * True when the coded design points satisfy the moment conditions of rotatability (see the file
 * comment). Cost O(N k^4) (every monomial of degree 1 to 4).
 * Throws InputError for no runs, fewer than one factor, or rows of different lengths.
 * Example: a 2^2 factorial with axial points at +-sqrt2 and center runs -> true; at +-1 -> false.
 */
export function isRotatable(points: readonly (readonly number[])[]): boolean {
  const n = points.length;
  if (n === 0) throw new InputError('Rotatability needs at least one run, got none');
  const k = points[0].length;
  if (k < 1) throw new InputError('Rotatability needs at least one factor, got none');
  if (points.some((p) => p.length !== k)) throw new InputError(`Every run needs ${k} settings`);
  const moment = (idx: number[]) => points.reduce((s, p) => s + idx.reduce((m, i) => m * p[i], 1), 0) / n;
  const second = moment([0, 0]);
  const scale = Math.max(second, ...Array.from({ length: k }, (_, i) => moment([i, i])), TINY_SCALE);
  const tol = MOMENT_TOLERANCE * Math.max(scale, scale * scale);
  const lambda4 = k > 1 ? moment([0, 0, 1, 1]) : moment([0, 0, 0, 0]) / 3;
  // Every multi-index of degree 1..4 with indices non-decreasing.
  const visit = (idx: number[], start: number): boolean => {
    if (idx.length > 0) {
      const counts = new Map<number, number>();
      for (const i of idx) counts.set(i, (counts.get(i) ?? 0) + 1);
      const odd = [...counts.values()].some((c) => c % 2 === 1);
      const m = moment(idx);
      let expected: number;
      if (odd) expected = 0;
      else if (idx.length === 2) expected = second;
      else if (idx.length === 4) expected = counts.size === 1 ? 3 * lambda4 : lambda4;
      else expected = m;
      if (Math.abs(m - expected) > tol) return false;
    }
    if (idx.length === 4) return true;
    for (let i = start; i < k; i++) if (!visit([...idx, i], i)) return false;
    return true;
  };
  return visit([], 0);
}
