/**
 * Full two-level factorial in standard (Yates) order: the first factor alternates fastest, run i
 * (from 0) has factor j at +1 when bit j of i is set and at -1 otherwise (Yates 1937, The Design
 * and Analysis of Factorial Experiments; Montgomery, Design and Analysis of Experiments, 8th ed.,
 * section 6.3: (1), a, b, ab, c, ...).
 */
import { InputError } from '../errors.ts';
import { checkRunLimit } from './run-limit.ts';

/** Most factors of a full factorial: 2^10 = 1024 runs, the run limit. */
export const MAX_FULL_FACTORIAL_FACTORS = 10;

/**
 * The 2^k coded runs (-1/+1) in standard order, one row per run, one entry per factor. Cost: k*2^k.
 * Throws InputError for k below 1, not whole, or above 10 (2^11 = 2048 runs is over the 1024-run limit).
 * Example: fullFactorial(2) -> [[-1,-1], [1,-1], [-1,1], [1,1]].
 */
export function fullFactorial(k: number): number[][] {
  if (!Number.isInteger(k) || k < 1) throw new InputError(`A full factorial needs a whole number of factors, 1 or more, got ${k}`);
  if (k > MAX_FULL_FACTORIAL_FACTORS) checkRunLimit(2 ** k, `2^${k} = ${2 ** k} factorial runs`);
  const rows: number[][] = [];
  for (let i = 0; i < 2 ** k; i++) {
    const row: number[] = [];
    for (let j = 0; j < k; j++) row.push((i >> j) & 1 ? 1 : -1);
    rows.push(row);
  }
  return rows;
}
