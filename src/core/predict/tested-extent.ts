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
 * 8th ed., section 11.4.2, from memory). Categorical factors keep 1. Cost O(n k) for n runs.
 * Example: a 2-factor central composite design with alpha 1.414 -> [1.414, 1.414]; a 2^2 with
 * center runs -> [1, 1].
 */
export function testedExtent(factors: readonly Factor[], coded: readonly (readonly number[])[]): number[] {
  const k = factors.length;
  const pos = new Float64Array(k);
  const neg = new Float64Array(k);
  const tol = CENTER_TOLERANCE; // a local: module bindings are getters under some loaders
  const numeric = new Uint8Array(k);
  for (let f = 0; f < k; f++) numeric[f] = factors[f].kind === 'numeric' ? 1 : 0;
  for (let i = 0; i < coded.length; i++) {
    const row = coded[i];
    // A run is on the axis of f when every OTHER numeric factor is at its center: count the
    // numeric factors off center once, so each run costs O(k), not O(k^2).
    let off = 0;
    let offAt = -1;
    for (let f = 0; f < k; f++) {
      if (numeric[f] && !(Math.abs(row[f]) <= tol)) {
        off++;
        offAt = f;
      }
    }
    if (off > 1) continue; // two factors off center: on no axis
    for (let f = 0; f < k; f++) {
      if (!numeric[f] || (off === 1 && offAt !== f)) continue;
      const v = row[f];
      if (!Number.isFinite(v)) continue;
      if (v > pos[f]) pos[f] = v;
      if (-v > neg[f]) neg[f] = -v;
    }
  }
  const out: number[] = [];
  for (let f = 0; f < k; f++) out.push(Math.max(1, Math.min(pos[f], neg[f])));
  return out;
}

/** testedExtent of runs that all lie in the factorial box (every |setting| <= 1, as on Yates' path): 1 for every factor. Cost O(k). */
export function boxExtent(k: number): number[] {
  const out: number[] = [];
  for (let f = 0; f < k; f++) out.push(1);
  return out;
}
