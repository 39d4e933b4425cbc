import MLR from 'ml-regression-multivariate-linear';
import { describe, expect, it } from 'vitest';
import { boxCox } from '../../../src/core/fit/box-cox.ts';

// Box and Cox (1964), JRSS B 26, 211-252, section 6 (the biological experiment): survival times
// (units of 10 hours) of animals under 3 poisons x 4 treatments, 4 animals each. Values from
// memory (the data set as it is widely reprinted); Box and Cox report lambda-hat about -0.75 for
// the additive two-way model, with an interval that holds -1 (reciprocal: rate of dying), from memory.
const poison = [
  [[0.31, 0.45, 0.46, 0.43], [0.82, 1.1, 0.88, 0.72], [0.43, 0.45, 0.63, 0.76], [0.45, 0.71, 0.66, 0.62]],
  [[0.36, 0.29, 0.4, 0.23], [0.92, 0.61, 0.49, 1.24], [0.44, 0.35, 0.31, 0.4], [0.56, 1.02, 0.71, 0.38]],
  [[0.22, 0.21, 0.18, 0.23], [0.3, 0.37, 0.38, 0.29], [0.23, 0.25, 0.24, 0.22], [0.3, 0.36, 0.31, 0.33]],
];
const rows: number[][] = []; // dummy-coded additive model: poison II, III; treatment B, C, D
const y: number[] = [];
poison.forEach((byTreat, pIdx) => byTreat.forEach((vals, tIdx) => vals.forEach((v) => {
  rows.push([pIdx === 1 ? 1 : 0, pIdx === 2 ? 1 : 0, tIdx === 1 ? 1 : 0, tIdx === 2 ? 1 : 0, tIdx === 3 ? 1 : 0]);
  y.push(v);
})));
const n = y.length;
const p = 6;
const x = new Float64Array(n * p);
for (let i = 0; i < n; i++) {
  x[i] = 1;
  for (let j = 0; j < 5; j++) x[(j + 1) * n + i] = rows[i][j];
}

/** L(lambda) by direct evaluation: the geometric-mean-scaled transform fitted by a reference regression library. */
function referenceLoglik(lambda: number): number {
  const g = Math.exp(y.reduce((s, v) => s + Math.log(v), 0) / n);
  const w = y.map((v) => (lambda === 0 ? g * Math.log(v) : (v ** lambda - 1) / (lambda * g ** (lambda - 1))));
  const ref = new MLR(rows, w.map((v) => [v]), { intercept: true });
  const pred = ref.predict(rows) as number[][];
  const sse = w.reduce((s, v, i) => s + (v - pred[i][0]) ** 2, 0);
  return -(n / 2) * Math.log(sse / n);
}

describe('boxCox (Box and Cox 1964)', () => {
  const b = boxCox(x, n, p, y)!;
  it('the poison data, additive model: lambda-hat near -0.75 and the interval holds -1, so the suggestion is inverse (Box and Cox 1964, from memory)', () => {
    expect(b.lambda).toBeGreaterThan(-0.85);
    expect(b.lambda).toBeLessThan(-0.65);
    expect(b.ci[0]!).toBeLessThan(-1);
    expect(b.ci[1]!).toBeGreaterThan(-1);
    expect(b.ci[1]!).toBeLessThan(0); // log (0) is outside: the interval excludes it (from memory)
    expect(b.suggestion).toBe('inverse');
  });
  it('lambda-hat maximises the profile likelihood of a direct grid evaluation with ml-regression-multivariate-linear', () => {
    const top = referenceLoglik(b.lambda);
    for (let l = -3; l <= 3.0001; l += 0.05) expect(referenceLoglik(l)).toBeLessThanOrEqual(top + 1e-9);
    expect(referenceLoglik(b.lambda - 1e-3)).toBeLessThan(top);
    expect(referenceLoglik(b.lambda + 1e-3)).toBeLessThan(top);
  });
  it('the interval ends lie where L falls 3.8415 / 2 below its maximum (chi-square(1, 0.95) = 3.8415, handbook table)', () => {
    const top = referenceLoglik(b.lambda);
    expect(referenceLoglik(b.ci[0]!)).toBeCloseTo(top - 3.8415 / 2, 3);
    expect(referenceLoglik(b.ci[1]!)).toBeCloseTo(top - 3.8415 / 2, 3);
  });
  it('lambda-hat and the interval ends to 1e-6: a golden-section search and bisection on the reference likelihood agree', () => {
    // Golden-section search (Press et al., Numerical Recipes, 3rd ed., section 10.2) on [-1.5, 0].
    let lo = -1.5;
    let hi = 0;
    const r = (Math.sqrt(5) - 1) / 2;
    while (hi - lo > 1e-9) {
      const c = hi - r * (hi - lo);
      const d = lo + r * (hi - lo);
      if (referenceLoglik(c) > referenceLoglik(d)) hi = d;
      else lo = c;
    }
    expect(Math.abs(b.lambda - (lo + hi) / 2)).toBeLessThan(1e-6);
    const top = referenceLoglik((lo + hi) / 2);
    const bisect = (inside: number, outside: number): number => {
      for (let i = 0; i < 60; i++) {
        const m = (inside + outside) / 2;
        if (referenceLoglik(m) >= top - 1.959963984540054 ** 2 / 2) inside = m;
        else outside = m;
      }
      return inside;
    };
    // chi-square(1, 0.95) = z(0.975)^2, z(0.975) = 1.959963984540054 (the normal table's 1.96, to full precision).
    expect(Math.abs(b.ci[0]! - bisect(b.lambda, -3))).toBeLessThan(1e-6);
    expect(Math.abs(b.ci[1]! - bisect(b.lambda, 3))).toBeLessThan(1e-6);
  });
  it('degenerate input: a non-positive value or no residual df gives null', () => {
    expect(boxCox(x, n, p, y.map((v, i) => (i === 0 ? 0 : v)))).toBeNull();
    const identity = new Float64Array(36).map((_, k) => (k % 7 === 0 ? 1 : 0)); // six runs, six columns
    expect(boxCox(identity, 6, 6, y.slice(0, 6))).toBeNull();
    // y' over more than 1e100: (1 / y')^3 is beyond binary64, so no power is suggested rather than a wrong one.
    expect(boxCox(x, n, p, y.map((v, i) => (i === 0 ? 1e-110 : v)))).toBeNull();
  });
});
