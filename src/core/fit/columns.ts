/**
 * The columns of the model matrix: the intercept, then blocks as a fixed effect, then the
 * model terms in model order (each a product of coded factor columns, or the square of one;
 * see model/term.ts). Blocks use effect (sum-to-zero) coding: for B blocks, B-1 columns,
 * column b is +1 in block b, -1 in the last block, 0 elsewhere, so the intercept stays the
 * average over blocks and a prediction is for an average block (Montgomery, Design and Analysis
 * of Experiments, 8th ed., section 7.2; the coding is common practice for blocks as fixed offsets).
 */
import { SQUARE_FLAG, termValue, type Term } from '../model/term.ts';
import { matrixMemo } from './matrix-memo.ts';

export type Column =
  | { readonly kind: 'intercept' }
  | { readonly kind: 'block'; readonly block: number }
  | { readonly kind: 'term'; readonly term: Term };

/** The distinct block labels in ascending order. */
export function blockLevels(blocks: readonly number[] | null | undefined): number[] {
  if (!blocks) return [];
  return [...new Set(blocks)].sort((a, b) => a - b);
}

/** Column list for the given block levels and terms. */
export function modelColumns(levels: readonly number[], terms: readonly Term[]): Column[] {
  const cols: Column[] = [{ kind: 'intercept' }];
  for (let b = 0; b < levels.length - 1; b++) cols.push({ kind: 'block', block: levels[b] });
  for (const t of terms) cols.push({ kind: 'term', term: t });
  return cols;
}

/** A local: module bindings are getters under some loaders, and this runs once per matrix entry. */
const valueOfTerm = termValue;

/** Value of a column at one run: 1, the block contrast, or the term's value (termValue: a product, or x_i^2). */
export function columnValue(c: Column, coded: ArrayLike<number>, block: number | undefined, lastBlock: number): number {
  switch (c.kind) {
    case 'intercept':
      return 1;
    case 'block':
      return block === c.block ? 1 : block === lastBlock ? -1 : 0;
    case 'term':
      return valueOfTerm(c.term, coded);
  }
}

/**
 * The model matrix, column-major n x p. A product column is its parent's column (the term less its
 * highest factor) times that factor, when the parent is also in the matrix: the same multiplications
 * in the same order as termValue (lowest factor first), so the same numbers, at one product per entry.
 * The last few matrices are kept by their whole input (matrix-memo.ts): every analysis of the same
 * runs asks for the same ones. Each call returns its own array.
 */
export function modelMatrix(
  cols: readonly Column[],
  coded: readonly (readonly number[])[],
  blocks: readonly number[] | null | undefined,
): Float64Array {
  const mk = matrixKey(cols, coded, blocks);
  const n = coded.length;
  const p = cols.length;
  if (!mk.kept) return buildMatrix(cols, coded, blocks, mk.settings, n, p, mk.k);
  const known = matrices.recall(mk.key, mk.tag) ?? matrices.keep(mk.key, mk.tag, () => buildMatrix(cols, coded, blocks, mk.settings, n, p, mk.k));
  return new Float64Array(known); // a copy by the constructor (slice() looks up a species each time)
}

/** modelMatrix built afresh, neither looked up nor kept: for a caller that keeps what follows from it instead (fit-qr.ts fitQrOnSettings). */
export function freshModelMatrix(cols: readonly Column[], coded: readonly (readonly number[])[], blocks: readonly number[] | null | undefined): Float64Array {
  const n = coded.length;
  let k = 0;
  for (let i = 0; i < n; i++) if (coded[i].length > k) k = coded[i].length;
  const settings = new Float64Array(n * k);
  for (let i = 0; i < n; i++) {
    const row = coded[i];
    for (let f = 0; f < k; f++) settings[f * n + i] = row[f];
  }
  return buildMatrix(cols, coded, blocks, settings, n, cols.length, k);
}

/** What decides a model matrix, as numbers: see matrixKey. */
export interface MatrixKey {
  /** Column kinds and terms (or block labels), each factor's settings (factor f at f n), then the blocks. */
  readonly key: Float64Array;
  /** The shape: runs, columns, factors, blocked or not. */
  readonly tag: string;
  /** The settings part of the key. */
  readonly settings: Float64Array;
  readonly k: number;
  /** False when the matrix or its key is beyond MEMO_LIMIT numbers: then not to be kept. */
  readonly kept: boolean;
}

/**
 * The whole input of modelMatrix (columns, settings, blocks) as one array of numbers, under which
 * the matrix, or what follows from it alone, can be kept and found again (matrix-memo.ts). A
 * shortened row reads NaN, as termValue gives. The key of a kept size lives in a buffer reused by
 * the next call (a memo copies what it keeps). Cost O(n k + p).
 */
export function matrixKey(cols: readonly Column[], coded: readonly (readonly number[])[], blocks: readonly number[] | null | undefined): MatrixKey {
  const n = coded.length;
  const p = cols.length;
  let k = 0;
  for (let i = 0; i < n; i++) if (coded[i].length > k) k = coded[i].length;
  const size = 2 * p + n * k + (blocks ? n : 0);
  // A large matrix is built as it is, neither kept nor keyed (the store stays small).
  const kept = size <= MEMO_LIMIT && n * p <= MEMO_LIMIT;
  if (kept && scratch.length < size) scratch = new Float64Array(Math.min(MEMO_LIMIT, Math.max(size, 2 * scratch.length)));
  const key = kept ? scratch.subarray(0, size) : new Float64Array(size);
  for (let j = 0; j < p; j++) {
    const c = cols[j];
    key[2 * j] = c.kind === 'intercept' ? 0 : c.kind === 'block' ? 1 : 2;
    key[2 * j + 1] = c.kind === 'block' ? c.block : c.kind === 'term' ? c.term : 0;
  }
  const settings = key.subarray(2 * p, 2 * p + n * k);
  for (let i = 0; i < n; i++) {
    const row = coded[i];
    for (let f = 0; f < k; f++) settings[f * n + i] = row[f];
  }
  if (blocks) for (let i = 0; i < n; i++) key[2 * p + n * k + i] = blocks[i];
  return { key, tag: `${n}|${p}|${k}|${blocks ? 'blocks' : ''}`, settings, k, kept };
}

/** The most numbers in a kept matrix or its key (2^15, 256 KB: a 500-run, 65-column matrix), so that the store stays small on a phone. */
const MEMO_LIMIT = 1 << 15;
/** The last four model matrices, by their columns, settings and blocks (matrix-memo.ts; never modified). */
const matrices = matrixMemo<Float64Array>(4, MEMO_LIMIT);
/** The key of the current call, reused from call to call (the memo keeps its own copy). */
let scratch = new Float64Array(0);

/** modelMatrix's work; `settings` holds factor f's settings at f n. */
function buildMatrix(
  cols: readonly Column[],
  coded: readonly (readonly number[])[],
  blocks: readonly number[] | null | undefined,
  settings: Float64Array,
  n: number,
  p: number,
  k: number,
): Float64Array {
  const levels = blocks ? blockLevels(blocks) : [];
  const last = levels[levels.length - 1];
  const x = new Float64Array(n * p);
  // Offset in x of the column holding each plain product already filled, by factor mask
  // (a table for up to 2^16 masks, else a Map).
  const table = k <= 16 ? new Int32Array(1 << k).fill(-1) : null;
  const filled = table ? null : new Map<number, number>();
  for (let j = 0; j < p; j++) {
    const c = cols[j];
    const o = j * n;
    if (c.kind === 'term' && (c.term & SQUARE_FLAG) === 0 && c.term !== 0) {
      const mask = c.term;
      const top = 31 - Math.clz32(mask);
      const parent = mask ^ (1 << top);
      const po = parent === 0 ? -1 : table ? (parent < table.length ? table[parent] : -1) : (filled!.get(parent) ?? -1);
      if (top >= k) for (let i = 0; i < n; i++) x[o + i] = valueOfTerm(mask, coded[i]);
      else if (parent === 0) for (let i = 0, so = top * n; i < n; i++) x[o + i] = 1 * settings[so + i];
      else if (po >= 0) for (let i = 0, so = top * n; i < n; i++) x[o + i] = x[po + i] * settings[so + i];
      else for (let i = 0; i < n; i++) x[o + i] = valueOfTerm(mask, coded[i]);
      if (table) {
        if (mask < table.length && table[mask] < 0) table[mask] = o;
      } else if (!filled!.has(mask)) filled!.set(mask, o);
      continue;
    }
    for (let i = 0; i < n; i++) x[o + i] = columnValue(c, coded[i], blocks?.[i], last);
  }
  return x;
}
