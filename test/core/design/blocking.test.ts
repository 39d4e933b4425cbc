import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  MONTGOMERY_TABLE_7_8,
  MONTGOMERY_TABLE_SOURCE,
  blockConfounded,
  blockOf,
  blockSpan,
  defaultBlocking,
  parseBlockWords,
} from '../../../src/core/design/blocking.ts';
import { catalogFraction } from '../../../src/core/design/catalog.ts';
import { blockOriginText } from '../../../src/core/text/design-text.ts';
import { definingRelation } from '../../../src/core/design/defining-relation.ts';
import { basicFactors } from '../../../src/core/design/fractional.ts';
import { fullFactorial } from '../../../src/core/design/full-factorial.ts';
import { generatorWord, parseGenerators } from '../../../src/core/design/generators.ts';
import { formatWord } from '../../../src/core/design/word.ts';
import { InputError } from '../../../src/core/errors.ts';
import { column, mask, numericFactors } from './helpers.ts';

const L = 'ABCDEFGHJKLMNOP'.split('');
const words = (ms: readonly number[]) => ms.map((m) => formatWord(m, L));

/**
 * "Interactions confounded with blocks" column of Montgomery, Design and Analysis of Experiments,
 * 8th ed., Table 7.8 (from memory), for 2, 4 and 8 blocks.
 */
const TABLE_CONFOUNDED: Record<number, Record<number, string[]>> = {
  3: { 2: ['ABC'], 4: ['AB', 'AC', 'BC'] },
  4: { 2: ['ABCD'], 4: ['BD', 'ABC', 'ACD'], 8: ['AB', 'AC', 'AD', 'BC', 'BD', 'CD', 'ABCD'] },
  5: { 2: ['ABCDE'], 4: ['ABC', 'CDE', 'ABDE'], 8: ['AC', 'BD', 'ABE', 'ADE', 'BCE', 'CDE', 'ABCD'] },
  6: { 2: ['ABCDEF'], 4: ['ABCF', 'ABDE', 'CDEF'], 8: ['ACE', 'ADF', 'BCF', 'BDE', 'ABCD', 'ABEF', 'CDEF'] },
  7: { 2: ['ABCDEFG'], 4: ['ABDE', 'ABCFG', 'CDEFG'], 8: ['ABC', 'AFG', 'DEF', 'ADEG', 'BCFG', 'BCDEG', 'ABCDEF'] },
};

describe('defaultBlocking for full factorials', () => {
  for (const k of [3, 4, 5, 6, 7]) {
    for (const b of [2, 4, 8]) {
      if (!TABLE_CONFOUNDED[k][b]) continue;
      it(`2^${k} in ${b} blocks confounds ${TABLE_CONFOUNDED[k][b].join(', ')} (Montgomery, 8th ed., Table 7.8, from memory)`, () => {
        const blocking = defaultBlocking(k, [], Array.from({ length: k }, (_, i) => i), b);
        expect(blockOriginText(blocking.origin)).toBe(MONTGOMERY_TABLE_SOURCE);
        expect(words(blocking.generators)).toEqual(MONTGOMERY_TABLE_7_8[k][b]);
        expect(words(blockConfounded(blocking.generators, []))).toEqual(TABLE_CONFOUNDED[k][b]);
      });
    }
  }
  it('confounds the highest-order interaction for 2 blocks beyond the table (Montgomery, 8th ed., section 7.4)', () => {
    expect(words(defaultBlocking(2, [], [0, 1], 2).generators)).toEqual(['AB']);
    expect(words(defaultBlocking(9, [], [...Array(9).keys()], 2).generators)).toEqual(['ABCDEFGHJ']);
  });
  it('uses minimum aberration block words for 8 to 10 factors: 2^10 in 8 blocks confounds 3 five-, 3 six- and 1 seven-factor interaction (the 2^(10-3) of Xu 2009, from memory)', () => {
    const g = defaultBlocking(10, [], [...Array(10).keys()], 8).generators;
    const lengths = blockConfounded(g, []).map((m) => formatWord(m, L).length);
    expect(lengths).toEqual([5, 5, 5, 6, 6, 6, 7]);
  });
  it('refuses blocks of one run and returns nothing for one block (degenerate input)', () => {
    expect(defaultBlocking(3, [], [0, 1, 2], 1).generators).toEqual([]);
    expect(() => defaultBlocking(2, [], [0, 1], 4)).toThrow(/one run per block/);
    expect(() => defaultBlocking(3, [], [0, 1, 2], 8)).toThrow(/at least 2 factorial runs/);
    expect(() => defaultBlocking(3, [], [0, 1, 2], 3)).toThrow(/1, 2, 4 or 8/);
  });
});

describe('defaultBlocking for fractions', () => {
  it('blocks the 2^(7-3) in 2 blocks without confounding a main effect or a two-factor interaction', () => {
    const f = numericFactors(7);
    const gens = parseGenerators(catalogFraction(7, 3).generators, f);
    const rel = definingRelation(gens.map(generatorWord));
    const b = defaultBlocking(7, rel, basicFactors(7, gens), 2);
    const confounded = blockConfounded(b.generators, rel);
    const all = blockSpan(b.generators).flatMap((w) => [w, ...rel.map((r) => r.mask ^ w)]);
    expect(all.every((m) => formatWord(m, L).length >= 3)).toBe(true);
    expect(confounded.length).toBe(1);
  });
  it('refuses when every choice confounds a main effect (the 2^(7-4) in 4 blocks)', () => {
    const f = numericFactors(7);
    const gens = parseGenerators(catalogFraction(7, 4).generators, f);
    const rel = definingRelation(gens.map(generatorWord));
    expect(() => defaultBlocking(7, rel, basicFactors(7, gens), 4)).toThrow(/would confound a main effect with blocks whatever words/);
  });
});

describe('defaultBlocking search budget', () => {
  it('settles for the best found, and says so, when a large typed fraction has too many candidates', () => {
    const f = numericFactors(12);
    const gens = parseGenerators(['L=ABCDEF', 'M=FGHJK'], f);
    const rel = definingRelation(gens.map(generatorWord));
    const b = defaultBlocking(12, rel, basicFactors(12, gens), 8);
    expect(b.generators.length).toBe(3);
    expect(blockOriginText(b.origin)).toMatch(/stopped after 200000 candidates \(the best found, not proven best\)/);
    const confounded = blockSpan(b.generators).flatMap((w) => [w, ...rel.map((r) => r.mask ^ w)]);
    expect(confounded.every((m) => formatWord(m, L).length >= 3)).toBe(true);
  });
});

describe('parseBlockWords', () => {
  const f4 = numericFactors(4);
  it('reads typed words (Montgomery, 8th ed., section 7.6: ABC and ACD for 4 blocks of the 2^4)', () => {
    expect(words(parseBlockWords(['ABC', 'ACD'], 4, f4, [], 16))).toEqual(['ABC', 'ACD']);
  });
  it('refuses a wrong count, dependent words, words in the defining relation, confounded main effects and tiny blocks', () => {
    expect(() => parseBlockWords(['ABC'], 4, f4, [], 16)).toThrow(/4 blocks need 2 block words, got 1/);
    expect(() => parseBlockWords(['AB', 'CD', 'ABCD'], 8, f4, [], 16)).toThrow(/dependent/);
    expect(() => parseBlockWords(['ABC', 'BC'], 4, f4, [], 16)).toThrow(/would confound the main effect A with blocks/);
    expect(() => parseBlockWords(['ABCD'], 2, f4, [{ mask: mask('ABCD'), sign: 1 }], 8)).toThrow(/word of the defining relation/);
    expect(() => parseBlockWords(['AB', 'AC', 'AD'], 8, f4, [{ mask: mask('ABCD'), sign: 1 }], 8)).toThrow(/one run per block/);
    expect(() => parseBlockWords([], 2, f4, [], 16)).toThrow(/got 0/);
  });
});

describe('blockOf', () => {
  it('puts the all-low run in block 0 (the principal block, Montgomery, 8th ed., section 7.4)', () => {
    expect(blockOf([-1, -1, -1], [mask('ABC')])).toBe(0);
    expect(blockOf([1, -1, -1], [mask('ABC')])).toBe(1);
    expect(blockOf([1, 1, 1], [])).toBe(0);
    expect(() => blockOf([0, 1, 1], [mask('ABC')])).toThrow(InputError);
  });

  it('property: a block split confounds exactly the reported words', () => {
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 7 }), fc.constantFrom(2, 4, 8), (k, b) => {
        const runs = fullFactorial(k);
        if (runs.length / b < 2) return;
        const g = defaultBlocking(k, [], [...Array(k).keys()], b).generators;
        const blocks = runs.map((r) => blockOf(r, g));
        const reported = new Set(blockConfounded(g, []));
        for (let m = 1; m < 2 ** k; m++) {
          const col = column(m, runs);
          const constantInBlocks = [...new Set(blocks)].every((bl) => new Set(col.filter((_, i) => blocks[i] === bl)).size === 1);
          expect(constantInBlocks).toBe(reported.has(m));
        }
        expect(new Set(blocks).size).toBe(b);
      }),
      { numRuns: 20 },
    );
  });
});

describe('blockSpan and blockConfounded', () => {
  it('lists every product, with the shortest alias for a fraction', () => {
    expect(words(blockSpan([mask('ABC'), mask('ACD')]))).toEqual(['ABC', 'ACD', 'BD']);
    expect(blockSpan([])).toEqual([]);
    // 2^(5-1), I = ABCDE: block on ABC; its alias DE is the shortest member.
    expect(words(blockConfounded([mask('ABC')], [{ mask: mask('ABCDE'), sign: 1 }]))).toEqual(['DE']);
  });
});
