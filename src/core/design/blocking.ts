/**
 * Blocking a two-level design in 2, 4 or 8 blocks by confounding chosen interactions with blocks:
 * q independent block words split the runs by the signs of their columns into 2^q blocks, and
 * every product of them, with all its aliases, is confounded with blocks (Montgomery, Design and
 * Analysis of Experiments, 8th ed., sections 7.4-7.6; Box, Hunter and Hunter, 2nd ed., section 5.15).
 *
 * Default words: for a full factorial of 3 to 7 factors, the words of Montgomery's table of
 * suggested blocking arrangements (8th ed., Table 7.8, adapted there from Box, Hunter and Hunter);
 * for a full factorial of 8 to 10 factors, the defining words of the minimum aberration fraction
 * 2^(k-q) found by exhaustive search (the same criterion as minimum aberration, applied to the
 * block words); for a fraction, the block words found by an exhaustive search that confounds, in
 * order of importance, the fewest main effects (none allowed), then the fewest two-factor
 * interactions, then the fewest three-factor interactions, and so on, counting every alias
 * (branch and bound; for the largest typed fractions it stops after BLOCK_SEARCH_BUDGET
 * candidates and says that the words are the best found, not proven best).
 */
import { InputError } from '../errors.ts';
import type { Factor } from '../factor/factor.ts';
import { factorLetters } from '../factor/letters.ts';
import { termFactors, termOrder } from '../model/term.ts';
import type { BlockOrigin } from './design-note.ts';
import { minimumAberration } from './minimum-aberration.ts';
import { compareWords, formatWord, lettersOf, parseWord, type Word } from './word.ts';

/** Block counts a design may have: unblocked, or 2, 4 or 8 blocks (the plan's choices; more blocks of a small design confound low-order effects). */
export const BLOCK_COUNTS = [1, 2, 4, 8] as const;

/**
 * Montgomery, Design and Analysis of Experiments, 8th ed., Table 7.8 "Suggested blocking
 * arrangements for the 2^k factorial design": effects chosen to generate 2, 4 and 8 blocks, for
 * 3 to 7 factors (from memory).
 */
export const MONTGOMERY_TABLE_7_8: Readonly<Record<number, Readonly<Record<number, readonly string[]>>>> = {
  3: { 2: ['ABC'], 4: ['AB', 'AC'] },
  4: { 2: ['ABCD'], 4: ['ABC', 'ACD'], 8: ['AB', 'BC', 'CD'] },
  5: { 2: ['ABCDE'], 4: ['ABC', 'CDE'], 8: ['ABE', 'BCE', 'CDE'] },
  6: { 2: ['ABCDEF'], 4: ['ABCF', 'CDEF'], 8: ['ABEF', 'ABCD', 'ACE'] },
  7: { 2: ['ABCDEFG'], 4: ['ABCFG', 'CDEFG'], 8: ['ABC', 'DEF', 'AFG'] },
};

/**
 * Most candidate block words the search for a fraction looks at before it settles for the best
 * found so far (a design choice: it keeps a plan of up to 1024 runs quick to make on a phone; the
 * catalog fractions, up to 128 runs, are searched exhaustively well within it).
 */
export const BLOCK_SEARCH_BUDGET = 200_000;

/** Where the table's words come from, for the plan's notes (core/text/design-text.ts writes it). */
export const MONTGOMERY_TABLE_SOURCE = 'Montgomery, Design and Analysis of Experiments, 8th ed., Table 7.8';

export interface Blocking {
  /** Independent block words (masks over the factors), q of them for 2^q blocks. */
  readonly generators: readonly number[];
  /** Where the words came from (core/text/design-text.ts blockOriginText puts it in words). */
  readonly origin: BlockOrigin;
}

function log2Blocks(blocks: number): number {
  if (!(BLOCK_COUNTS as readonly number[]).includes(blocks)) {
    throw new InputError(`Blocks come in 1, 2, 4 or 8, got ${blocks}`);
  }
  return Math.log2(blocks);
}

/**
 * Every product of q block words: the 2^q - 1 non-empty products, in the order of a binary
 * counter over the words (the block defining contrast subgroup without I). Cost: 2^q products.
 * Example: blockSpan([ABC, ACD]) -> [ABC, ACD, BD]; blockSpan([]) -> [].
 */
export function blockSpan(generators: readonly number[]): number[] {
  const out: number[] = [];
  for (let s = 1; s < 2 ** generators.length; s++) {
    let w = 0;
    for (let g = 0; g < generators.length; g++) if ((s >> g) & 1) w ^= generators[g];
    out.push(w);
  }
  return out;
}

/** The alias set of an effect: the effect times I and every defining word. */
function aliasSet(mask: number, relation: readonly Word[]): number[] {
  return [mask, ...relation.map((w) => w.mask ^ mask)];
}

/**
 * Everything confounded with blocks, one word per alias set: every product of the block words,
 * written as the shortest effect of its alias set (its aliases are confounded too), sorted
 * shortest first. Cost: 2^q alias sets of 2^p words.
 * Example: 2^4 in 4 blocks on ABC and ACD -> [BD, ABC, ACD].
 */
export function blockConfounded(generators: readonly number[], relation: readonly Word[]): number[] {
  return blockSpan(generators)
    .map((w) => aliasSet(w, relation).sort(compareWords)[0])
    .sort(compareWords);
}

/**
 * Which block (from 0) a factorial point falls in: bit j is set when block word j's column at the
 * point differs from its value at the all-low point, so the block holding the all-low run is
 * block 0 (Montgomery's principal block, 8th ed., section 7.4). Throws InputError for a point
 * that is not at -1/+1 in a factor a block word uses.
 * Example: blockOf([-1,-1,-1], [ABC]) -> 0 and blockOf([1,-1,-1], [ABC]) -> 1.
 */
export function blockOf(coded: readonly number[], generators: readonly number[]): number {
  let b = 0;
  generators.forEach((g, j) => {
    let v = 1;
    for (const f of termFactors(g)) {
      const x = coded[f];
      if (x !== 1 && x !== -1) throw new InputError(`A block word needs factorial settings (-1 or +1), got ${x} for factor ${f + 1}`);
      v *= x;
    }
    const atLow = termOrder(g) % 2 === 0 ? 1 : -1;
    if (v !== atLow) b |= 1 << j;
  });
  return b;
}

function mainEffectIn(span: readonly number[], relation: readonly Word[]): { word: number; effect: number } | null {
  for (const w of span) {
    for (const a of aliasSet(w, relation)) if (termOrder(a) === 1) return { word: w, effect: a };
  }
  return null;
}

/**
 * Checks block words typed by a person and returns them as masks. Signs are ignored (a block
 * word only splits runs). Throws InputError when the count does not match the blocks (q words
 * for 2^q blocks), a block would hold fewer than 2 runs, a word is in the defining relation
 * (constant, so it splits nothing), the words are dependent, or a main effect would be
 * confounded with blocks.
 * Example: parseBlockWords(['ABC','ACD'], 4, factors, [], 16) -> [0b0111, 0b1101].
 */
export function parseBlockWords(
  texts: readonly string[],
  blocks: number,
  factors: readonly Factor[],
  relation: readonly Word[],
  factorialRuns: number,
): number[] {
  const q = log2Blocks(blocks);
  const letters = lettersOf(factors);
  const items = texts.map((t) => t.trim()).filter((t) => t !== '');
  if (items.length !== q) {
    throw new InputError(`${blocks} block${blocks === 1 ? '' : 's'} need ${q} block word${q === 1 ? '' : 's'}, got ${items.length}${items.length ? ` (${items.join(', ')})` : ''}`);
  }
  checkBlockSize(blocks, factorialRuns);
  const masks = items.map((t) => parseWord(t, factors, `Block word "${t}"`).mask);
  const defining = new Set(relation.map((w) => w.mask));
  const span = blockSpan(masks);
  masks.forEach((m, j) => {
    if (m === 0 || defining.has(m)) {
      throw new InputError(`Block word "${items[j]}" is ${m === 0 ? 'the identity' : 'a word of the defining relation'}: its column is the same in every run, so it cannot split runs into blocks`);
    }
  });
  for (let s = 1; s < 2 ** q; s++) {
    const w = span[s - 1];
    if (w === 0 || defining.has(w)) {
      const used = masks.filter((_, g) => (s >> g) & 1).map((mm) => formatWord(mm, letters));
      throw new InputError(`Block words ${used.join(', ')} are dependent (their product is ${w === 0 ? 'I' : `the defining word ${formatWord(w, letters)}`}); ${blocks} blocks need ${q} independent words`);
    }
  }
  const me = mainEffectIn(span, relation);
  if (me) {
    const product = masks.includes(me.word) ? '' : `their product ${formatWord(me.word, letters)}`;
    const alias = me.word === me.effect ? '' : `${formatWord(me.word, letters)} is aliased with it`;
    const parts = [product, alias].filter((x) => x !== '');
    const how = parts.length ? ` (${parts.join('; ')})` : '';
    throw new InputError(`Block words ${items.join(', ')} would confound the main effect ${formatWord(me.effect, letters)} with blocks${how}; choose other words`);
  }
  return masks;
}

function checkBlockSize(blocks: number, factorialRuns: number): void {
  if (blocks > 1 && factorialRuns / blocks < 2) {
    throw new InputError(`${blocks} blocks of a ${factorialRuns}-run design would leave ${factorialRuns / blocks < 1 ? 'less than one run' : 'one run'} per block; a block needs at least 2 factorial runs`);
  }
}

function comparePatterns(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i] - b[i];
  return 0;
}

/**
 * The default block words for a design (see the module note for the sources). `basic` are the
 * basic factors of a fraction (all factors for a full factorial). Throws InputError when a block
 * would hold fewer than 2 runs or when every choice confounds a main effect with blocks (e.g. a
 * 2^2 in 4 blocks).
 * Example: defaultBlocking(4, [], [0,1,2,3], 4).generators -> [ABC, ACD] (Montgomery Table 7.8).
 */
export function defaultBlocking(k: number, relation: readonly Word[], basic: readonly number[], blocks: number): Blocking {
  const q = log2Blocks(blocks);
  if (q === 0) return { generators: [], origin: { kind: 'unblocked' } };
  checkBlockSize(blocks, 2 ** basic.length);
  const full = relation.length === 0;
  const table = MONTGOMERY_TABLE_7_8[k]?.[blocks];
  if (full && table) {
    const lettersK = factorLetters(k);
    const masks = table.map((w) => [...w].reduce((mask, ch) => mask | (1 << lettersK.indexOf(ch)), 0));
    return { generators: masks, origin: { kind: 'table' } };
  }
  if (full && q === 1) {
    return { generators: [2 ** k - 1], origin: { kind: 'highest-order', k } };
  }
  if (full && k - q >= 2 && k <= 2 ** (k - q) - 1) {
    const r = minimumAberration(k, q);
    const m = k - q;
    if (r.columns) {
      return {
        generators: r.columns.map((c, g) => c | (1 << (m + g))),
        origin: { kind: 'minimum-aberration', k, q },
      };
    }
  }
  // Search over alias sets: each is named by its product of basic factors (a mask c over the
  // basic factors, 1 .. 2^m - 1); its word-length counts are worked out once.
  const m = basic.length;
  const toFactors = (c: number): number => termFactors(c).reduce((mask, j) => mask | (1 << basic[j]), 0);
  const classPattern: number[][] = [];
  const hasMain: boolean[] = [];
  for (let c = 0; c < 2 ** m; c++) {
    const pat = new Array<number>(k + 1).fill(0);
    let main = c === 0;
    if (c > 0) {
      for (const a of aliasSet(toFactors(c), relation)) {
        pat[termOrder(a)]++;
        if (termOrder(a) === 1) main = true;
      }
    }
    classPattern.push(pat);
    hasMain.push(main);
  }
  const candidates: number[] = [];
  for (let c = 1; c < 2 ** m; c++) if (!hasMain[c]) candidates.push(c);
  candidates.sort((a, b) => comparePatterns(classPattern[a], classPattern[b]) || a - b);
  let best: number[] | null = null;
  let bestGens: number[] | null = null;
  const chosen: number[] = [];
  const span: number[] = [];
  const pattern = new Array<number>(k + 1).fill(0);
  // Lower bound: every alias set still to come counts at least as much as the smallest one (mu),
  // and sums keep the lexicographic order, so a partial choice whose bound reaches the best
  // found cannot lead to a better one.
  const mu = candidates.length > 0 ? classPattern[candidates[0]] : new Array<number>(k + 1).fill(0);
  const total = 2 ** q - 1;
  const compareBound = (extra: readonly number[] | null, classesLeft: number, target: readonly number[]): number => {
    for (let j = 0; j <= k; j++) {
      const v = pattern[j] + (extra ? extra[j] : 0) + classesLeft * mu[j];
      if (v !== target[j]) return v - target[j];
    }
    return 0;
  };
  let visits = 0;
  let stopped = false;
  const visit = (start: number): void => {
    if (chosen.length === q) {
      if (!best || comparePatterns(pattern, best) < 0) {
        best = [...pattern];
        bestGens = chosen.map(toFactors);
      }
      return;
    }
    for (let i = start; i < candidates.length; i++) {
      if (++visits > BLOCK_SEARCH_BUDGET && bestGens) {
        stopped = true;
        return;
      }
      const c = candidates[i];
      // Candidates come in increasing order of their own counts: once the bound with this one
      // reaches the best, it does for every later one too.
      if (best && compareBound(classPattern[c], total - span.length - 1, best) >= 0) break;
      const n = span.length;
      let main = hasMain[c];
      for (let j = 0; j < n && !main; j++) main = hasMain[span[j] ^ c];
      if (main) continue;
      span.push(c);
      for (let j = 0; j < n; j++) span.push(span[j] ^ c);
      for (let j = n; j < span.length; j++) classPattern[span[j]].forEach((v, jj) => (pattern[jj] += v));
      chosen.push(c);
      if (!best || compareBound(null, total - span.length, best) < 0) visit(i + 1);
      chosen.pop();
      for (let j = n; j < span.length; j++) classPattern[span[j]].forEach((v, jj) => (pattern[jj] -= v));
      span.length = n;
      if (stopped) return;
    }
  };
  visit(0);
  if (!bestGens) {
    throw new InputError(`${blocks} blocks of this ${2 ** basic.length}-run design would confound a main effect with blocks whatever words are chosen; use fewer blocks`);
  }
  return { generators: bestGens, origin: { kind: 'search', stopped, budget: BLOCK_SEARCH_BUDGET } };
}
