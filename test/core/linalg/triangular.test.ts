import { describe, expect, it } from 'vitest';
import { crossInverse, invertUpper, solveUpper, solveUpperRows, upperRows } from '../../../src/core/linalg/triangular.ts';

// R = [[2, 1, 0], [0, 4, 2], [0, 0, 5]] column-major; worked by hand by back substitution.
const R = Float64Array.from([2, 0, 0, 1, 4, 0, 0, 2, 5]);

describe('triangular helpers (Golub and Van Loan, 4th ed., Algorithm 3.1.2)', () => {
  it('solveUpper: R b = (3, 6, 5) gives b = (1, 1, 1)', () => {
    const c = Float64Array.from([3, 6, 5]);
    solveUpper(R, 3, c);
    // b3 = 5/5 = 1; b2 = (6 - 2*1)/4 = 1; b1 = (3 - 1*1)/2 = 1
    expect([...c]).toEqual([1, 1, 1]);
  });
  it('solveUpperRows on upperRows(R): the same (1, 1, 1), and on a random 30 x 30 R the same bits as solveUpper', () => {
    const c = Float64Array.from([3, 6, 5]);
    solveUpperRows(upperRows(R, 3), 3, c);
    expect([...c]).toEqual([1, 1, 1]);
    let seed = 11;
    const rnd = () => ((seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 2 ** 32) - 0.5;
    const m = 30;
    const r = new Float64Array(m * m);
    for (let j = 0; j < m; j++) for (let i = 0; i <= j; i++) r[j * m + i] = i === j ? 1 + rnd() : rnd();
    const a = Float64Array.from({ length: m }, rnd);
    const b = a.slice();
    solveUpper(r, m, a);
    solveUpperRows(upperRows(r, m), m, b);
    for (let i = 0; i < m; i++) expect(Object.is(a[i], b[i])).toBe(true);
  });
  it('invertUpper: R R^-1 = I', () => {
    const inv = invertUpper(R, 3);
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) {
        let s = 0;
        for (let k = 0; k < 3; k++) s += R[k * 3 + i] * inv[j * 3 + k];
        expect(s).toBeCloseTo(i === j ? 1 : 0, 14);
      }
    }
  });
  it("crossInverse: (R'R)^-1 times R'R is I", () => {
    const c = crossInverse(invertUpper(R, 3), 3);
    const rtr = (i: number, j: number) => R.slice(i * 3, i * 3 + 3).reduce((s, v, k) => s + v * R[j * 3 + k], 0);
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) {
        let s = 0;
        for (let k = 0; k < 3; k++) s += c[k * 3 + i] * rtr(k, j);
        expect(s).toBeCloseTo(i === j ? 1 : 0, 12);
      }
    }
  });
  it('degenerate input: a 0 x 0 system is left as it is; a 1 x 1 one divides', () => {
    const empty = new Float64Array(0);
    solveUpper(empty, 0, empty);
    expect(invertUpper(empty, 0).length).toBe(0);
    const one = Float64Array.from([6]);
    solveUpper(Float64Array.from([3]), 1, one);
    expect(one[0]).toBe(2);
  });
});
