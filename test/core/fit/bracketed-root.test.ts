import { describe, expect, it } from 'vitest';
import { newtonInBracket, secantInBracket } from '../../../src/core/fit/bracketed-root.ts';
import { hermiteLevel, hermiteStationary } from '../../../src/core/fit/hermite-cell.ts';

// Reference values: sqrt(2) = 1.41421356237..., the root of cos x = x (the Dottie number,
// 0.7390851332151607), handbook constants (from memory; both check by substitution below).
describe('roots in a bracket (Press et al., Numerical Recipes, 3rd ed., section 9.4; Brent 1973, chapter 4)', () => {
  it('Newton with the slope: sqrt(2) to 1e-12 in a few evaluations, from either side', () => {
    let calls = 0;
    const f = (x: number) => (calls++, [2 - x * x, -2 * x] as const); // g(inside) >= 0 at 1
    const r = newtonInBracket(f, 1, 2, 1.3, 1e-12);
    expect(Math.abs(r - Math.SQRT2)).toBeLessThan(1e-12);
    expect(calls).toBeLessThanOrEqual(5);
    const back = newtonInBracket(f, 1, 2, 1.9, 1e-12);
    expect(Math.abs(back - Math.SQRT2)).toBeLessThan(1e-12);
  });
  it('the secant without a slope: cos x = x to 1e-12; a start outside the bracket is brought inside', () => {
    const g = (x: number) => Math.cos(x) - x;
    const r = secantInBracket(g, 0, g(0), 1, g(1), 0.7, 1e-12);
    expect(Math.abs(r - 0.7390851332151607)).toBeLessThan(1e-12);
    expect(Math.abs(g(r))).toBeLessThan(1e-12);
    const out = secantInBracket(g, 1, g(1), 0, g(0), 5, 1e-12);
    expect(Math.abs(out - 0.7390851332151607)).toBeLessThan(1e-12);
  });
  it('a function with a non-finite value ends at the middle of the bracket, inside it', () => {
    const r = secantInBracket(() => Number.NaN, 0, 1, 1, -1, 0.3, 1e-9);
    expect(r).toBeGreaterThan(0);
    expect(r).toBeLessThan(1);
  });
});

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
});
