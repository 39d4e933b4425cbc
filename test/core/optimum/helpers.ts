/** Invented quadratic models for the property tests of src/core/optimum (invented numbers, not data). */
import type { FittedModel } from '../../../src/core/fit/analysis.ts';
import { defineFactors } from '../../../src/core/factor/factor.ts';
import { quadraticTerms } from '../../../src/core/model/formula.ts';
import { isInteraction, isMainEffect, isSquare, termFactors } from '../../../src/core/model/term.ts';
import { pcg32 } from '../../../src/core/design/random.ts';

/** A uniform number in [lo, hi) from the project's PCG32 stream. */
export function uniform(rng: ReturnType<typeof pcg32>, lo: number, hi: number): number {
  return lo + (hi - lo) * (rng.next() / 2 ** 32);
}

/**
 * A full quadratic model in k numeric factors (10..20 each, invented) with random coefficients
 * from `seed`, or the given b and B; sigma 1 on 10 residual df and identity covariance, so
 * intervals exist.
 */
export function syntheticModel(k: number, seed: number, given?: { b: number[]; B: number[][]; b0?: number }): FittedModel {
  const factors = defineFactors(Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 10, high: 20, unit: 'u' })));
  const terms = quadraticTerms(factors);
  const rng = pcg32(seed);
  const b0 = given?.b0 ?? uniform(rng, -5, 5);
  const b = given?.b ?? Array.from({ length: k }, () => uniform(rng, -3, 3));
  let B = given?.B;
  if (!B) {
    B = Array.from({ length: k }, () => new Array<number>(k).fill(0));
    for (let i = 0; i < k; i++) for (let j = i; j < k; j++) B[i][j] = B[j][i] = uniform(rng, -2, 2);
  }
  const coef = new Float64Array(1 + terms.length);
  coef[0] = b0;
  terms.forEach((t, j) => {
    const f = termFactors(t);
    coef[1 + j] = isSquare(t) ? B![f[0]][f[0]] : isMainEffect(t) ? b[f[0]] : isInteraction(t) ? 2 * B![f[0]][f[1]] : 0;
  });
  const m = 1 + terms.length;
  const cov = new Float64Array(m * m);
  for (let i = 0; i < m; i++) cov[i * m + i] = 0.1;
  return {
    factors,
    response: 'Y',
    terms,
    estimates: terms.map(() => null),
    coef,
    blockColumns: 0,
    covUnscaled: cov,
    sigma: 1,
    dfResidual: 10,
    pValues: new Map(),
    curvatureP: null,
  };
}
