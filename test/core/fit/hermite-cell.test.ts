import { describe, expect, it } from 'vitest';
import { hermiteLevel, hermiteSlopes, hermiteStationary } from '../../../src/core/fit/hermite-cell.ts';

describe('the cubic Hermite interpolant of one cell (Burden and Faires, Numerical Analysis, 9th ed., section 3.4)', () => {
  it('reproduces a cubic exactly: -(x - 0.3)^2 (x + 2) has its maximum at 0.3 and a minimum at -3.7 / 3', () => {
    const f = (x: number) => -((x - 0.3) ** 2) * (x + 2);
    const d = (x: number) => -2 * (x - 0.3) * (x + 2) - (x - 0.3) ** 2;
    // f' = -(x - 0.3)(3x + 3.7): it falls through 0 at 0.3 (the maximum) and rises through 0 at -3.7 / 3.
    expect(hermiteStationary(0, 1, f(0), f(1), d(0), d(1))).toBeCloseTo(0.3, 12);
    expect(hermiteStationary(-2, 0, f(-2), f(0), d(-2), d(0))).toBeNull(); // only the minimum lies in this cell
  });
  it('finds where a cubic crosses a level, in either order of the ends', () => {
    const f = (x: number) => x * x * x;
    expect(hermiteLevel(2, 1, 8, 1, 12, 3, 2)).toBeCloseTo(Math.cbrt(2), 11);
    expect(hermiteLevel(1, 2, 1, 8, 3, 12, 2)).toBeCloseTo(Math.cbrt(2), 11);
    expect(f(hermiteLevel(1, 2, 1, 8, 3, 12, 5))).toBeCloseTo(5, 10);
  });
  it("gives a cubic's own first and second derivatives, and a nearly linear slope's turn", () => {
    const [d1, d2] = hermiteSlopes(1, 2, 1, 8, 3, 12, 1.5); // x^3: 3x^2 and 6x at 1.5
    expect(d1).toBeCloseTo(6.75, 12);
    expect(d2).toBeCloseTo(9, 12);
    // -x^2 + 1e-13 x^3 on [-1, 2]: the maximum stays at about 0.
    const g = (x: number) => -x * x + 1e-13 * x ** 3;
    const dg = (x: number) => -2 * x + 3e-13 * x * x;
    expect(hermiteStationary(-1, 2, g(-1), g(2), dg(-1), dg(2))).toBeCloseTo(0, 10);
  });
});
