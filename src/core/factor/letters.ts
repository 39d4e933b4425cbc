/**
 * Factor letters: A, B, C, ... in declared order, skipping I, which the trade keeps for the
 * identity column of the defining relation (common practice; e.g. Montgomery, Design and
 * Analysis of Experiments, 8th ed., section 8.2).
 * Example: factorLetters(10) -> ['A','B','C','D','E','F','G','H','J','K'].
 */
import { InputError } from '../errors.ts';

const ALPHABET = 'ABCDEFGHJKLMNOPQRSTUVWXYZ';

/** The most factors a study may have: one per letter of the alphabet without I. */
export const MAX_FACTORS = ALPHABET.length;

/** Letters for `count` factors in declared order. Throws when count exceeds MAX_FACTORS. */
export function factorLetters(count: number): string[] {
  if (!Number.isInteger(count) || count < 0 || count > MAX_FACTORS) {
    throw new InputError(`A study can have 1 to ${MAX_FACTORS} factors, got ${count}`);
  }
  return ALPHABET.slice(0, count).split('');
}
