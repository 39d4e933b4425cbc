/**
 * Roots of a smooth function inside a bracket, for the Box-Cox search (box-cox.ts), each from a
 * starting point that is already close (hermite-cell.ts), so that one or two evaluations finish.
 * - newtonInBracket: Newton's method with the slope the function returns beside its value, kept
 *   inside the bracket (Press et al., Numerical Recipes, 3rd ed., section 9.4, rtsafe): a step
 *   that would leave the bracket takes false position on it instead, or bisects.
 * - secantInBracket: the secant method on the last two points, kept inside the bracket the same
 *   way (Brent, Algorithms for Minimization without Derivatives, 1973, chapter 4, in its simplest
 *   form), for a function whose slope is not at hand.
 * Stopping: each step's size estimates the error before it; Newton's error after a step s_k is
 * about C s_k^2 and the secant's about s_k sqrt(|s_k / s_(k-1)|) (orders 2 and 1.618, Atkinson, An
 * Introduction to Numerical Analysis, 2nd ed., sections 2.2-2.3), with C = |s_k| / s_(k-1)^2. The
 * search stops, without a further evaluation, once that estimate is below tol, or when the
 * bracket is narrower than tol. Newton's first step has no step before it: a caller that knows
 * the curvature near the start passes C = |g''| / (2 |g'|) (Atkinson, section 2.2: the error after
 * a step s is about C s^2), else the first step is taken as its own error estimate. Throws nothing; a value that is not finite ends the search at the
 * bracket's middle.
 * Example: newtonInBracket(x -> [x^2 - 2, 2x], 1, 2, 1.4, 1e-9) -> 1.41421356...
 */

/** `f(x)` returns [g(x), g'(x)]; g(inside) >= 0 > g(outside); `x` a start between them. */
export function newtonInBracket(f: (x: number) => readonly [number, number], inside: number, outside: number, x: number, tol: number, curvature = Number.NaN): number {
  let a = inside;
  let b = outside;
  let last = Number.NaN;
  let c = curvature;
  for (let iter = 0; iter < 100; iter++) {
    if (!within(x, a, b)) x = (a + b) / 2;
    const [g, d] = f(x);
    if (g === 0) return x;
    if (g > 0) a = x;
    else if (g < 0) b = x;
    else return (a + b) / 2; // not a number: no finer answer
    const step = -g / d;
    const next = x + step;
    if (!within(next, a, b)) {
      last = Number.NaN;
      c = Number.NaN;
      x = (a + b) / 2;
      if (Math.abs(b - a) < tol) return x;
      continue;
    }
    const size = Math.abs(step);
    if (Number.isFinite(last) && last > 0) c = size / (last * last);
    const predicted = Number.isFinite(c) ? c * size * size : size;
    if (predicted < tol || Math.abs(b - a) < tol) return next;
    last = size;
    c = Number.NaN;
    x = next;
  }
  return (a + b) / 2;
}

/** g changes sign between a (value ga) and b (value gb); `x` a start between them. */
export function secantInBracket(g: (x: number) => number, a: number, ga: number, b: number, gb: number, x: number, tol: number): number {
  if (!within(x, a, b)) x = (a + b) / 2;
  const aPositive = ga > 0;
  let x0 = Number.NaN;
  let g0 = Number.NaN;
  let last = Number.NaN;
  for (let iter = 0; iter < 100; iter++) {
    const gx = g(x);
    if (gx === 0) return x;
    if (!Number.isFinite(gx)) return (a + b) / 2; // no finer answer
    if (gx > 0 === aPositive) {
      a = x;
      ga = gx;
    } else {
      b = x;
      gb = gx;
    }
    // The secant through the last two points; at the start, false position on the bracket.
    let next = Number.isFinite(x0) && gx !== g0 ? x - (gx * (x - x0)) / (gx - g0) : a - (ga * (b - a)) / (gb - ga);
    let size = Math.abs(next - x);
    if (!within(next, a, b)) {
      next = (a + b) / 2;
      size = Number.NaN;
    }
    const predicted = Number.isFinite(last) && Number.isFinite(size) ? size * Math.sqrt(size / last) : size;
    if (predicted < tol || Math.abs(b - a) < tol) return next;
    last = size;
    x0 = x;
    g0 = gx;
    x = next;
  }
  return (a + b) / 2;
}

function within(x: number, a: number, b: number): boolean {
  return a < b ? a < x && x < b : b < x && x < a;
}
