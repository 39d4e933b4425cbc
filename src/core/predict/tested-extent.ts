/**
 * The tested range of each factor in coded units: the factorial box [-1, +1], widened on an axis
 * where the runs hold a pair of axial runs (every other numeric factor at its center, this one at
 * -a and +a with a > 1), as a central composite design has at its axial distance. Those runs test
 * the model out to a on that axis, so a prediction there is not an extrapolation.
 */
import type { Factor } from '../factor/factor.ts';
import { CENTER_TOLERANCE } from '../tolerance.ts';

/**
 * Per factor, the half-width e >= 1 of its tested range in coded units: the smaller of the
 * largest +x and the largest |-x| over the axial runs on its axis (runs with every other numeric
 * factor within CENTER_TOLERANCE of 0), or 1 when the axis has no such pair. Requiring both
 * signs keeps a one-sided path of steepest ascent along one factor from widening the range: only
 * the star points of a central composite design come in pairs at +-alpha (Box and Wilson 1951,
 * Journal of the Royal Statistical Society B 13; Montgomery, Design and Analysis of Experiments,
 * 8th ed., section 11.4.2, from memory). Categorical factors keep 1. Cost O(n k^2) for n runs.
 * Example: a 2-factor central composite design with alpha 1.414 -> [1.414, 1.414]; a 2^2 with
 * center runs -> [1, 1].
 */
export function testedExtent(factors: readonly Factor[], coded: readonly (readonly number[])[]): number[] {
  const k = factors.length;
  const pos = new Array<number>(k).fill(0);
  const neg = new Array<number>(k).fill(0);
  const tol = CENTER_TOLERANCE; // a local: module bindings are getters under some loaders
  const numeric = factors.map((fac) => fac.kind === 'numeric'); // read k^2 times per run
  for (const row of coded) {
    for (let f = 0; f < k; f++) {
      if (!numeric[f]) continue;
      let onAxis = true;
      for (let g = 0; g < k && onAxis; g++) {
        if (g !== f && numeric[g] && !(Math.abs(row[g]) <= tol)) onAxis = false;
      }
      if (!onAxis || !Number.isFinite(row[f])) continue;
      if (row[f] > pos[f]) pos[f] = row[f];
      if (-row[f] > neg[f]) neg[f] = -row[f];
    }
  }
  return factors.map((_, f) => Math.max(1, Math.min(pos[f], neg[f])));
}
