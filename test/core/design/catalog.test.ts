import { describe, expect, it } from 'vitest';
import {
  CATALOG_RUN_SIZES,
  CHEN_SUN_WU_1993,
  XU_2009,
  catalogEntries,
  catalogFraction,
} from '../../../src/core/design/catalog.ts';
import { MAX_DESIGN_FACTORS } from '../../../src/core/design/max-design-factors.ts';
import { definingRelation, resolution, wordLengthPattern } from '../../../src/core/design/defining-relation.ts';
import { generatorWord, parseGenerators } from '../../../src/core/design/generators.ts';
import { minimumAberration, patternOf } from '../../../src/core/design/minimum-aberration.ts';
import { InputError } from '../../../src/core/errors.ts';
import { mask, numericFactors } from './helpers.ts';

/**
 * Word-length patterns (A3, A4, A5, ...) of the minimum aberration designs as the sources tabulate
 * them: Chen, Sun and Wu (1993), International Statistical Review 61, 131-145, catalog tables (8,
 * 16, 32 and 64 runs) and Xu (2009), Technometrics 51, 262-277 (128 runs). From memory; the
 * exhaustive searches below confirm every value: 8 to 32 runs and 64 and 128 runs up to 14 and
 * 13 factors in every run, the rest (64 runs with 15 factors, 128 runs with 14 and 15; about ten
 * minutes) when TRIALBOOK_SLOW_TESTS=1.
 */
const PUBLISHED: Record<number, Record<number, number[]>> = {
  8: { 4: [0, 1], 5: [2, 1], 6: [4, 3], 7: [7, 7, 0, 0, 1] },
  16: {
    5: [0, 0, 1],
    6: [0, 3],
    7: [0, 7],
    8: [0, 14, 0, 0, 0, 1],
    9: [4, 14, 8, 0, 4, 1],
    10: [8, 18, 16, 8, 8, 5],
    11: [12, 26, 28, 24, 20, 13, 4],
    12: [16, 39, 48, 48, 48, 39, 16, 0, 0, 1],
    13: [22, 55, 72, 96, 116, 87, 40, 16, 6, 1],
    14: [28, 77, 112, 168, 232, 203, 112, 56, 28, 7],
    15: [35, 105, 168, 280, 435, 435, 280, 168, 105, 35, 0, 0, 1],
  },
  32: {
    6: [0, 0, 0, 1],
    7: [0, 1, 2],
    8: [0, 3, 4],
    9: [0, 6, 8, 0, 0, 1],
    10: [0, 10, 16, 0, 0, 5],
    11: [0, 25, 0, 27, 0, 10, 0, 1],
    12: [0, 38, 0, 52, 0, 33, 0, 4],
    13: [0, 55, 0, 96, 0, 87, 0, 16, 0, 1],
    14: [0, 77, 0, 168, 0, 203, 0, 56, 0, 7],
    15: [0, 105, 0, 280, 0, 435, 0, 168, 0, 35],
  },
  64: {
    7: [0, 0, 0, 0, 1],
    8: [0, 0, 2, 1],
    9: [0, 1, 4, 2],
    10: [0, 2, 8, 4, 0, 1],
    11: [0, 4, 14, 8, 0, 3, 2],
    12: [0, 6, 24, 16, 0, 9, 8],
    13: [0, 14, 28, 24, 24, 17, 12, 8],
    14: [0, 22, 40, 36, 56, 49, 24, 20, 8],
    15: [0, 30, 60, 60, 105, 105, 60, 60, 30, 0, 0, 0, 1],
  },
  128: {
    8: [0, 0, 0, 0, 0, 1],
    9: [0, 0, 0, 3],
    10: [0, 0, 3, 3, 1],
    11: [0, 0, 6, 6, 2, 1],
    12: [0, 1, 8, 12, 8, 1, 0, 0, 0, 1],
    13: [0, 2, 16, 18, 10, 9, 4, 2, 2],
    14: [0, 3, 24, 36, 16, 11, 24, 12, 0, 1],
    15: [0, 7, 32, 52, 40, 35, 48, 28, 8, 5],
  },
};

function columnsOf(generators: readonly string[]): number[] {
  return generators.map((g) => mask(g.split('=')[1]));
}

/** The pattern as a list from length 3 up, trailing zeros dropped. */
function fromThree(pattern: readonly number[]): number[] {
  const out = pattern.slice(3);
  while (out.length > 0 && out[out.length - 1] === 0) out.pop();
  return out;
}

const slow = process.env.TRIALBOOK_SLOW_TESTS === '1';

describe('catalog', () => {
  it('covers 8 to 128 runs, every factor count up to 15, one source per run size', () => {
    expect([...CATALOG_RUN_SIZES]).toEqual([8, 16, 32, 64, 128]);
    const entries = catalogEntries();
    for (const runs of CATALOG_RUN_SIZES) {
      const ks = entries.filter((e) => e.runs === runs).map((e) => e.factors);
      const m = Math.log2(runs);
      expect(ks).toEqual(Array.from({ length: Math.min(runs - 1, MAX_DESIGN_FACTORS) - m }, (_, i) => m + 1 + i));
      expect(new Set(entries.filter((e) => e.runs === runs).map((e) => e.source))).toEqual(new Set([runs === 128 ? XU_2009 : CHEN_SUN_WU_1993]));
    }
  });

  for (const e of catalogEntries()) {
    const label = `${e.runs} runs, ${e.factors} factors (${e.generators.join(', ')})`;
    it(`${label}: word lengths and resolution as tabulated by ${e.runs === 128 ? 'Xu (2009)' : 'Chen, Sun and Wu (1993)'}`, () => {
      const f = numericFactors(e.factors);
      const rel = definingRelation(parseGenerators(e.generators, f).map(generatorWord));
      const published = PUBLISHED[e.runs][e.factors];
      const expected: Record<number, number> = {};
      published.forEach((n, i) => n > 0 && (expected[i + 3] = n));
      expect(wordLengthPattern(rel)).toEqual(expected);
      expect(resolution(rel)).toBe(published.findIndex((n) => n > 0) + 3);
    });
    const cheap = e.runs <= 32 || (e.runs === 64 && e.factors <= 14) || (e.runs === 128 && e.factors <= 13);
    it.runIf(cheap || slow)(`${label}: exhaustive search finds no regular fraction with a smaller word-length pattern`, () => {
      const cols = columnsOf(e.generators);
      const pattern = patternOf(e.factors, cols);
      expect(fromThree(pattern)).toEqual(fromThree([0, 0, 0, ...PUBLISHED[e.runs][e.factors]]));
      const better = minimumAberration(e.factors, cols.length, pattern);
      expect(better.columns).toBeNull();
    }, 3_600_000);
  }
});

describe('catalogFraction', () => {
  it('gives the 2^(7-3) of Chen, Sun and Wu (1993) in our letters', () => {
    const e = catalogFraction(7, 3);
    expect(e.runs).toBe(16);
    expect(e.generators).toEqual(['E=ABC', 'F=ABD', 'G=ACD']);
  });
  it('letters skip I: the 10th factor of the 2^(10-6) is K', () => {
    expect(catalogFraction(10, 6).generators.at(-1)).toBe('K=AB');
  });
  it('refuses sizes outside the catalog with what it covers', () => {
    expect(() => catalogFraction(3, 1)).toThrow(/4 runs; the built-in catalog covers 8 to 128 runs/);
    expect(() => catalogFraction(9, 1)).toThrow(/256 runs; the built-in catalog covers 8 to 128 runs/);
    expect(() => catalogFraction(16, 11)).toThrow(/up to 15 factors/);
    expect(() => catalogFraction(8, 5)).toThrow(/8 runs, which carry at most 7 factors/);
    expect(() => catalogFraction(5, 0)).toThrow(InputError);
  });
});
