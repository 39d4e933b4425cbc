/**
 * Center runs: every numeric factor at the middle of its range (coded 0), to estimate pure error
 * and check for curvature without disturbing the factorial estimates (Montgomery, Design and
 * Analysis of Experiments, 8th ed., section 6.8). A categorical factor has no middle, so with
 * categorical factors present one center run becomes one run at each combination of their levels
 * (Montgomery, 8th ed., section 6.8, "center points with qualitative factors").
 */
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';

/**
 * One set of center runs: numeric factors at 0, categorical factors through every combination
 * of their levels in standard order (first categorical factor fastest). 2^c rows for c
 * categorical factors. Throws InputError when no factor is numeric.
 * Example: factors (Temperature numeric, Powder categorical) -> [[0,-1], [0,1]].
 */
export function centerSet(factors: readonly Factor[]): number[][] {
  const categorical = factors.map((f, i) => (f.kind === 'categorical' ? i : -1)).filter((i) => i >= 0);
  if (categorical.length === factors.length) {
    throw new InputError(`Center runs need at least one numeric factor; all ${factors.length} factors are categorical (${factors.map((f) => f.name).join(', ')})`);
  }
  const rows: number[][] = [];
  for (let i = 0; i < 2 ** categorical.length; i++) {
    const row = new Array<number>(factors.length).fill(0);
    categorical.forEach((f, j) => (row[f] = (i >> j) & 1 ? 1 : -1));
    rows.push(row);
  }
  return rows;
}

/**
 * Spreads `count` center runs (or center sets) as evenly as possible over `blocks` blocks: each
 * block gets floor(count/blocks), and the first count mod blocks blocks one more.
 * Throws InputError for a negative or fractional count or fewer than 1 block.
 * Example: spreadOverBlocks(5, 2) -> [3, 2].
 */
export function spreadOverBlocks(count: number, blocks: number): number[] {
  if (!Number.isInteger(count) || count < 0) throw new InputError(`Center runs are a whole number, 0 or more, got ${count}`);
  if (!Number.isInteger(blocks) || blocks < 1) throw new InputError(`Center runs are spread over 1 or more blocks, got ${blocks}`);
  const base = Math.floor(count / blocks);
  return Array.from({ length: blocks }, (_, j) => base + (j < count % blocks ? 1 : 0));
}
