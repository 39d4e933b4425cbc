/**
 * What a planner can choose for k factors without typing generators: the full factorial, each
 * fraction the built-in catalog holds, with its runs and resolution, and the Plackett-Burman
 * screening designs that take k factors. The resolution is read
 * from the catalog entry's generator words (the shortest word of their defining relation), so
 * no design is built to learn it.
 */
import { InputError } from '../errors.ts';
import { factorLetters } from '../factor/letters.ts';
import { catalogFraction, type CatalogEntry } from './catalog.ts';
import { definingRelation, resolution } from './defining-relation.ts';
import { MAX_DESIGN_FACTORS } from './max-design-factors.ts';
import { parseLetterWord, type Word } from './word.ts';
import { PLACKETT_BURMAN_RUNS } from './plackett-burman.ts';

export interface CatalogChoice {
  /** 'full', or the fraction as buildDesign takes it: '1/2', '1/4', ... */
  readonly fraction: string;
  /** Number of generators p (0 for the full factorial): the design is a 2^(k-p). */
  readonly generators: number;
  /** Factorial runs, before center runs and replicates. */
  readonly runs: number;
  /** Length of the shortest defining word; null for a full factorial. */
  readonly resolution: number | null;
  /** The catalog entry; null for the full factorial. */
  readonly entry: CatalogEntry | null;
}

/** The defining words of a catalog entry: generator X = W gives the word XW (Box and Hunter 1961). */
export function entryWords(entry: CatalogEntry): Word[] {
  const letters = factorLetters(entry.factors);
  return entry.generators.map((g) => {
    const [left, right] = g.split('=');
    const w = parseLetterWord(right, letters);
    return { mask: w.mask | (1 << letters.indexOf(left)), sign: w.sign };
  });
}

/**
 * The choices for k factors, full factorial first (over 10 factors it is still listed: building
 * it then says it is over the run limit, which tells the planner why to take a fraction), then each catalog fraction 1/2, 1/4, ... that exists, with its resolution from the defining
 * relation (Box and Hunter 1961, Technometrics 3, 311-351: resolution is the length of the
 * shortest word). Cost: per fraction 2^p word products, p <= 11.
 * Throws InputError for k not a whole number from 1 to MAX_DESIGN_FACTORS.
 * Example: catalogChoices(4) -> [{fraction:'full', runs:16, resolution:null, ...},
 * {fraction:'1/2', runs:8, resolution:4, ...}].
 */
export function catalogChoices(k: number): CatalogChoice[] {
  if (!Number.isInteger(k) || k < 1 || k > MAX_DESIGN_FACTORS) {
    throw new InputError(`Design choices need a whole number of factors from 1 to ${MAX_DESIGN_FACTORS}, got ${k}`);
  }
  const out: CatalogChoice[] = [];
  out.push({ fraction: 'full', generators: 0, runs: 2 ** k, resolution: null, entry: null });
  for (let p = 1; p < k; p++) {
    let entry: CatalogEntry;
    try {
      entry = catalogFraction(k, p);
    } catch (err) {
      if (err instanceof InputError) continue; // not in the catalog: not a choice
      throw err;
    }
    out.push({ fraction: `1/${2 ** p}`, generators: p, runs: entry.runs, resolution: resolution(definingRelation(entryWords(entry))), entry });
  }
  return out;
}

export interface ScreeningChoice {
  /** Factorial runs of the Plackett-Burman design (12, 20 or 24). */
  readonly runs: number;
  /** Columns the k factors leave unused (N - 1 - k), which help judge the effects. */
  readonly unusedColumns: number;
}

/**
 * The Plackett-Burman screening designs that take k factors: each of 12, 20 and 24 runs with at
 * least k + 1 runs (Plackett and Burman 1946, Biometrika 33, 305-325: an N-run design has N - 1
 * columns), smallest first. None for fewer than 2 factors or more than 23. Cost O(1).
 * Example: plackettBurmanChoices(12) -> [{runs: 20, unusedColumns: 7}, {runs: 24, unusedColumns: 11}].
 */
export function plackettBurmanChoices(k: number): ScreeningChoice[] {
  if (!Number.isInteger(k) || k < 2) return [];
  return PLACKETT_BURMAN_RUNS.filter((n) => k <= n - 1).map((n) => ({ runs: n, unusedColumns: n - 1 - k }));
}
