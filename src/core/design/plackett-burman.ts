/**
 * Plackett-Burman screening designs of 12, 20 and 24 runs for up to 11, 19 and 23 two-level
 * factors (Plackett and Burman 1946, "The design of optimum multifactorial experiments",
 * Biometrika 33, 305-325). Each is built from the paper's generating row for its run count:
 * row 1 is the generating row, each next row is the one before shifted cyclically one place to
 * the right (its last sign moves to the front), and a last row has every factor at -1. The N - 1
 * columns are balanced (N/2 runs at each level) and pairwise orthogonal, so every main effect is
 * estimated clear of every other; with fewer factors the first columns are used.
 *
 * Such a design has no defining relation: a two-factor interaction's column is not equal to a
 * main effect's (as in a regular fraction) but partly correlated with several of them (partial
 * aliasing; Montgomery, Design and Analysis of Experiments, 8th ed., section 8.6.3, from memory;
 * for 12 runs every correlation is 0 or +-1/3, Lin and Draper 1992, Technometrics 34, 423-428,
 * from memory).
 */
import { InputError } from '../errors.ts';
import type { Term } from '../model/term.ts';
import type { FactorialPoint } from './fractional.ts';

/** Run counts offered. */
export const PLACKETT_BURMAN_RUNS = [12, 20, 24] as const;
export type PlackettBurmanRuns = (typeof PLACKETT_BURMAN_RUNS)[number];

/** Where the generating rows come from. */
export const PLACKETT_BURMAN_SOURCE = 'Plackett and Burman (1946), Biometrika 33, 305-325, table of generating rows for N = 12, 20 and 24';

/**
 * Generating rows (the first run's signs, factor 1 first), typed from Plackett and Burman
 * (1946)'s table for N = 12, 20 and 24, checked against a university reprint of the 12- and
 * 20-run tables; a typing slip would break the balance and orthogonality the tests check.
 */
export const PLACKETT_BURMAN_GENERATORS: Readonly<Record<PlackettBurmanRuns, string>> = Object.freeze({
  12: '++-+++---+-',
  20: '++--++++-+-+----++-',
  24: '+++++-+-++--++--+-+----',
});

function checkRuns(runs: number): asserts runs is PlackettBurmanRuns {
  if (!(PLACKETT_BURMAN_RUNS as readonly number[]).includes(runs)) {
    throw new InputError(`A Plackett-Burman design comes in ${PLACKETT_BURMAN_RUNS.join(', ')} runs, got ${runs}`);
  }
}

/**
 * The full Plackett-Burman table of N runs in standard order: N rows of N - 1 coded settings
 * (+1 / -1). Row i (from 0) below the last has column j = g[(j - i) mod (N - 1)] for the
 * generating row g; the last row is all -1 (Plackett and Burman 1946).
 * Cost: N (N - 1) entries. Throws InputError for a run count other than 12, 20 or 24.
 * Example: plackettBurmanTable(12)[1] -> [-1, 1, 1, -1, 1, 1, 1, -1, -1, -1, 1].
 */
export function plackettBurmanTable(runs: number): number[][] {
  checkRuns(runs);
  const g = [...PLACKETT_BURMAN_GENERATORS[runs]].map((c) => (c === '+' ? 1 : -1));
  const m = runs - 1;
  const rows: number[][] = [];
  for (let i = 0; i < m; i++) rows.push(Array.from({ length: m }, (_, j) => g[(((j - i) % m) + m) % m]));
  rows.push(new Array<number>(m).fill(-1));
  return rows;
}

/**
 * The factorial points of an N-run Plackett-Burman design for k factors: the first k columns of
 * plackettBurmanTable(N), with standard-order index standardOrder = row number from 1.
 * Throws InputError for a run count other than 12, 20 or 24, fewer than 2 factors, or more
 * factors than N - 1 (saying how many the design takes).
 * Example: plackettBurmanPoints(12, 3)[0] -> {standardOrder: 1, coded: [1, 1, -1]}.
 */
export function plackettBurmanPoints(runs: number, k: number): FactorialPoint[] {
  checkRuns(runs);
  if (!Number.isInteger(k) || k < 2) throw new InputError(`A Plackett-Burman design needs at least 2 factors, got ${k}`);
  if (k > runs - 1) throw new InputError(`A ${runs}-run Plackett-Burman design takes up to ${runs - 1} factors, got ${k}`);
  return plackettBurmanTable(runs).map((row, i) => ({ standardOrder: i + 1, coded: row.slice(0, k) }));
}

export interface PartialAlias {
  /** The main effect (one factor). */
  readonly effect: Term;
  /** A two-factor interaction of two other factors. */
  readonly interaction: Term;
  /** Correlation of their columns over the N factorial runs: (x_i . x_j x_l) / N. */
  readonly correlation: number;
}

/**
 * Partial aliasing of an N-run Plackett-Burman design with k factors: the correlation of every
 * main effect's column with every two-factor interaction's column of two other factors, over one
 * copy of the factorial runs (center runs add nothing to either column's cross-product). A main
 * effect is orthogonal to the interactions that contain it (x_i . x_i x_l = sum of x_l = 0), so
 * those are left out. The columns are +-1 and balanced, so the correlation is the dot product
 * over N. Main effects first in declared order, then interactions in model order (BC, BD, ...).
 * Cost: k C(k - 1, 2) dot products of N entries. Throws as plackettBurmanPoints.
 * Example: plackettBurmanAliasing(12, 3) -> A with BC, B with AC, C with AB, each -1/3 or +1/3.
 */
export function plackettBurmanAliasing(runs: number, k: number): PartialAlias[] {
  const pts = plackettBurmanPoints(runs, k);
  const out: PartialAlias[] = [];
  for (let i = 0; i < k; i++) {
    for (let j = 0; j < k; j++) {
      if (j === i) continue;
      for (let l = j + 1; l < k; l++) {
        if (l === i) continue;
        let dot = 0;
        for (const p of pts) dot += p.coded[i] * p.coded[j] * p.coded[l];
        out.push({ effect: 1 << i, interaction: (1 << j) | (1 << l), correlation: dot / runs });
      }
    }
  }
  return out;
}

export interface PlackettBurmanContrasts {
  /** N - 1 orthogonal contrast columns, one value per run of the plan in run order (center runs 0); the first k belong to the factors. */
  readonly columns: number[][];
  /** How many of the columns are factors (the rest are unused columns, for Lenth's method). */
  readonly factorColumns: number;
  /** Partial aliasing of the main effects with the two-factor interactions. */
  readonly aliasing: PartialAlias[];
}

/**
 * The N - 1 orthogonal contrast columns of a planned Plackett-Burman design, over its runs in
 * run order: column j at a factorial run is entry j of the table row of its standard-order index
 * (standardOrder), and 0 at a center run. The first k columns are the factors' planned coded settings;
 * the other N - 1 - k are the unused columns, which with the factors' give the N - 1 effects
 * Lenth's method is applied to in a saturated Plackett-Burman study (Lenth 1989, Technometrics
 * 31, 469-473, section 2: the method needs the contrasts to be orthogonal and of equal variance).
 * Also returns the partial aliasing (plackettBurmanAliasing).
 * Cost: (N - 1) x runs entries. Throws InputError when the plan is not a Plackett-Burman design
 * (no `screening` entry), or a factorial run's standard-order index is outside 1..N.
 * Example: for a 12-run design with 5 factors, columns has 11 entries; factorColumns is 5.
 */
export function plackettBurmanContrasts(design: {
  readonly factors: readonly unknown[];
  readonly runs: readonly { readonly standardOrder: number | null; readonly kind: string }[];
  readonly screening?: { readonly kind: 'plackett-burman'; readonly runs: number };
}): PlackettBurmanContrasts {
  if (design.screening?.kind !== 'plackett-burman') throw new InputError('Contrast columns of a Plackett-Burman design need a Plackett-Burman plan; this plan is not one');
  const n = design.screening.runs;
  const table = plackettBurmanTable(n);
  const k = design.factors.length;
  const columns: number[][] = Array.from({ length: n - 1 }, () => new Array<number>(design.runs.length).fill(0));
  design.runs.forEach((r, i) => {
    if (r.standardOrder === null) return;
    if (!Number.isInteger(r.standardOrder) || r.standardOrder < 1 || r.standardOrder > n) throw new InputError(`Run ${i + 1} of the plan has standard-order index ${r.standardOrder}, outside 1 to ${n}`);
    const row = table[r.standardOrder - 1];
    for (let j = 0; j < n - 1; j++) columns[j][i] = row[j];
  });
  return { columns, factorColumns: k, aliasing: plackettBurmanAliasing(n, k) };
}
