/**
 * The cubic Hermite interpolant of a smooth function on one cell [a, b] from its values and slopes
 * at both ends (Burden and Faires, Numerical Analysis, 9th ed., section 3.4; de Boor, A Practical
 * Guide to Splines, 2001, chapter IV): with h = b - a and t = (x - a) / h,
 *   p = (2t^3 - 3t^2 + 1) fa + (t^3 - 2t^2 + t) h da + (-2t^3 + 3t^2) fb + (t^3 - t^2) h db.
 * Its error is O(h^4), so its stationary point and its level crossings are starting points a
 * refinement needs only a step or two to finish (box-cox.ts). Pure arithmetic; throws nothing.
 * Example: f = -x^2 on [-1, 2] (fa -1, da 2, fb -4, db -4) -> hermiteStationary 0 (p is f itself), and
 * hermiteLevel(-1, 2, -1, -4, 2, -4, -1) -> 1.
 */

/** The point in (a, b) where p has a maximum (p' turns from + to -), or null when it has none inside. */
export function hermiteStationary(a: number, b: number, fa: number, fb: number, da: number, db: number): number | null {
  const h = b - a;
  // h p'(t) = A t^2 + B t + C.
  const A = 6 * fa + 3 * h * da - 6 * fb + 3 * h * db;
  const B = -6 * fa - 4 * h * da + 6 * fb - 2 * h * db;
  const C = h * da;
  let t: number;
  if (A === 0) {
    if (!(B < 0)) return null; // p' linear and rising: a minimum, or no turn
    t = -C / B;
  }
  else {
    const disc = B * B - 4 * A * C;
    if (disc < 0) return null;
    // The stable pair of roots (Press et al., Numerical Recipes, 3rd ed., section 5.6).
    const q = -(B + (B >= 0 ? 1 : -1) * Math.sqrt(disc)) / 2;
    const r1 = q / A;
    const r2 = q !== 0 ? C / q : r1;
    // The maximum is the root where the derivative falls: p'' = 2At + B < 0.
    t = 2 * A * r1 + B < 0 ? r1 : r2;
  }
  return t > 0 && t < 1 ? a + t * h : null;
}

/** A point x in the cell where p(x) = level, with p(a) >= level > p(b) or the reverse (a and b in either order), by bisection on p. */
export function hermiteLevel(a: number, b: number, fa: number, fb: number, da: number, db: number, level: number): number {
  const h = b - a;
  const p = (t: number): number => {
    const t2 = t * t;
    const t3 = t2 * t;
    return (2 * t3 - 3 * t2 + 1) * fa + (t3 - 2 * t2 + t) * h * da + (-2 * t3 + 3 * t2) * fb + (t3 - t2) * h * db - level;
  };
  let lo = 0;
  let hi = 1;
  const above = fa >= level;
  for (let i = 0; i < 40; i++) {
    const m = (lo + hi) / 2;
    if (p(m) >= 0 === above) lo = m;
    else hi = m;
  }
  return a + ((lo + hi) / 2) * h;
}

/** p'(x) and p''(x) of the same cubic: the refinement's estimate of its first Newton step's error (bracketed-root.ts). */
export function hermiteSlopes(a: number, b: number, fa: number, fb: number, da: number, db: number, x: number): readonly [number, number] {
  const h = b - a;
  const t = (x - a) / h;
  const d1 = ((6 * t * t - 6 * t) * fa + (3 * t * t - 4 * t + 1) * h * da + (-6 * t * t + 6 * t) * fb + (3 * t * t - 2 * t) * h * db) / h;
  const d2 = ((12 * t - 6) * fa + (6 * t - 4) * h * da + (-12 * t + 6) * fb + (6 * t - 2) * h * db) / (h * h);
  return [d1, d2];
}
