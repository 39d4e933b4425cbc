/**
 * Orthogonal blocking: blocks are orthogonal to a model when every model column (after the
 * intercept) sums, within each block, to the block's share of its total:
 * sum_{u in b} z_u = (n_b / N) sum_u z_u, so the block effects and the model coefficients are
 * estimated independently (Box and Hunter 1957, Annals of Mathematical Statistics 28, 195-241,
 * section 8, from memory: for a second-order design, each block a first-order orthogonal design
 * and each block's share of sum x_i^2 equal to its share of the runs; Montgomery, Design and
 * Analysis of Experiments, 8th ed., section 11.4.3).
 */
import { InputError } from '../errors.ts';
import { termValue, type Term } from '../model/term.ts';
import { BLOCK_SUM_TOLERANCE, TINY_SCALE } from '../tolerance.ts';

/**
 * True when the blocks of the coded design points are orthogonal to the model with these terms
 * (see the file comment); true for a single block. Cost O(N x terms).
 * Throws InputError for a block list whose length differs from the runs, or no runs.
 * Example: a 2^2 factorial with 3 centers in block 1 and axial points at +-sqrt2 with 3 centers
 * in block 2 is orthogonally blocked for the full quadratic (Montgomery 8th ed., section 11.4.3).
 */
export function blocksOrthogonal(points: readonly (readonly number[])[], blocks: readonly number[], terms: readonly Term[]): boolean {
  const n = points.length;
  if (n === 0) throw new InputError('Block orthogonality needs at least one run, got none');
  if (blocks.length !== n) throw new InputError(`Block orthogonality needs one block per run (${n}), got ${blocks.length}`);
  const levels = [...new Set(blocks)];
  if (levels.length < 2) return true;
  for (const t of terms) {
    const z = points.map((p) => termValue(t, p));
    const total = z.reduce((s, v) => s + v, 0);
    const scale = Math.max(TINY_SCALE, z.reduce((s, v) => s + Math.abs(v), 0));
    for (const b of levels) {
      let sum = 0;
      let nb = 0;
      for (let u = 0; u < n; u++) if (blocks[u] === b) (sum += z[u]), nb++;
      if (Math.abs(sum - (nb / n) * total) > BLOCK_SUM_TOLERANCE * scale) return false;
    }
  }
  return true;
}
