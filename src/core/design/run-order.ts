/**
 * Run order. Randomizing the order protects the effect estimates from whatever drifts during the
 * experiment (tool wear, ambient temperature, a new batch of material, an operator's learning):
 * in standard order such a drift is mixed into the effects of the factors that change least
 * often. The order is shuffled with the Fisher-Yates shuffle (Fisher and Yates 1938, Statistical
 * Tables; in Durstenfeld's form, Communications of the ACM 7, 420, 1964) driven by PCG32
 * (see random.ts), within each block, blocks in order, so the same seed gives the same order on
 * every device.
 */
import { InputError } from '../errors.ts';
import { pcg32, type Pcg32 } from './random.ts';

/**
 * Shuffles `items` in place and returns them: for i from n down to 2, swap item i-1 with item
 * j = rng.bounded(i). Exactly the card deal of the PCG32 reference demo, so its published deal
 * pins this function. Cost: n - 1 draws. An empty or one-item list is returned unchanged.
 * Example: fisherYatesShuffle([1,2,3], pcg32(42)) -> a permutation of [1,2,3], the same every time.
 */
export function fisherYatesShuffle<T>(items: T[], rng: Pcg32): T[] {
  for (let i = items.length; i > 1; i--) {
    const j = rng.bounded(i);
    const t = items[j];
    items[j] = items[i - 1];
    items[i - 1] = t;
  }
  return items;
}

export interface OrderOptions {
  /** Seed of the shuffle; null keeps standard order. */
  readonly seed: number | null;
  /** Factors (indices) kept sorted, low first, within each block: hard-to-change factors. */
  readonly sortBy?: readonly number[];
}

/**
 * Puts runs in run order: blocks in order; within a block, shuffled when a seed is given (one
 * PCG32 stream through all blocks in order) or kept as given (standard order); then, when
 * `sortBy` names factors, stably sorted by their coded settings (low, center, high), so the
 * shuffle still orders runs within each group. Returns a new array.
 * Throws InputError for a sort factor outside the runs' settings.
 * Example: orderRuns(runs, {seed: null}) keeps the given order block by block.
 */
export function orderRuns<T extends { readonly block: number; readonly coded: readonly number[] }>(runs: readonly T[], options: OrderOptions): T[] {
  const sortBy = options.sortBy ?? [];
  const k = runs[0]?.coded.length ?? 0;
  for (const f of sortBy) {
    if (!Number.isInteger(f) || f < 0 || f >= k) throw new InputError(`A factor kept sorted must be one of the ${k} factors, got factor ${f + 1}`);
  }
  const blocks = [...new Set(runs.map((r) => r.block))].sort((a, b) => a - b);
  const rng = options.seed === null ? null : pcg32(options.seed);
  const out: T[] = [];
  for (const b of blocks) {
    let inBlock = runs.filter((r) => r.block === b);
    if (rng) inBlock = fisherYatesShuffle([...inBlock], rng);
    if (sortBy.length > 0) {
      inBlock = inBlock
        .map((r, i) => ({ r, i }))
        .sort((x, y) => {
          for (const f of sortBy) if (x.r.coded[f] !== y.r.coded[f]) return x.r.coded[f] - y.r.coded[f];
          return x.i - y.i;
        })
        .map((x) => x.r);
    }
    out.push(...inBlock);
  }
  return out;
}
