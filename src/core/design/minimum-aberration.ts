/**
 * Exhaustive search for a minimum aberration regular fraction 2^(k-p) (Fries and Hunter 1980,
 * Technometrics 22, 601-608: of two designs, the one with fewer words of the shortest length
 * where their word-length patterns first differ has less aberration).
 *
 * Method: every regular 2^(k-p) of resolution III or more is, after relabeling factors, one
 * whose first k-p factors are basic and whose p generated factors take distinct columns that are
 * products of two or more basic factors. The search runs through all p-subsets of those
 * 2^(k-p) - 1 - (k-p) columns (branch and bound): adding a generator only adds words, so every
 * count of the word-length pattern can only grow, and a partial design whose pattern already
 * exceeds the best found (lexicographically, from length 1 up) is cut off with all its
 * extensions. Relabeling the basic factors does not change the pattern, so the lightest
 * generator column may be taken as AB, ABC, ABCD, ... (the first columns of each weight). Cost: at
 * worst C(columns, p) leaves of 2^p words each; 16- and 32-run sizes take well under a second,
 * the largest 64- and 128-run sizes minutes.
 */
import { InputError } from '../errors.ts';
import { factorLetters } from '../factor/letters.ts';
import { termFactors, termOrder } from '../model/term.ts';

export interface AberrationResult {
  /** Word-length pattern as a list: entry j is the number of words of length j (0..k). */
  readonly pattern: readonly number[];
  /** Generated factors' products over the basic factors (bit masks), in generator order; null when nothing beats the bound. */
  readonly columns: readonly number[] | null;
  /** Search nodes visited (partial designs). */
  readonly nodes: number;
}

function comparePatterns(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i] - b[i];
  return 0;
}

/**
 * Word-length pattern (entry j = number of words of length j, j = 0..k) of the fraction whose
 * generated factors k-p, ..., k-1 take the given products of the k-p basic factors.
 * Cost: 2^p word products. Throws InputError for a product outside the basic factors.
 * Example: patternOf(7, [0b111, 0b1011, 0b1101]) -> [0,0,0,0,7,0,0,0] (E=ABC, F=ABD, G=ACD).
 */
export function patternOf(k: number, columns: readonly number[]): number[] {
  const m = k - columns.length;
  if (m < 1) throw new InputError(`${columns.length} generated factors out of ${k} leave no basic factor`);
  const words = columns.map((c, g) => {
    if (c <= 0 || c >= 2 ** m) throw new InputError(`A generator's product must use only the ${m} basic factors, got mask ${c}`);
    return (2 ** (m + g)) | c;
  });
  const pattern = new Array<number>(k + 1).fill(0);
  for (let s = 1; s < 2 ** words.length; s++) {
    let w = 0;
    for (let g = 0; g < words.length; g++) if ((s >> g) & 1) w ^= words[g];
    pattern[termOrder(w)]++;
  }
  return pattern;
}

/**
 * Searches all regular 2^(k-p) fractions of resolution III or more for the smallest word-length
 * pattern. With `bound` (a pattern, entry j = words of length j) only designs strictly better
 * than it are looked for, which is much faster; `columns` is then null when none exists, which
 * proves the bound minimum aberration.
 * Throws InputError unless 1 <= p, k - p >= 2 and k <= 2^(k-p) - 1 (fits), k <= 30.
 * Example: minimumAberration(7, 3).pattern -> [0,0,0,0,7,0,0,0] (the 2^(7-3), resolution IV).
 */
export function minimumAberration(k: number, p: number, bound?: readonly number[]): AberrationResult {
  if (!Number.isInteger(k) || !Number.isInteger(p) || p < 1 || k - p < 2 || k > 30) {
    throw new InputError(`A minimum aberration search needs 1 or more generators and 2 or more basic factors (at most 30 factors), got ${k} factors and ${p} generators`);
  }
  const m = k - p;
  if (k > 2 ** m - 1) throw new InputError(`${2 ** m} runs carry at most ${2 ** m - 1} factors, got ${k}`);
  // Candidates by weight, then value. Relabeling the basic factors maps a design to one with
  // the same pattern, and can bring its lightest generator column to the lowest-lettered column of
  // that weight (AB, ABC, ABCD, ...): so the first generator need only be one of those.
  const candidates: number[] = [];
  for (let c = 1; c < 2 ** m; c++) if (termOrder(c) >= 2) candidates.push(c);
  candidates.sort((a, b) => termOrder(a) - termOrder(b) || a - b);
  const firstAllowed = (c: number): boolean => c === 2 ** termOrder(c) - 1;
  let best: number[] | null = bound ? [...bound] : null;
  if (best && best.length !== k + 1) throw new InputError(`A bound pattern for ${k} factors has ${k + 1} entries (lengths 0..${k}), got ${best.length}`);
  let bestColumns: number[] | null = null;
  // Word lengths by table lookup (k <= 30, so masks fit a 32-bit integer).
  const low = new Uint8Array(1 << 15);
  for (let x = 1; x < low.length; x++) low[x] = low[x >> 1] + (x & 1);
  const len = (w: number): number => low[w & 0x7fff] + low[(w >>> 15) & 0x7fff];
  const pattern = new Array<number>(k + 1).fill(0);
  const words = new Int32Array(2 ** p);
  let count = 0;
  const chosen: number[] = [];
  let nodes = 0;
  const visit = (start: number, depth: number): void => {
    nodes++;
    if (depth === p) {
      if (!best || comparePatterns(pattern, best) < 0) {
        best = [...pattern];
        bestColumns = [...chosen];
      }
      return;
    }
    const gen = 1 << (m + depth);
    for (let i = start; i <= candidates.length - (p - depth); i++) {
      if (depth === 0 && !firstAllowed(candidates[i])) continue;
      const w = gen | candidates[i];
      const n = count;
      words[count++] = w;
      pattern[len(w)]++;
      for (let j = 0; j < n; j++) {
        const x = words[j] ^ w;
        words[count++] = x;
        pattern[len(x)]++;
      }
      chosen.push(candidates[i]);
      if (!best || comparePatterns(pattern, best) <= 0) visit(i + 1, depth + 1);
      chosen.pop();
      for (let j = n; j < count; j++) pattern[len(words[j])]--;
      count = n;
    }
  };
  visit(0, 0);
  return { pattern: best ?? [], columns: bestColumns, nodes };
}

/**
 * Generators in letters for a search result: basic factors first, generated factors after.
 * Example: columnsToGenerators(7, [0b111, 0b1011, 0b1101]) -> ["E=ABC", "F=ABD", "G=ACD"].
 */
export function columnsToGenerators(k: number, columns: readonly number[]): string[] {
  const letters = factorLetters(k);
  const m = k - columns.length;
  return columns.map((c, g) => `${letters[m + g]}=${termFactors(c).map((i) => letters[i]).join('')}`);
}
