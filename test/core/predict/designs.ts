/**
 * Small designs for the prediction tests. The responses here are invented (clearly marked where
 * used) unless a test loads a published fixture.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { defineFactors, type FactorSpec } from '../../../src/core/factor/factor.ts';
import type { FittedModel } from '../../../src/core/fit/analysis.ts';
import type { ResponseData } from '../../../src/core/study/response-data.ts';

export function fullFactorial(k: number): number[][] {
  return Array.from({ length: 1 << k }, (_, c) => Array.from({ length: k }, (_, f) => ((c >> f) & 1 ? 1 : -1)));
}

export function lcg(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
}

export function responseData(specs: FactorSpec[], coded: number[][], y: number[], blocks: number[] | null = null): ResponseData {
  return { factors: defineFactors(specs), response: 'y', coded, y, blocks, labels: y.map((_, i) => String(i + 1)), messages: [] };
}

export const numeric = (name: string, low = 100, high = 200, unit?: string): FactorSpec => ({ kind: 'numeric', name, low, high, ...(unit ? { unit } : {}) });

/** A hand-built fitted model (invented coefficients) with a diagonal covariance 1/n. */
export function handModel(specs: FactorSpec[], terms: number[], coef: number[], opts: Partial<FittedModel> & { n?: number } = {}): FittedModel {
  const m = coef.length;
  const n = opts.n ?? 16;
  const cov = new Float64Array(m * m);
  for (let j = 0; j < m; j++) cov[j * m + j] = 1 / n;
  return {
    factors: defineFactors(specs),
    response: 'y',
    terms,
    estimates: terms.map(() => null),
    coef: Float64Array.from(coef),
    blockColumns: 0,
    covUnscaled: cov,
    sigma: 1,
    dfResidual: n - m,
    pValues: new Map(terms.map((t) => [t, null])),
    curvatureP: null,
    ...opts,
  };
}

/** Invented data (for tests only): a 2^2 in Temperature and Powder, twice. */
let glossPath: string | null = null;
export function glossFile(): string {
  if (glossPath) return glossPath;
  const dir = mkdtempSync(join(tmpdir(), 'trialbook-predict-'));
  const file = join(dir, 'gloss-invented.csv');
  writeFileSync(
    file,
    ['Temperature (degC),Powder,Gloss', '160,matte,61', '200,matte,70', '160,gloss,66', '200,gloss,79', '160,matte,62', '200,matte,71', '160,gloss,65', '200,gloss,80'].join('\n'),
  );
  return (glossPath = file);
}
