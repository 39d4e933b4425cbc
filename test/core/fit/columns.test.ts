import { describe, expect, it } from 'vitest';
import { freshModelMatrix, modelColumns, modelMatrix } from '../../../src/core/fit/columns.ts';
import { squareTerm, termValue } from '../../../src/core/model/term.ts';

function lcg(seed: number) {
  let s = seed >>> 0;
  return () => (s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32;
}

describe('modelMatrix', () => {
  it('each product column, built from its parent column where the parent is in the matrix, equals termValue entry for entry (to the bit), whatever the term order', () => {
    const r = lcg(3);
    const coded = Array.from({ length: 9 }, () => Array.from({ length: 4 }, () => (r() - 0.5) * 2.4));
    // ABD before AB (parent absent at first use), ABD's parent AB later, a square, and a repeated term.
    const terms = [0b1011, 0b11, 0b1, 0b111, squareTerm(2), 0b1111, 0b11, 0b1000];
    const cols = modelColumns([], terms);
    const x = modelMatrix(cols, coded, null);
    const n = coded.length;
    cols.forEach((c, j) => {
      for (let i = 0; i < n; i++) expect(Object.is(x[j * n + i], c.kind === 'term' ? termValue(c.term, coded[i]) : 1)).toBe(true);
    });
  });

  it('block columns use effect coding (Montgomery 8th ed., section 7.2): +1 in their block, -1 in the last, 0 elsewhere', () => {
    const cols = modelColumns([1, 2, 3], [0b1]);
    const x = modelMatrix(cols, [[1], [-1], [1]], [1, 2, 3]);
    expect([...x]).toEqual([1, 1, 1, 1, 0, -1, 0, 1, -1, 1, -1, 1]);
  });

  it('a matrix asked for again (kept by its columns, settings and blocks) is a fresh array with the same numbers; another block or setting gives its own', () => {
    const r = lcg(5);
    const coded = Array.from({ length: 8 }, () => Array.from({ length: 3 }, () => (r() - 0.5) * 2.2));
    const cols = modelColumns([1, 2], [0b1, 0b10, 0b11, 0b111]);
    const blocks = [1, 2, 1, 2, 1, 2, 1, 2];
    const first = modelMatrix(cols, coded, blocks);
    const again = modelMatrix(cols, coded, blocks);
    expect(again).not.toBe(first);
    expect(Array.from(again)).toEqual(Array.from(first));
    first.fill(9); // the caller's own array: the next call is not changed
    const n = coded.length;
    const third = modelMatrix(cols, coded, blocks);
    cols.forEach((c, j) => {
      for (let i = 0; i < n; i++) if (c.kind === 'term') expect(Object.is(third[j * n + i], termValue(c.term, coded[i]))).toBe(true);
    });
    // Blocks moved: the block column changes, the rest stays.
    const moved = modelMatrix(cols, coded, [2, 1, 1, 2, 1, 2, 1, 2]);
    expect(Array.from(moved.subarray(n, 2 * n))).toEqual([-1, 1, 1, -1, 1, -1, 1, -1]);
    // A setting changed by one unit in the last place: a new matrix, not the kept one.
    const nudged = coded.map((row) => [...row]);
    nudged[3][1] = nudged[3][1] + Math.abs(nudged[3][1]) * Number.EPSILON;
    const x = modelMatrix(cols, nudged, blocks);
    expect(Object.is(x[3 * n + 3], nudged[3][1])).toBe(true);
    // Built afresh (freshModelMatrix, neither looked up nor kept): the same numbers.
    expect(Array.from(freshModelMatrix(cols, nudged, blocks))).toEqual(Array.from(x));
    expect(Array.from(freshModelMatrix(cols, coded, blocks))).toEqual(Array.from(third));
  });

  it('a matrix beyond the kept size (1100 runs x 64 columns) is built the same way, entry for entry termValue', () => {
    const r = lcg(9);
    const coded = Array.from({ length: 1100 }, () => Array.from({ length: 6 }, () => (r() - 0.5) * 2.2));
    const cols = modelColumns([], Array.from({ length: 63 }, (_, t) => t + 1));
    const x = modelMatrix(cols, coded, null);
    const n = coded.length;
    let same = true;
    cols.forEach((c, j) => {
      for (let i = 0; i < n; i++) if (!Object.is(x[j * n + i], c.kind === 'term' ? termValue(c.term, coded[i]) : 1)) same = false;
    });
    expect(same).toBe(true);
  });
});
