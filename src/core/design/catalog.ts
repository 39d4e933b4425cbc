/**
 * Built-in catalog of minimum aberration two-level fractions 2^(k-p), 8 to 128 runs, up to 15
 * factors: one design for each run size and factor count, from one named source per run size.
 *
 * - 8, 16, 32 and 64 runs: Chen, Sun and Wu (1993), "A catalog of two-level and three-level
 *   fractional factorial designs with small runs", International Statistical Review 61, 131-145
 *   (their designs k-p.1, the minimum aberration design of each size).
 * - 128 runs: Xu (2009), "Algorithmic construction of efficient fractional factorial designs with
 *   large run sizes", Technometrics 51, 262-277 (the 128-run table).
 *
 * Each entry is written in our letters: the basic factors are the first k-p factors (A, B, C, ...
 * skipping I) and the generated factors follow in declared order. The generator columns are as
 * we recall the tables (from memory: a published design may be written with other columns that
 * give an isomorphic design, i.e. the same design after relabeling factors). What the tests pin
 * down instead is the property the sources tabulate: each entry's word-length pattern is the
 * smallest of all regular fractions of its size, confirmed for every entry by the exhaustive
 * search of minimum-aberration.ts (in the regular tests for 8 to 32 runs and most 64- and
 * 128-run entries; the three largest, about ten minutes, with TRIALBOOK_SLOW_TESTS=1).
 */
import { InputError } from '../errors.ts';
import { factorLetters } from '../factor/letters.ts';
import { MAX_DESIGN_FACTORS } from './max-design-factors.ts';

export interface CatalogEntry {
  readonly runs: number;
  readonly factors: number;
  /** Generators in letters, basic factors first, e.g. ["E=ABC", "F=ABD"]. */
  readonly generators: readonly string[];
  /** The publication the design is tabulated in. */
  readonly source: string;
}

/** Chen, Sun and Wu (1993), International Statistical Review 61, 131-145. */
export const CHEN_SUN_WU_1993 = 'Chen, Sun and Wu (1993), International Statistical Review 61, 131-145';
/** Xu (2009), Technometrics 51, 262-277. */
export const XU_2009 = 'Xu (2009), Technometrics 51, 262-277';

/** Products (right sides) of the generated factors, in basic-factor letters, per run size and factor count. */
const PRODUCTS: Readonly<Record<number, Readonly<Record<number, readonly string[]>>>> = {
  8: {
    4: ['ABC'],
    5: ['AB', 'AC'],
    6: ['AB', 'AC', 'BC'],
    7: ['AB', 'AC', 'BC', 'ABC'],
  },
  16: {
    5: ['ABCD'],
    6: ['ABC', 'ABD'],
    7: ['ABC', 'ABD', 'ACD'],
    8: ['ABC', 'ABD', 'ACD', 'BCD'],
    9: ['ABC', 'ABD', 'ACD', 'BCD', 'ABCD'],
    10: ['ABC', 'ABD', 'ACD', 'BCD', 'ABCD', 'AB'],
    11: ['ABC', 'ABD', 'ACD', 'BCD', 'ABCD', 'AB', 'AC'],
    12: ['ABC', 'ABD', 'ACD', 'BCD', 'ABCD', 'AB', 'AC', 'AD'],
    13: ['ABC', 'ABD', 'ACD', 'BCD', 'ABCD', 'AB', 'AC', 'AD', 'BC'],
    14: ['ABC', 'ABD', 'ACD', 'BCD', 'ABCD', 'AB', 'AC', 'AD', 'BC', 'BD'],
    15: ['ABC', 'ABD', 'ACD', 'BCD', 'ABCD', 'AB', 'AC', 'AD', 'BC', 'BD', 'CD'],
  },
  32: {
    6: ['ABCDE'],
    7: ['ABC', 'ABDE'],
    8: ['ABC', 'ABD', 'ACDE'],
    9: ['ABC', 'ABD', 'ABE', 'ACDE'],
    10: ['ABC', 'ABD', 'ABE', 'ACDE', 'BCDE'],
    11: ['ABC', 'ABD', 'ACD', 'ABE', 'ACE', 'ADE'],
    12: ['ABC', 'ABD', 'ACD', 'BCD', 'ABE', 'ACE', 'ADE'],
    13: ['ABC', 'ABD', 'ACD', 'BCD', 'ABE', 'ACE', 'BCE', 'ADE'],
    14: ['ABC', 'ABD', 'ACD', 'BCD', 'ABE', 'ACE', 'BCE', 'ADE', 'BDE'],
    15: ['ABC', 'ABD', 'ACD', 'BCD', 'ABE', 'ACE', 'BCE', 'ADE', 'BDE', 'CDE'],
  },
  64: {
    7: ['ABCDEF'],
    8: ['ABCD', 'ABEF'],
    9: ['ABC', 'ABDE', 'ACDF'],
    10: ['ABC', 'ABDE', 'ABDF', 'ACEF'],
    11: ['ABC', 'ABD', 'ACDE', 'ACDF', 'ABEF'],
    12: ['ABC', 'ABD', 'ACDE', 'ACDF', 'ABEF', 'BCDEF'],
    13: ['ABC', 'ABD', 'ABE', 'ACDE', 'ACF', 'ADEF', 'ABCDEF'],
    14: ['ABC', 'ABD', 'ABE', 'ACDE', 'ABF', 'ACDF', 'ACEF', 'ADEF'],
    15: ['ABC', 'ABD', 'ABE', 'ACDE', 'ABF', 'ACDF', 'ACEF', 'ADEF', 'ABCDEF'],
  },
  128: {
    8: ['ABCDEFG'],
    9: ['ABCDE', 'ABCFG'],
    10: ['ABCD', 'ABEF', 'ACEG'],
    11: ['ABCD', 'ABEF', 'ACEG', 'BDFG'],
    12: ['ABC', 'ADEF', 'BDEG', 'CDFG', 'ABCEFG'],
    13: ['ABC', 'ABDE', 'ABDF', 'ACDG', 'AEFG', 'ABCDEFG'],
    14: ['ABC', 'ABDE', 'ABDF', 'ACEF', 'ACDG', 'ABEFG', 'BCDEFG'],
    15: ['ABC', 'ABDE', 'ABDF', 'ACEF', 'ACDG', 'ABEFG', 'BCDEFG', 'AEG'],
  },
};

/** Run sizes the catalog covers. */
export const CATALOG_RUN_SIZES = [8, 16, 32, 64, 128] as const;

function entryFor(runs: number, k: number): CatalogEntry | undefined {
  const products = PRODUCTS[runs]?.[k];
  if (!products) return undefined;
  const letters = factorLetters(k);
  const m = Math.log2(runs);
  return {
    runs,
    factors: k,
    generators: products.map((p, i) => `${letters[m + i]}=${p}`),
    source: runs === 128 ? XU_2009 : CHEN_SUN_WU_1993,
  };
}

/** Every catalog entry, by run size then factor count. */
export function catalogEntries(): CatalogEntry[] {
  const out: CatalogEntry[] = [];
  for (const runs of CATALOG_RUN_SIZES) {
    for (let k = 2; k <= MAX_DESIGN_FACTORS; k++) {
      const e = entryFor(runs, k);
      if (e) out.push(e);
    }
  }
  return out;
}

/**
 * The catalog's minimum aberration 2^(k-p) for k factors and p generators (a 1/2^p fraction).
 * Throws InputError, saying what is covered, when k-p basic factors give fewer than 8 or more than
 * 128 runs, when k exceeds 15, or when the fraction is too small to carry k factors.
 * Example: catalogFraction(7, 3).generators -> ["E=ABC", "F=ABD", "G=ACD"].
 */
export function catalogFraction(k: number, p: number): CatalogEntry {
  if (!Number.isInteger(k) || !Number.isInteger(p) || k < 1 || p < 1) {
    throw new InputError(`A catalog fraction needs whole numbers of factors and generators, 1 or more, got ${k} and ${p}`);
  }
  const runs = 2 ** (k - p);
  const frac = `1/${2 ** p}`;
  if (k > MAX_DESIGN_FACTORS) {
    throw new InputError(`The built-in catalog covers fractions of up to ${MAX_DESIGN_FACTORS} factors, got ${k}; type generators instead`);
  }
  if (k - p < 3 || runs < 8) {
    throw new InputError(`A ${frac} fraction of ${k} factors has ${k - p < 0 ? 'no' : runs} runs; the built-in catalog covers 8 to 128 runs (type generators for a smaller fraction)`);
  }
  if (runs > 128) {
    throw new InputError(`A ${frac} fraction of ${k} factors has ${runs} runs; the built-in catalog covers 8 to 128 runs (choose a smaller fraction, or type generators)`);
  }
  if (k > runs - 1) {
    throw new InputError(`A ${frac} fraction of ${k} factors has ${runs} runs, which carry at most ${runs - 1} factors; choose a larger fraction`);
  }
  const e = entryFor(runs, k);
  if (!e) throw new InputError(`The built-in catalog has no ${runs}-run design for ${k} factors; type generators instead`);
  return e;
}
