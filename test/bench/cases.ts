/**
 * The benchmark cases (invented data, for timing only): (1) a 2^7 design with 2 replicates and 4
 * center runs under the full 128-term model; (2) a 2^6 design with 5 runs deleted and off-target
 * settings under main effects plus two-factor interactions.
 */
import { defineFactors } from '../../src/core/factor/factor.ts';
import { termsUpToOrder } from '../../src/core/model/formula.ts';
import type { ResponseData } from '../../src/core/study/response-data.ts';

function lcg(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
}

function full(k: number): number[][] {
  return Array.from({ length: 1 << k }, (_, c) => Array.from({ length: k }, (_, f) => ((c >> f) & 1 ? 1 : -1)));
}

function factors(k: number) {
  return defineFactors(Array.from({ length: k }, (_, i) => ({ kind: 'numeric' as const, name: `X${i + 1}`, low: 100, high: 200 })));
}

function response(coded: number[][], rnd: () => number): number[] {
  return coded.map((x) => 50 + 4 * x[0] - 3 * x[1] + 2 * x[0] * x[1] + (x[2] ?? 0) + (rnd() - 0.5) * 2);
}

export function case1(): { data: ResponseData; terms: number[] } {
  const rnd = lcg(1);
  const coded = [...full(7), ...full(7), ...Array.from({ length: 4 }, () => Array(7).fill(0))];
  const y = response(coded, rnd);
  return {
    data: { factors: factors(7), response: 'y', coded, y, blocks: null, labels: coded.map((_, i) => String(i + 1)), messages: [] },
    terms: termsUpToOrder(7, 7),
  };
}

export function case2(): { data: ResponseData; terms: number[] } {
  const rnd = lcg(2);
  const drop = new Set([3, 17, 30, 41, 58]);
  const coded = full(6)
    .filter((_, i) => !drop.has(i))
    .map((row) => row.map((v) => v + (rnd() - 0.5) * 0.1));
  const y = response(coded, rnd);
  return {
    data: { factors: factors(6), response: 'y', coded, y, blocks: null, labels: coded.map((_, i) => String(i + 1)), messages: [] },
    terms: termsUpToOrder(6, 2),
  };
}
