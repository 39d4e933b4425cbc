import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { applyQ, applyQt, householderQr } from '../../../src/core/linalg/householder-qr.ts';
import { solveUpper } from '../../../src/core/linalg/triangular.ts';

/** Column-major n x p from rows. */
function colMajor(rows: number[][]): Float64Array {
  const n = rows.length;
  const p = rows[0]?.length ?? 0;
  const x = new Float64Array(n * p);
  for (let j = 0; j < p; j++) for (let i = 0; i < n; i++) x[j * n + i] = rows[i][j];
  return x;
}

/** Q [R; 0] for the kept columns, column-major n x rank: should give back those columns of X. */
function rebuild(f: ReturnType<typeof householderQr>): Float64Array {
  const out = new Float64Array(f.n * f.rank);
  for (let c = 0; c < f.rank; c++) {
    const z = new Float64Array(f.n);
    for (let i = 0; i <= c; i++) z[i] = f.r[c * f.rank + i];
    applyQ(f, z);
    out.set(z, c * f.n);
  }
  return out;
}

describe('householderQr', () => {
  it("the module's example: X = [1 1 1 1 | -1 1 -1 1] has rank 2 and R = diag(+-2, +-2) (orthogonal columns of norm 2)", () => {
    const f = householderQr(colMajor([[1, -1], [1, 1], [1, -1], [1, 1]]), 4, 2);
    expect(f.rank).toBe(2);
    expect([...f.kept]).toEqual([0, 1]);
    expect(Math.abs(f.r[0])).toBeCloseTo(2, 14);
    expect(Math.abs(f.r[3])).toBeCloseTo(2, 14);
    expect(f.r[2]).toBeCloseTo(0, 14); // R[0,1] = q1'x2 = 0 for orthogonal columns
  });

  it('Q R gives back X, and R_ii^2 = the squared norm of the part of column i orthogonal to earlier ones (Golub and Van Loan, 4th ed., section 5.2)', () => {
    // A 3-column example with a known Gram-Schmidt: x1 = (1,1,1,1), x2 = (0,1,2,3), x3 = (0,1,4,9).
    // Residual of x2 on x1: (-1.5,-0.5,0.5,1.5), norm^2 5; residual of x3 on (x1, x2): (1,-1,-1,1), norm^2 4.
    const rows = [0, 1, 2, 3].map((t) => [1, t, t * t]);
    const x = colMajor(rows);
    const f = householderQr(x, 4, 3);
    expect(f.rank).toBe(3);
    expect(f.r[0] ** 2).toBeCloseTo(4, 12);
    expect(f.r[1 * 3 + 1] ** 2).toBeCloseTo(5, 12);
    expect(f.r[2 * 3 + 2] ** 2).toBeCloseTo(4, 12);
    const back = rebuild(f);
    for (let i = 0; i < x.length; i++) expect(back[i]).toBeCloseTo(x[i], 12);
  });

  it('sets aside a column that is a combination of earlier ones and gives its weights (rank detection as LINPACK dqrdc2)', () => {
    // Column 2 = 2 x column 0 - column 1.
    const rows = [[1, -1, 3], [1, 1, 1], [1, -1, 3], [1, 1, 1], [1, 0, 2]];
    const f = householderQr(colMajor(rows), 5, 3);
    expect(f.rank).toBe(2);
    expect([...f.aliased]).toEqual([2]);
    const b = f.aliasedTop.slice(0, 2);
    solveUpper(f.r, 2, b);
    expect(b[0]).toBeCloseTo(2, 12);
    expect(b[1]).toBeCloseTo(-1, 12);
  });

  it('Q is orthogonal: Q Q\'y = y and Q\'y keeps the norm (property, fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2, max: 8 }).chain((n) =>
          fc.record({
            n: fc.constant(n),
            p: fc.integer({ min: 1, max: n }),
            cells: fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: n * n + n, maxLength: n * n + n }),
          }),
        ),
        ({ n, p, cells }) => {
          const x = Float64Array.from(cells.slice(0, n * p));
          const y = Float64Array.from(cells.slice(n * n, n * n + n));
          const f = householderQr(x, n, p);
          const z = Float64Array.from(y);
          applyQt(f, z);
          let before = 0;
          let after = 0;
          for (let i = 0; i < n; i++) (before += y[i] * y[i]), (after += z[i] * z[i]);
          expect(after).toBeCloseTo(before, 8);
          applyQ(f, z);
          for (let i = 0; i < n; i++) expect(z[i]).toBeCloseTo(y[i], 8);
          // Q R rebuilds every kept column.
          const back = rebuild(f);
          for (let c = 0; c < f.rank; c++) for (let i = 0; i < n; i++) expect(back[c * n + i]).toBeCloseTo(x[f.kept[c] * n + i], 8);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('degenerate input: a zero column is aliased, more columns than rows keep at most n, no columns give rank 0', () => {
    const zero = householderQr(colMajor([[1, 0], [1, 0], [1, 0]]), 3, 2);
    expect(zero.rank).toBe(1);
    expect([...zero.aliased]).toEqual([1]);
    const wide = householderQr(colMajor([[1, 2, 3], [4, 5, 7]]), 2, 3);
    expect(wide.rank).toBe(2);
    expect([...wide.aliased]).toEqual([2]);
    const none = householderQr(new Float64Array(0), 3, 0);
    expect(none.rank).toBe(0);
    expect(none.r.length).toBe(0);
  });
});

// Resuming from a factorisation of the leading columns (left-looking Householder QR: each column
// depends only on the columns before it, Golub and Van Loan, 4th ed., Algorithm 5.2.1) must give
// the factorisation from scratch bit for bit. Invented random matrices, some columns repeated or
// combined so that rank detection sets them aside, in the prefix and after it.
describe('householderQr resumed from a prefix', () => {
  const same = (a: ReturnType<typeof householderQr>, b: ReturnType<typeof householderQr>) => {
    expect(b.rank).toBe(a.rank);
    expect(Array.from(b.kept)).toEqual(Array.from(a.kept));
    expect(Array.from(b.aliased)).toEqual(Array.from(a.aliased));
    for (const key of ['r', 'v', 'beta', 'aliasedTop'] as const) {
      expect(b[key].length).toBe(a[key].length);
      for (let i = 0; i < a[key].length; i++) expect(Object.is(b[key][i], a[key][i])).toBe(true);
    }
  };
  const matrix = fc
    .record({ n: fc.integer({ min: 1, max: 12 }), p: fc.integer({ min: 1, max: 16 }) })
    .chain(({ n, p }) =>
      fc.record({
        n: fc.constant(n),
        p: fc.constant(p),
        cut: fc.integer({ min: 0, max: p }),
        cells: fc.array(fc.double({ min: -4, max: 4, noNaN: true }), { minLength: n * p, maxLength: n * p }),
        copies: fc.array(fc.record({ to: fc.integer({ min: 0, max: p - 1 }), from: fc.integer({ min: 0, max: p - 1 }), w: fc.constantFrom(1, -1, 0.5) }), { maxLength: 4 }),
      }),
    );
  it('gives the same factor to the last bit, aliased columns included (property, fast-check)', () => {
    fc.assert(
      fc.property(matrix, ({ n, p, cut, cells, copies }) => {
        const x = Float64Array.from(cells);
        // A later column set to a multiple of an earlier one: rank detection must set it aside.
        for (const c of copies) if (c.from < c.to) for (let i = 0; i < n; i++) x[c.to * n + i] = c.w * x[c.from * n + i];
        const whole = householderQr(x, n, p);
        const head = householderQr(x.slice(0, n * cut), n, cut);
        same(whole, householderQr(x, n, p, undefined, head));
      }),
      { numRuns: 300 },
    );
  });
  it('ignores a prefix made on other numbers, other rows or another tolerance', () => {
    const x = colMajor([[1, -1, 2, 0.5], [1, 1, -1, 3], [1, -1, 0, 1], [1, 1, 4, -2], [1, 0.5, 1, 1]]);
    const whole = householderQr(x, 5, 4);
    const other = x.slice(0, 10);
    other[3] += 1e-12;
    same(whole, householderQr(x, 5, 4, undefined, householderQr(other, 5, 2)));
    same(whole, householderQr(x, 5, 4, undefined, householderQr(x.slice(0, 8), 4, 2)));
    same(whole, householderQr(x, 5, 4, undefined, householderQr(x.slice(0, 10), 5, 2, 0.5)));
  });
});
